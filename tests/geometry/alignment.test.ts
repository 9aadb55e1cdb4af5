import { describe, expect, it } from "vitest";
import { axisAtDepthMm, depthVariationMm, fitPlane, lateralShiftMm, tiltDeg, tiltDirectionDeg, tryFitPlane } from "../../geometry/alignment";
import { DegenerateGeometryError, evaluateStudy } from "../../geometry/index";
import { parse, roundStudyInput, testRig } from "./fixtures";

const at = (x: number, y: number, h: number) => ({ atMm: [x, y] as const, heightMm: h });

// The plane fit is ordinary least squares (checked against a worked example and ml-matrix in sources.test.ts);
// the expected figures here are worked by hand from the readings. That the tool axis stands square to the holder
// and passes through the bearing at the stud-pattern centre is common practice, no published source.
describe("holder plane", () => {
  it("a holder 0.1 mm higher at +x over 56 mm tilts atan(0.1/56) towards +x", () => {
    const f = fitPlane([at(-28, 28, 30), at(28, 28, 30.1), at(28, -28, 30.1), at(-28, -28, 30)]);
    expect(tiltDeg(f)).toBeCloseTo((Math.atan(0.1 / 56) * 180) / Math.PI, 9);
    expect(tiltDirectionDeg(f)).toBeCloseTo(0, 6);
    expect(f.rockMm).toBeCloseTo(0, 9);
  });

  it("a holder that rocks on one stud shows the rock as the largest residual", () => {
    const f = fitPlane([at(-28, 28, 30), at(28, 28, 30), at(28, -28, 30), at(-28, -28, 30.08)]);
    expect(f.rockMm).toBeCloseTo(0.02, 9);
  });

  it("three readings on one line give no plane, and fitPlane says so with a coded error", () => {
    const pts = [at(0, 0, 1), at(1, 1, 2), at(2, 2, 3)];
    expect(tryFitPlane(pts)).toBeNull();
    expect(() => fitPlane(pts)).toThrow(DegenerateGeometryError);
  });

  it("the tool axis at depth z is displaced by (h₀ + z)·(a, b) towards the high side", () => {
    const f = { a: 0.002, b: -0.001, cMm: 30 };
    const p = axisAtDepthMm(f, [0, 0], 25);
    expect(p[0]).toBeCloseTo(55 * 0.002, 12);
    expect(p[1]).toBeCloseTo(-55 * 0.001, 12);
    expect(lateralShiftMm(f, [0, 0], 25)).toBeCloseTo(55 * Math.hypot(0.002, 0.001), 12);
    expect(depthVariationMm(f, 55)).toBeCloseTo(55 * Math.hypot(0.002, 0.001), 12);
  });
});

describe("what tilt does to a study", () => {
  const tilted = (rise: number) =>
    parse({
      ...roundStudyInput(),
      rig: testRig,
      cut: { diameterMm: 55.2, depthMm: 25.4 },
      readings: {
        holderHeights: [
          { stud: "a", heightMm: 30 },
          { stud: "b", heightMm: 30 + rise },
          { stud: "c", heightMm: 30 + rise },
          { stud: "d", heightMm: 27, straightedgeMm: 3 },
        ],
      },
    });

  it("effective clearance is the cut radius minus the skirt radius minus the worst axis shift over the protrusion", () => {
    const k = evaluateStudy(tilted(0.2)).kits[0];
    const slope = 0.2 / 56;
    // Bearing at the pattern centre, 30.1 mm above the deck; worst at the skirt's bottom, 24.7 mm down.
    const shift = (30.1 + 24.7) * slope;
    expect(k.effectiveRadialClearanceMm).toBeCloseTo(27.6 - 27 - shift, 9);
    expect(k.radialClearanceMm.vsCut).toBeCloseTo(0.6, 9);
    expect(k.alignment?.depthVariationMm).toBeCloseTo(55.2 * slope, 9);
    expect(k.depthClearanceMm).toBeCloseTo(25.4 - 55.2 * slope - 24.7, 9);
  });

  it("a tilt that takes the clearance below the minimum is reported as tilt eating the clearance", () => {
    const level = evaluateStudy(tilted(0)).kits[0];
    const bad = evaluateStudy(tilted(0.6)).kits[0];
    expect(level.warnings.map((w) => w.code)).not.toContain("tilt-eats-clearance");
    expect(level.verdict).toBe("fits-after-cut");
    expect(bad.warnings.map((w) => w.code)).toContain("tilt-eats-clearance");
    expect(bad.verdict).toBe("cannot-fit");
    expect(bad.reasons).toContain("radial-clearance-below-minimum");
  });

  it("a proposed cut grows by twice the tilt's worst shift", () => {
    const base = { ...roundStudyInput(), rig: { ...testRig, settingResolutionMm: 0.001 } };
    const level = evaluateStudy(parse(base)).kits[0];
    const withTilt = evaluateStudy(
      parse({ ...base, readings: { holderHeights: [{ stud: "a", heightMm: 30 }, { stud: "b", heightMm: 30.3 }, { stud: "c", heightMm: 30.3 }, { stud: "d", heightMm: 30 }] } }),
    ).kits[0];
    const shift = withTilt.alignment?.worstAxisOffsetMm ?? NaN;
    expect(shift).toBeGreaterThan(0);
    expect((withTilt.cut?.diameterMm ?? NaN) - (level.cut?.diameterMm ?? NaN)).toBeCloseTo(2 * shift, 2);
    expect(withTilt.effectiveRadialClearanceMm ?? NaN).toBeGreaterThanOrEqual(0.5 - 1e-9);
  });
});
