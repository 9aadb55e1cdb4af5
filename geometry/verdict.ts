import type { ReasonCode, Verdict } from "./result-schema";
import type { Wall } from "./wall";

/** What the verdict is decided from. */
export interface VerdictInput {
  readonly studsOk: boolean;
  /** The skirt protrudes below the deck at all. */
  readonly entersCase: boolean;
  /** The skirt clears the existing mouth by at least the minimum radial clearance. */
  readonly clearsMouth: boolean;
  /** The skirt clears the swept crank webs by the shop's minimum; null when the crank chamber was not checked. */
  readonly crankOk: boolean | null;
  /** The cut (given or proposed), or null when none is planned. */
  readonly cut: {
    readonly effectiveRadialClearanceMm: number;
    readonly depthClearanceMm: number | null;
    readonly walls: readonly Wall[];
    readonly diameterMm: number;
    readonly maxCutDiameterMm: number;
  } | null;
  readonly minRadialClearanceMm: number;
  readonly minDepthClearanceMm: number;
}

/** Problems a planned cut causes, as reason codes (empty when the cut is sound). */
export function cutReasons(cut: NonNullable<VerdictInput["cut"]>, minRadialMm: number, minDepthMm: number, toleranceMm: number): ReasonCode[] {
  const reasons: ReasonCode[] = [];
  if (cut.effectiveRadialClearanceMm < -toleranceMm) reasons.push("skirt-interferes-with-cut");
  else if (cut.effectiveRadialClearanceMm < minRadialMm - toleranceMm) reasons.push("radial-clearance-below-minimum");
  if (cut.depthClearanceMm !== null && cut.depthClearanceMm < minDepthMm - toleranceMm) reasons.push("depth-clearance-below-minimum");
  const add = (r: ReasonCode) => {
    if (!reasons.includes(r)) reasons.push(r);
  };
  for (const w of cut.walls) {
    if (w.ok) continue;
    if (w.minWallMm < -toleranceMm) add(w.kind === "stud" ? "cut-breaks-into-stud-hole" : w.kind === "pocket" ? "cut-breaks-into-pocket" : "cut-breaks-through-deck");
    else add(w.kind === "stud" ? "sealing-land-below-minimum" : "wall-below-minimum");
  }
  if (cut.diameterMm > cut.maxCutDiameterMm + toleranceMm) add("cut-larger-than-case-allows");
  return reasons;
}

/**
 * Verdict: fits as is when the studs match and the skirt clears the mouth; fits after the cut when the
 * studs match and the cut leaves every clearance and wall at or above its minimum; cannot fit otherwise —
 * and never a fit when the skirt comes closer to the crank webs than the minimum (no cut helps that).
 */
export function decideVerdict(input: VerdictInput, toleranceMm: number): { verdict: Verdict; reasons: ReasonCode[] } {
  const reasons: ReasonCode[] = [];
  if (!input.studsOk) reasons.push("stud-pattern-mismatch");
  const crankBlocks = input.crankOk === false;
  if (crankBlocks) reasons.push("crank-clearance-below-minimum");
  if (input.clearsMouth) {
    reasons.push(input.entersCase ? "clears-existing-mouth" : "skirt-does-not-enter");
    return { verdict: input.studsOk && !crankBlocks ? "fits-as-is" : "cannot-fit", reasons };
  }
  reasons.push("needs-cut");
  const problems = input.cut ? cutReasons(input.cut, input.minRadialClearanceMm, input.minDepthClearanceMm, toleranceMm) : [];
  reasons.push(...problems);
  return { verdict: input.studsOk && !crankBlocks && input.cut !== null && problems.length === 0 ? "fits-after-cut" : "cannot-fit", reasons };
}
