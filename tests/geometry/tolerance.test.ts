// Comparisons of computed lengths within a tolerance, and rounding a figure up to a resolution. Binary floating
// point (IEEE 754) cannot hold 0.1 or 25.2 exactly, so 0.1 + 0.2 is 0.30000000000000004: the tolerance keeps
// that noise from changing a comparison or a rounding (common practice, no published source).
import { describe, expect, it } from "vitest";
import { DEFAULT_TOLERANCE_MM, cleanDecimal, geq, near, roundUpTo } from "../../geometry/tolerance";

describe("comparisons within a tolerance", () => {
  it("a ≥ b holds when a falls short of b by no more than the tolerance", () => {
    expect(geq(2, 1)).toBe(true);
    expect(geq(1, 1)).toBe(true);
    expect(geq(1, 1 + DEFAULT_TOLERANCE_MM / 2)).toBe(true);
    expect(geq(1, 1 + 10 * DEFAULT_TOLERANCE_MM)).toBe(false);
    // Short by exactly the tolerance: still holds; by more: not.
    expect(geq(1, 1.5, 0.5)).toBe(true);
    expect(geq(1, 1.75, 0.5)).toBe(false);
  });

  it("a and b are near when they differ by no more than the tolerance, either way round", () => {
    expect(near(1, 1 + DEFAULT_TOLERANCE_MM / 2)).toBe(true);
    expect(near(1, 1 + 10 * DEFAULT_TOLERANCE_MM)).toBe(false);
    expect(near(1, 1.25, 0.25)).toBe(true);
    expect(near(1.25, 1, 0.25)).toBe(true);
    expect(near(1, 1.5, 0.25)).toBe(false);
    expect(near(1.5, 1, 0.25)).toBe(false);
  });
});

describe("rounding up to a resolution", () => {
  it("25.21 mm to the next 0.05 is 25.25; 55.03 to the next 0.1 is 55.1", () => {
    expect(roundUpTo(25.21, 0.05)).toBeCloseTo(25.25, 12);
    expect(roundUpTo(55.03, 0.1)).toBeCloseTo(55.1, 12);
  });

  it("a figure already on the step stays, binary noise and all: 25.2 at 0.05, and 0.1 + 0.2 at 0.1, stay where they are", () => {
    expect(roundUpTo(25.2, 0.05)).toBeCloseTo(25.2, 12);
    expect(roundUpTo(0.1 + 0.2, 0.1)).toBeCloseTo(0.3, 12);
    // Above the step by more than the tolerance goes up a step.
    expect(roundUpTo(0.3 + 1e-6, 0.1)).toBeCloseTo(0.4, 12);
  });

  it("drops the binary noise of a quantised figure: 55.10000000000001 is 55.1, 0.1 + 0.2 is 0.3", () => {
    expect(cleanDecimal(55.10000000000001)).toBe(55.1);
    expect(cleanDecimal(0.1 + 0.2)).toBe(0.3);
    expect(cleanDecimal(25.25)).toBe(25.25);
  });
});
