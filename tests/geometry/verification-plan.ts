import type { VerificationPlan } from "../../geometry/index";

/**
 * A kit's plan for checking a cut against (invented figures, as the core plans the example study's first kit):
 * a 55.10 mm cut 25.25 mm deep for a 53.96 mm skirt 24.7 mm long, the shop's default minimums, and the given studs.
 */
export function verificationPlan(studs: VerificationPlan["studs"]): VerificationPlan {
  return {
    kitName: "test kit",
    cutDiameterMm: 55.1,
    cutDepthMm: 25.25,
    throughMouth: false,
    skirtDiameterMm: 53.96,
    skirtLengthMm: 24.7,
    minRadialClearanceMm: 0.5,
    minDepthClearanceMm: 0.5,
    minSealingLandMm: 2.5,
    studs,
  };
}
