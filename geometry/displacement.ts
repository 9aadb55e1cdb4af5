/** Swept volume in cc: V = (π/4)·B²·S·cylinders / 1000, with bore B and stroke S in mm (howmotorcycleswork.com, "engine mathematics"). */
export function displacementCc(boreMm: number, strokeMm: number, cylinders: number = 1): number {
  return ((Math.PI / 4) * boreMm * boreMm * strokeMm * cylinders) / 1000;
}

/** Displacement rounded to the nearest whole cc, as in US 40 CFR 86.419-78. */
export function roundCc(cc: number): number {
  return Math.round(cc);
}

/** Thresholds crossed going from one displacement to another: those t with (a ≤ t) ≠ (b ≤ t). */
export function thresholdsCrossedCc(fromCc: number, toCc: number, thresholdsCc: readonly number[]): number[] {
  return thresholdsCc.filter((t) => fromCc <= t !== toCc <= t);
}
