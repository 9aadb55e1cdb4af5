import type { ReasonCode, Verdict } from "@/geometry";
import { REASON_TEXT as REASON_WORDS, VERDICT_TEXT as VERDICT } from "@/model/verdict";
import type { FitState } from "@/scene/fit";

// The studio's words for the core's codes. The verdicts' words are the product's one set (model/verdict.ts).

export const VERDICT_TEXT: Record<Verdict, string> = {
  "fits-as-is": VERDICT["fits-as-is"].words,
  "fits-after-cut": VERDICT["fits-after-cut"].words,
  "cannot-fit": VERDICT["cannot-fit"].words,
};

export const STATE_TEXT: Record<FitState, string> = {
  interfere: "Interference",
  tight: "Tight",
  clear: "Clear",
};

export const STATE_MEANING: Record<FitState, string> = {
  interfere: "the skirt overlaps case material",
  tight: "clears, but by less than the shop's minimum",
  clear: "clears by the shop's minimum or more",
};

/** The core's reasons as sentences, from the product's one set of reason words (model/verdict.ts). */
export const REASON_TEXT = Object.fromEntries(
  Object.entries(REASON_WORDS).map(([code, words]) => [code, `${words.charAt(0).toUpperCase()}${words.slice(1)}.`]),
) as Record<ReasonCode, string>;

export const TEXT_COLOR: Record<FitState, string> = { interfere: "text-interfere", tight: "text-tight", clear: "text-clear" };
export const SOFT_BG: Record<FitState, string> = { interfere: "bg-interfere-soft", tight: "bg-tight-soft", clear: "bg-clear-soft" };
export const BORDER: Record<FitState, string> = { interfere: "border-interfere", tight: "border-tight", clear: "border-clear" };
