import type { ReasonCode } from "@/geometry";

/** Why a kit got its verdict, in plain words. */
export const REASON_WORDS: Record<ReasonCode, string> = {
  "clears-existing-mouth": "the skirt clears the existing mouth",
  "skirt-does-not-enter": "the skirt does not reach into the case",
  "needs-cut": "the mouth must be cut first",
  "stud-pattern-mismatch": "the kit's studs do not line up with this case's (a different stud pattern)",
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

const NOT_A_BLOCK: readonly ReasonCode[] = ["clears-existing-mouth", "needs-cut"];

/** For a kit that cannot fit: the first reason that blocks it, in plain words (null otherwise). */
export function blockingReason(kit: { verdict: string; reasons: readonly ReasonCode[] }): string | null {
  if (kit.verdict !== "cannot-fit") return null;
  const code = kit.reasons.find((r) => !NOT_A_BLOCK.includes(r));
  return code ? REASON_WORDS[code] : null;
}
