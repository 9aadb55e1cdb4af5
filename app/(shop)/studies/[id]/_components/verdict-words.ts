import type { Verdict } from "@/geometry";
import { VERDICT_TEXT } from "@/model/verdict";

// The study page's words and colours for a verdict: the product's one set (model/verdict.ts), with a short form.

export const VERDICT: Record<Verdict, { words: string; tone: "clear" | "tight" | "interfere"; short: string }> = {
  "fits-as-is": { ...VERDICT_TEXT["fits-as-is"], short: "clear" },
  "fits-after-cut": { ...VERDICT_TEXT["fits-after-cut"], short: "needs a cut" },
  "cannot-fit": { ...VERDICT_TEXT["cannot-fit"], short: "cannot fit" },
};

export const TONE_CLASS = {
  clear: "border-clear bg-clear-soft text-ink",
  tight: "border-tight bg-tight-soft text-ink",
  interfere: "border-interfere bg-interfere-soft text-ink",
} as const;

export const TONE_TEXT = { clear: "text-clear", tight: "text-tight", interfere: "text-interfere" } as const;
