import type { BoringRig } from "./schema";

/** Cutter setting (caliper reading across the head including the bit): s = (D_cut + D_head) / 2. Worked example, common practice, no published source. */
export function cutterSettingMm(cutDiameterMm: number, headDiameterMm: number): number {
  return (cutDiameterMm + headDiameterMm) / 2;
}

/** Cut diameter given a cutter setting, the inverse: D_cut = 2·s − D_head. */
export function cutDiameterFromSettingMm(settingMm: number, headDiameterMm: number): number {
  return 2 * settingMm - headDiameterMm;
}

/** A range of cut diameters or bit lengths, mm. */
export interface RangeMm {
  readonly min: number;
  readonly max: number;
}

/** Cut diameters a bit of length L reaches: [Dmin₀, Dmax₀] + 2·(L − L₀), from one calibration (each mm off the bit moves both ends down 2 mm of diameter). Common practice, no published source. */
export function bitReachMm(bitLengthMm: number, calibration: BoringRig["calibration"]): RangeMm {
  const shift = 2 * (bitLengthMm - calibration.bitLengthMm);
  return { min: calibration.minCutDiameterMm + shift, max: calibration.maxCutDiameterMm + shift };
}

/** Bit lengths that reach a cut D: L ∈ [L₀ + (D − Dmax₀)/2, L₀ + (D − Dmin₀)/2]. */
export function bitLengthWindowMm(cutDiameterMm: number, calibration: BoringRig["calibration"]): RangeMm {
  return {
    min: calibration.bitLengthMm + (cutDiameterMm - calibration.maxCutDiameterMm) / 2,
    max: calibration.bitLengthMm + (cutDiameterMm - calibration.minCutDiameterMm) / 2,
  };
}

/** What the installed bit does for a cut. */
export interface BitCheck {
  readonly reachMm: RangeMm;
  readonly reaches: boolean;
  readonly windowMm: RangeMm;
  /** Least length to grind off a bit that is too long (0 when it is not too long): L − L_max. */
  readonly grindOffMm: number;
  /** How much longer a bit must be when the installed one is too short (0 otherwise): L_min − L. */
  readonly tooShortByMm: number;
}

/** Whether the installed bit reaches the cut, the window of lengths that do, and how much to grind off a long bit. */
export function checkBit(cutDiameterMm: number, rig: Pick<BoringRig, "bitLengthMm" | "calibration">, toleranceMm: number): BitCheck {
  const reachMm = bitReachMm(rig.bitLengthMm, rig.calibration);
  const windowMm = bitLengthWindowMm(cutDiameterMm, rig.calibration);
  const reaches = cutDiameterMm >= reachMm.min - toleranceMm && cutDiameterMm <= reachMm.max + toleranceMm;
  return {
    reachMm,
    reaches,
    windowMm,
    grindOffMm: reaches ? 0 : Math.max(0, rig.bitLengthMm - windowMm.max),
    tooShortByMm: reaches ? 0 : Math.max(0, windowMm.min - rig.bitLengthMm),
  };
}

/** Rotating hardware clears when its radius plus the margin stays within the cut radius: r_hw + margin ≤ D/2 (else it strikes the case before the bit). */
export function hardwareClearanceMm(cutDiameterMm: number, hardwareRadiusMm: number): number {
  return cutDiameterMm / 2 - hardwareRadiusMm;
}
