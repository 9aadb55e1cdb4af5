import type { Verdict } from "@/geometry";

// The study page's words and colours for a verdict.

export const VERDICT: Record<Verdict, { words: string; tone: "clear" | "tight" | "interfere"; short: string }> = {
  "fits-as-is": { words: "Fits as it is", tone: "clear", short: "clear" },
  "fits-after-cut": { words: "Fits after the cut", tone: "tight", short: "needs a cut" },
  "cannot-fit": { words: "Cannot fit safely", tone: "interfere", short: "cannot fit" },
};

export const TONE_CLASS = {
  clear: "border-clear bg-clear-soft text-ink",
  tight: "border-tight bg-tight-soft text-ink",
  interfere: "border-interfere bg-interfere-soft text-ink",
} as const;

export const TONE_TEXT = { clear: "text-clear", tight: "text-tight", interfere: "text-interfere" } as const;
