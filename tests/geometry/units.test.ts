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
