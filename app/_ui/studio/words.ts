import type { ReasonCode, Verdict } from "@/geometry";
import { VERDICT_TEXT as VERDICT } from "@/model/verdict";
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

export const REASON_TEXT: Record<ReasonCode, string> = {
  "clears-existing-mouth": "The skirt already clears the mouth.",
  "skirt-does-not-enter": "The skirt does not reach below the deck.",
  "needs-cut": "The mouth must be counterbored.",
  "stud-pattern-mismatch": "The kit's studs do not line up with this case's.",
  "skirt-interferes-with-cut": "The skirt is wider than this cut.",
  "radial-clearance-below-minimum": "The skirt clears this cut by less than the minimum.",
  "depth-clearance-below-minimum": "The cut is too shallow: the skirt would sit on the step.",
  "sealing-land-below-minimum": "Too little sealing land left at a stud.",
  "wall-below-minimum": "A wall would be left thinner than the minimum.",
  "cut-breaks-into-stud-hole": "The cut breaks into a stud hole.",
  "cut-breaks-into-pocket": "The cut breaks into a passage.",
  "cut-breaks-through-deck": "The cut breaks through the outside of the case.",
  "cut-larger-than-case-allows": "The cut is larger than this case can take.",
  "crank-clearance-below-minimum": "The skirt's lower edge comes too close to the crank webs.",
};

export const TEXT_COLOR: Record<FitState, string> = { interfere: "text-interfere", tight: "text-tight", clear: "text-clear" };
export const SOFT_BG: Record<FitState, string> = { interfere: "bg-interfere-soft", tight: "bg-tight-soft", clear: "bg-clear-soft" };
export const BORDER: Record<FitState, string> = { interfere: "border-interfere", tight: "border-tight", clear: "border-clear" };
