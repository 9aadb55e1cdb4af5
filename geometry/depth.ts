import type { CylinderKit } from "./schema";

/** Skirt protrusion below the deck: the longest skirt-length reading minus the thinnest base gasket that may be used (none unless the kit is always run with a gasket). */
export function skirtProtrusionMm(kit: Pick<CylinderKit, "skirtLengthReadingsMm" | "baseGasketsMm" | "alwaysWithGasket">): { protrusionMm: number; lengthMm: number; gasketMm: number } {
  const lengthMm = Math.max(...kit.skirtLengthReadingsMm);
  const gasketMm = kit.alwaysWithGasket && kit.baseGasketsMm.length > 0 ? Math.min(...kit.baseGasketsMm) : 0;
  return { protrusionMm: lengthMm - gasketMm, lengthMm, gasketMm };
}

/** The depth clearance of a counterbore, or null when the cut reaches the mouth's full depth and leaves no step. */
export interface DepthClearance {
  /** Shallowest-point depth − protrusion; null when there is no step for the skirt to bottom on. */
  readonly depthClearanceMm: number | null;
  /** Depth of the cut's shallowest bottom point: nominal depth − bottom tilt variation. */
  readonly shallowestDepthMm: number;
  /** True when even the shallowest bottom point reaches the mouth depth, so the cut opens into the crank chamber. */
  readonly throughMouth: boolean;
}

/** Depth clearance = (cut depth − depth variation across the tilted bottom) − protrusion; no step when that depth reaches the mouth's depth. */
export function depthClearance(cutDepthMm: number, depthVariationMm: number, protrusionMm: number, mouthDepthMm: number, toleranceMm: number): DepthClearance {
  const shallowestDepthMm = cutDepthMm - depthVariationMm;
  const throughMouth = shallowestDepthMm >= mouthDepthMm - toleranceMm;
  return { depthClearanceMm: throughMouth ? null : shallowestDepthMm - protrusionMm, shallowestDepthMm, throughMouth };
}

/** Cut depth wanted: protrusion + minimum depth clearance + bottom tilt variation, but no deeper than where the shallowest point meets the mouth's depth (then no step remains). */
export function requiredCutDepthMm(protrusionMm: number, minDepthClearanceMm: number, depthVariationMm: number, mouthDepthMm: number): number {
  return Math.min(protrusionMm + minDepthClearanceMm, mouthDepthMm) + depthVariationMm;
}
