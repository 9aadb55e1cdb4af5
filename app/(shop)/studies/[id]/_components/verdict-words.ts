import type { Verdict } from "@/geometry";
import { VERDICT_TEXT } from "@/model/verdict";

// The study page's words and colours for a verdict: the product's one set (model/verdict.ts), with a short form.

export const VERDICT: Record<Verdict, { words: string; tone: "clear" | "tight" | "interfere"; short: string }> = {
  "fits-as-is": { ...VERDICT_TEXT["fits-as-is"], short: "clear" },
  "fits-after-cut": { ...VERDICT_TEXT["fits-after-cut"], short: "needs a cut" },
  "cannot-fit": { ...VERDICT_TEXT["cannot-fit"], short: "cannot fit" },
};

// The verdicts' own colours (model/palette.ts), apart from the clearance bands'.
export const TONE_CLASS = {
  clear: "border-verdict-fits bg-verdict-fits-soft text-ink",
  tight: "border-verdict-after-cut bg-verdict-after-cut-soft text-ink",
  interfere: "border-verdict-cannot bg-verdict-cannot-soft text-ink",
} as const;

export const TONE_TEXT = { clear: "text-verdict-fits", tight: "text-verdict-after-cut", interfere: "text-verdict-cannot" } as const;
