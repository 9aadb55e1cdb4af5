/** Default length tolerance for comparisons on computed floats, in mm: far below any machining resolution. */
export const DEFAULT_TOLERANCE_MM = 1e-9;

/** True when a ≥ b within the tolerance: a − b ≥ −tol. */
export function geq(a: number, b: number, toleranceMm: number = DEFAULT_TOLERANCE_MM): boolean {
  return a - b >= -toleranceMm;
}

/** True when |a − b| ≤ tol. */
export function near(a: number, b: number, toleranceMm: number = DEFAULT_TOLERANCE_MM): boolean {
  return Math.abs(a - b) <= toleranceMm;
}

/** Smallest multiple of step that is ≥ value, ignoring float noise below the tolerance: ⌈(value − tol) / step⌉ · step. */
export function roundUpTo(value: number, step: number, toleranceMm: number = DEFAULT_TOLERANCE_MM): number {
  return Math.ceil((value - toleranceMm) / step) * step;
}

/** Drops binary noise below 12 significant digits (55.10000000000001 → 55.1), for figures quantised to a resolution. */
export function cleanDecimal(value: number): number {
  return Number(value.toPrecision(12));
}
