import { describe, expect, it } from "vitest";
import { convertLengthsToInches, formatFractionalInches, formatLength, inToMm, mmToIn, toFractionalInches } from "../../geometry/units";

describe("units", () => {
  it("mm and inches convert both ways without drift", () => {
    for (const mm of [0, 1, 25.4, 57.15, 123.456]) expect(inToMm(mmToIn(mm))).toBeCloseTo(mm, 12);
    expect(mmToIn(25.4)).toBe(1);
  });

  it("rounds to the nearest 1/64 and reduces the fraction", () => {
    const f = toFractionalInches(1.8125, 64);
    expect([f.whole, f.numerator, f.denominator]).toEqual([1, 13, 16]);
    expect(formatFractionalInches(f)).toBe('1 13/16"');
    const g = toFractionalInches(0.049, 64);
    expect(formatFractionalInches(g)).toBe('3/64"');
    expect(Math.abs(g.errorIn)).toBeLessThanOrEqual(1 / 128);
  });

  it("formats lengths in mm, decimal inches and fractional inches", () => {
    expect(formatLength(45.75, "mm")).toBe("45.75 mm");
    expect(formatLength(25.4, "in")).toBe("1.000 in");
    expect(formatLength(20.6375, "in", { fractionDenominator: 64 })).toBe('13/16"');
  });

  it("converts a result's Mm, Mm2 and Mm3 fields to inches and leaves other fields alone", () => {
    const out = convertLengthsToInches({ cutterSettingMm: 25.4, areaMm2: 645.16, volumeMm3: 16387.064, bitLengthWindowMm: { min: 50.8, max: 76.2 }, centerMm: [25.4, 0], tiltDeg: 0.5, name: "x" }) as Record<string, unknown>;
    expect(out.cutterSettingIn).toBeCloseTo(1, 12);
    expect(out.areaIn2).toBeCloseTo(1, 12);
    expect(out.volumeIn3).toBeCloseTo(1, 9);
    const w = out.bitLengthWindowIn as { min: number; max: number };
    expect(w.min).toBeCloseTo(2, 12);
    expect(w.max).toBeCloseTo(3, 12);
    const c = out.centerIn as number[];
    expect(c[0]).toBeCloseTo(1, 12);
    expect(c[1]).toBe(0);
    expect(out.tiltDeg).toBe(0.5);
    expect(out.name).toBe("x");
    expect(out).not.toHaveProperty("cutterSettingMm");
  });
});

describe("fractional inches at their edges", () => {
  // Fractions of an inch written as whole, numerator/denominator with a leading minus: common practice, no
  // published source.
  it("refuses a denominator that is not a positive whole number, and takes 1 (whole inches)", () => {
    expect(() => toFractionalInches(1, 0)).toThrow(RangeError);
    expect(() => toFractionalInches(1, 0)).toThrow(/denominator must be a positive integer, got 0/);
    expect(() => toFractionalInches(1, 1.5)).toThrow(RangeError);
    expect(() => toFractionalInches(1, -2)).toThrow(RangeError);
    const f = toFractionalInches(2.4, 1);
    expect([f.whole, f.numerator, f.denominator, f.valueIn]).toEqual([2, 0, 1, 2]);
  });

  it('writes a negative length with a minus: −0.8125 in is -13/16", −1.5 in is -1 1/2"', () => {
    const f = toFractionalInches(-0.8125, 64);
    expect(f.negative).toBe(true);
    expect(f.valueIn).toBe(-0.8125);
    expect(f.errorIn).toBe(0);
    expect(formatFractionalInches(f)).toBe('-13/16"');
    expect(formatFractionalInches(toFractionalInches(-1.5, 64))).toBe('-1 1/2"');
  });

  it('writes zero, and a negative length that rounds to zero, as 0" without a minus', () => {
    expect(toFractionalInches(0, 64).negative).toBe(false);
    expect(formatFractionalInches(toFractionalInches(0, 64))).toBe('0"');
    const tiny = toFractionalInches(-0.001, 64);
    expect(tiny.negative).toBe(true);
    expect(formatFractionalInches(tiny)).toBe('0"');
  });

  it('writes whole inches without a fraction: 2 in is 2", −3 in is -3"', () => {
    expect(formatFractionalInches(toFractionalInches(2, 64))).toBe('2"');
    expect(formatFractionalInches(toFractionalInches(-3, 64))).toBe('-3"');
  });
});

describe("a result's lengths in inches", () => {
  // 1 in = 25.4 mm exactly, 1 in² = 645.16 mm² (NBS Circular 572 Addendum, 1959).
  it("keeps a list a list and an empty figure empty", () => {
    const out = convertLengthsToInches({ centerMm: [25.4, 50.8], depthClearanceMm: null, readingsMm: [] }) as Record<string, unknown>;
    expect(out.centerIn).toEqual([1, 2]);
    expect(out.depthClearanceIn).toBeNull();
    expect(out.readingsIn).toEqual([]);
  });

  it("a field under an Mm2 key is an area whatever its own name, and is not renamed again", () => {
    const out = convertLengthsToInches({ bandMm2: { upperMm: 645.16 } }) as Record<string, Record<string, number>>;
    expect(out.bandIn2).toEqual({ upperMm: 1 });
  });

  it("renames only a key that ends in Mm, Mm2 or Mm3: what was typed (…MmText) is left as typed", () => {
    const out = convertLengthsToInches({ diameterMmText: "55", diameterMm: 55.88, kitMmCount: 3 }) as Record<string, unknown>;
    expect(out.diameterMmText).toBe("55");
    expect(out.kitMmCount).toBe(3);
    expect(out.diameterIn).toBeCloseTo(2.2, 12);
    expect(Object.keys(out).sort()).toEqual(["diameterIn", "diameterMmText", "kitMmCount"]);
  });
});
