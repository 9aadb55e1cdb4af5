import type { ReasonCode, Verdict } from "@/geometry";
import { printed, VERDICT_COLOURS } from "./palette";

// The study's verdict for a kit in the product's words and colours, for every place that states it: the
// job page, the setup card (page and PDF) and the consult page.

export type VerdictTone = "clear" | "tight" | "interfere";

export const VERDICT_TEXT: Record<Verdict, { words: string; tone: VerdictTone }> = {
  "fits-as-is": { words: "Fits as it is", tone: "clear" },
  "fits-after-cut": { words: "Fits after the cut", tone: "tight" },
  "cannot-fit": { words: "Cannot fit safely", tone: "interfere" },
};

/** The tones as printed colours: the palette's verdict colours, light theme (model/palette.ts), so screen and paper agree. */
export const TONE_HEX: Record<VerdictTone, string> = {
  clear: printed(VERDICT_COLOURS["fits-as-is"]),
  tight: printed(VERDICT_COLOURS["fits-after-cut"]),
  interfere: printed(VERDICT_COLOURS["cannot-fit"]),
};

/** Why a kit got its verdict, in plain words. */
export const REASON_TEXT: Record<ReasonCode, string> = {
  "clears-existing-mouth": "the skirt clears the existing mouth",
  "skirt-does-not-enter": "the skirt does not reach into the case",
  "needs-cut": "the mouth must be cut first",
  "stud-pattern-mismatch": "the kit's studs do not line up with this case's",
  "skirt-interferes-with-cut": "the skirt still hits the planned cut",
  "radial-clearance-below-minimum": "the clearance around the skirt is below the shop's minimum",
  "depth-clearance-below-minimum": "the cut is not deep enough for the skirt",
  "sealing-land-below-minimum": "the sealing land at a stud would be thinner than the minimum",
  "wall-below-minimum": "a wall would be thinner than the minimum",
  "cut-breaks-into-stud-hole": "the cut would break into a stud hole",
  "cut-breaks-into-pocket": "the cut would break into a pocket or transfer passage",
  "cut-breaks-through-deck": "the cut would break through the outside of the case",
  "cut-larger-than-case-allows": "the cut needed is larger than the case can take",
  "crank-clearance-below-minimum": "the skirt's lower edge comes too close to the crank webs",
};

const NOT_A_BLOCK: readonly ReasonCode[] = ["clears-existing-mouth", "needs-cut", "skirt-does-not-enter"];

/** What stops a kit that cannot fit, in plain words, most important first (empty for a kit that fits). */
export function blockingReasons(kit: { verdict: Verdict; reasons: readonly ReasonCode[] }): string[] {
  if (kit.verdict !== "cannot-fit") return [];
  return kit.reasons.filter((r) => !NOT_A_BLOCK.includes(r)).map((r) => REASON_TEXT[r]);
}
