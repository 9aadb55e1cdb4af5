import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { angleLabel, areaLabel, boundLabel, diameterLabel, ftPerMinToMPerMin, lengthFieldText, lengthLabel, lengthPdf, messageInUnits, mPerMinToFtPerMin, parseLengthText, parseNumberText, recordMmText, roundedMm, signedLengthLabel, soldByFractionLabel, speedLabel, tickText, volumeLabel } from "@/model/units";

// The inch is exactly 25.4 mm and the foot exactly 12 in (NBS Circular 572 Addendum, 1959 international
// yard and pound agreement); every inch figure below follows from that.

describe("lengths for labels and results", () => {
  it("write a record's length with one to three decimals, an axis tick without trailing zeros, an angle to 0.001°", () => {
    expect([recordMmText(54), recordMmText(54.125), recordMmText(0.12345)]).toEqual(["54.0", "54.125", "0.123"]);
    // 54.5 mm / 25.4 = 2.14566… in (exact inch, NBS Circular 572 Addendum)
    expect([tickText(54.5, "mm"), tickText(54.5, "in"), tickText(50, "mm")]).toEqual(["54.5", "2.146", "50"]);
    expect(angleLabel(0.1234)).toBe("0.123°");
  });

  it("show 0.01 mm and 0.001 in, with the unit", () => {
    expect(lengthLabel(55.1, "mm")).toBe("55.10 mm");
    // 55.1 / 25.4 = 2.16929… in (exact inch, NBS Circular 572 Addendum)
    expect(lengthLabel(55.1, "in")).toBe("2.169 in");
    expect(diameterLabel(44.75, "in")).toBe("Ø 1.762 in");
  });

  it("write negatives with a true minus and never a negative zero", () => {
    expect(lengthLabel(-3.5, "mm")).toBe("\u22123.50 mm");
    expect(lengthLabel(-0.001, "mm")).toBe("0.00 mm");
    expect(signedLengthLabel(-0.31, "mm")).toBe("\u22120.31 mm");
    expect(signedLengthLabel(0.52, "mm")).toBe("+0.52 mm");
    expect(signedLengthLabel(-0.0001, "in")).toBe("+0.000 in");
  });

  it("say there is no figure when there is none", () => {
    expect(lengthLabel(null, "mm")).toBe("—");
    expect(lengthLabel(Number.NaN, "in")).toBe("—");
  });

  it("write an ASCII minus for a PDF", () => {
    expect(lengthPdf(-3.5, "mm")).toBe("-3.50 mm");
  });

  it("give fractions only for a part sold by a fraction", () => {
    // 46.0375 mm = 1.8125 in = 1 13/16 in (exact inch)
    expect(soldByFractionLabel(46.0375, "in")).toBe('1 13/16"');
    expect(soldByFractionLabel(46.0375, "mm")).toBe("46.04 mm");
  });
});

describe("lengths in fields", () => {
  it("show the number without trailing zeros, inches to 0.001", () => {
    expect(lengthFieldText(55.1, "mm")).toBe("55.1");
    expect(lengthFieldText(55.1, "in")).toBe("2.169");
    expect(lengthFieldText(undefined, "mm")).toBe("");
  });

  it("read a typed length back in mm, decimal or fractional inches, either minus sign", () => {
    // 2 1/8 in = 53.975 mm (exact inch)
    const mm = (t: string) => {
      const r = parseLengthText(t, "in");
      return r.ok ? r.value : Number.NaN;
    };
    expect(mm("2.125")).toBeCloseTo(53.975, 9);
    expect(mm("2 1/8")).toBeCloseTo(53.975, 9);
    expect(parseLengthText("\u221255", "mm")).toEqual({ ok: true, value: -55 });
    expect(parseLengthText("-55", "mm")).toEqual({ ok: true, value: -55 });
    expect(parseLengthText("", "mm")).toEqual({ ok: true, value: undefined });
  });

  it("say what is wrong with text that is not a number", () => {
    expect(parseNumberText("54,5")).toEqual({ ok: false, message: "use a point for decimals: 54.5" });
    expect(parseNumberText("abc").ok).toBe(false);
    expect(parseNumberText("1/0", { inches: true })).toEqual({ ok: false, message: "a fraction cannot have 0 below the line" });
  });

  it("read back what they show to within the shown resolution (property)", () => {
    fc.assert(
      fc.property(fc.double({ min: -500, max: 500, noNaN: true }), fc.constantFrom("mm" as const, "in" as const), (mm, units) => {
        const back = parseLengthText(lengthFieldText(mm, units), units);
        expect(back.ok).toBe(true);
        // Half of the last digit shown: 0.0005 mm, or 0.0005 in = 0.0127 mm.
        if (back.ok) expect(Math.abs((back.value ?? Number.NaN) - mm)).toBeLessThanOrEqual(units === "mm" ? 0.0005 + 1e-9 : 0.0127 + 1e-9);
      }),
    );
  });

  it("write a bound as it would be typed, with its unit", () => {
    // 200 mm / 25.4 = 7.874 in (exact inch)
    expect(boundLabel(200, "mm")).toBe("200 mm");
    expect(boundLabel(200, "in")).toBe("7.874 in");
  });

  it("round a length to what is shown, in mm", () => {
    expect(roundedMm(55.104, "mm")).toBeCloseTo(55.1, 9);
    // 2.169 in × 25.4 = 55.0926 mm (exact inch)
    expect(roundedMm(55.1, "in")).toBeCloseTo(55.0926, 9);
  });
});

describe("areas, volumes and speeds", () => {
  it("convert areas and volumes by the square and the cube of the inch", () => {
    // 645.16 mm² = 1 in²; 16 387.064 mm³ = 1 in³ (exact inch)
    expect(areaLabel(645.16, "in")).toBe("1.000 in²");
    expect(areaLabel(12.34, "mm")).toBe("12.3 mm²");
    expect(volumeLabel(16_387.064, "in")).toBe("1.000 in³");
    expect(volumeLabel(12_340, "mm")).toBe("12.34 cm³");
  });

  it("give a cutting speed in m/min or surface feet per minute", () => {
    // 1 ft = 0.3048 m exactly, so 100 m/min = 328.08 ft/min (NBS Circular 572 Addendum)
    expect(mPerMinToFtPerMin(100)).toBeCloseTo(328.084, 3);
    expect(ftPerMinToMPerMin(328.084)).toBeCloseTo(100, 3);
    expect(speedLabel(180, "in")).toBe("591 sfm");
    expect(speedLabel(180, "mm")).toBe("180 m/min");
  });
});

describe("the core's messages in the user's units", () => {
  it("rewrite every mm figure for an inch user", () => {
    expect(messageInUnits("The cut breaks 3.50 mm into the transfer passage.", "in")).toBe("The cut breaks 0.138 in into the transfer passage.");
    expect(messageInUnits("Only 1.20 mm of wall would remain (minimum 2.50 mm).", "in")).toBe("Only 0.047 in of wall would remain (minimum 0.098 in).");
  });

  it("leave an mm message as the core wrote it, and other units alone", () => {
    const m = "Displacement goes from 49.3 cc to 68.0 cc, across the 50 cc class; the drill's top speed of 800 min⁻¹.";
    expect(messageInUnits(m, "in")).toBe(m);
    expect(messageInUnits("The cut breaks 3.50 mm into it.", "mm")).toBe("The cut breaks 3.50 mm into it.");
  });
});
