import { describe, expect, it } from "vitest";
import Matrix, { solve } from "ml-matrix";
import { axisAtDepthMm, depthVariationMm, fitPlane, lateralShiftMm, planeHeightMm, tiltDeg, tiltDirectionDeg, tryFitPlane } from "../../geometry/alignment";
import { DegenerateGeometryError, evaluateStudy } from "../../geometry/index";
import { parse, roundStudyInput, testRig } from "./fixtures";

const at = (x: number, y: number, h: number) => ({ atMm: [x, y] as const, heightMm: h });

// The plane fit is ordinary least squares (checked against a worked example and ml-matrix in sources.test.ts);
// the expected figures here are worked by hand from the readings. That the tool axis stands square to the holder
// and passes through the bearing at the stud-pattern centre is common practice, no published source.
describe("holder plane", () => {
  it("a holder 0.1 mm higher at +x over 56 mm tilts atan(0.1/56) toward +x", () => {
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

  it("the tool axis at depth z is displaced by (h₀ + z)·(a, b) toward the high side", () => {
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

describe("plane fit on readings that are not symmetric about the centre", () => {
  // Ordinary least squares, cross-checked against ml-matrix's QR solve of the same over-determined system.
  const pts = [at(0, 0, 5.01), at(3, 1, 5.68), at(1, 4, 4.49), at(5, 5, 5.52), at(2, 7, 3.19)];

  it("agrees with ml-matrix's least-squares solve, and its rock is the largest |residual|", () => {
    const A = new Matrix(pts.map((p) => [p.atMm[0], p.atMm[1], 1]));
    const x = solve(A, Matrix.columnVector(pts.map((p) => p.heightMm)), true);
    const f = fitPlane(pts);
    expect(f.a).toBeCloseTo(x.get(0, 0), 10);
    expect(f.b).toBeCloseTo(x.get(1, 0), 10);
    expect(f.cMm).toBeCloseTo(x.get(2, 0), 10);
    const res = pts.map((p) => p.heightMm - (x.get(0, 0) * p.atMm[0] + x.get(1, 0) * p.atMm[1] + x.get(2, 0)));
    f.residualsMm.forEach((r, i) => expect(r).toBeCloseTo(res[i], 10));
    expect(f.rockMm).toBeCloseTo(Math.max(...res.map(Math.abs)), 10);
  });

  it("three readings not on one line fit exactly; two give no plane", () => {
    const f = fitPlane([at(0, 0, 1), at(2, 0, 1.4), at(0, 4, 0.2)]);
    expect([f.a, f.b, f.cMm, f.rockMm].map((v) => Number(v.toFixed(12)))).toEqual([0.2, -0.2, 1, 0]);
    expect(tryFitPlane([at(0, 0, 1), at(2, 0, 1.4)])).toBeNull();
    expect(() => fitPlane([at(0, 0, 1), at(2, 0, 1.4)])).toThrow(/at least 3 readings/);
  });

  it("readings all but on one diagonal line give no plane", () => {
    expect(tryFitPlane([at(0, 0, 1), at(100, 100, 2), at(200, 200 + 1e-5, 3)])).toBeNull();
    expect(tryFitPlane([at(0, 0, 1), at(100, 0, 2), at(200, 1e-5, 3)])).toBeNull();
    // Three readings at one point span nothing at all.
    expect(tryFitPlane([at(1, 1, 1), at(1, 1, 2), at(1, 1, 3)])).toBeNull();
  });

  it("the plane's height at (2, 3) with a = 0.1, b = 0.2, c = 1 is 1.8", () => {
    expect(planeHeightMm({ a: 0.1, b: 0.2, cMm: 1 }, [2, 3])).toBeCloseTo(1.8, 12);
  });
});
