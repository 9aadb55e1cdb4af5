// The overlap of two circles, against Wolfram MathWorld, "Circle-Circle Intersection" (the closed form the code
// implements), and against the overlap summed in thin strips across it (a midpoint rule, independent of the
// closed form).
import { describe, expect, it } from "vitest";
import { lensArea } from "../../geometry/lens";

/** Area of the overlap of a circle of radius r at the origin and one of radius R at (d, 0), in 20 000 strips. */
function stripArea(r: number, R: number, d: number): number {
  const lo = Math.max(-r, d - R);
  const hi = Math.min(r, d + R);
  if (hi <= lo) return 0;
  const n = 20_000;
  const h = (hi - lo) / n;
  let sum = 0;
  for (let i = 0; i < n; i++) {
    const x = lo + (i + 0.5) * h;
    const a = Math.sqrt(Math.max(0, r * r - x * x));
    const b = Math.sqrt(Math.max(0, R * R - (x - d) * (x - d)));
    sum += 2 * Math.min(a, b) * h;
  }
  return sum;
}

describe("circle–circle overlap", () => {
  it("two unit circles one apart overlap by 2π/3 − √3/2 = 1.22837 (MathWorld)", () => {
    expect(lensArea(1, 1, 1)).toBeCloseTo((2 * Math.PI) / 3 - Math.sqrt(3) / 2, 12);
  });

  it("unequal circles, either way round, match the overlap summed in strips", () => {
    for (const [r, R, d] of [[2, 3, 4], [3, 2, 4], [23, 27, 5], [1, 5, 4.5]]) {
      expect(lensArea(r, R, d)).toBeCloseTo(stripArea(r, R, d), 3);
      expect(lensArea(R, r, d)).toBeCloseTo(lensArea(r, R, d), 12);
    }
  });

  it("circles apart or touching outside share nothing", () => {
    expect(lensArea(1, 1, 2)).toBe(0);
    expect(lensArea(1, 2, 5)).toBe(0);
  });

  it("a circle inside the other overlaps by its whole area, whichever is given first", () => {
    expect(lensArea(1, 3, 1)).toBeCloseTo(Math.PI, 12);
    expect(lensArea(3, 1, 1)).toBeCloseTo(Math.PI, 12);
    // Touching inside, and two equal circles on one centre.
    expect(lensArea(1, 3, 2)).toBeCloseTo(Math.PI, 12);
    expect(lensArea(2, 2, 0)).toBeCloseTo(4 * Math.PI, 12);
  });
});
