import { describe, expect, it } from "vitest";
import {
  type VerificationPlan,
  DEFAULT_VERIFY_TOLERANCE_MM,
  atLeastToMicron,
  bandCheck,
  cutFigures,
  evaluateStudy,
  measuredDepthClearance,
  measuredLands,
  measuredRadialClearance,
  planFromResult,
  toMicron,
  VerificationPlanError,
} from "../../geometry/index";
import { parse, roundStudyInput } from "./fixtures";
import { verificationPlan } from "./verification-plan";

// The verification arithmetic is common practice, no published source: the worst reading counts, radial
// clearance is half the difference of the smallest cut diameter and the skirt, depth clearance is the
// shallowest depth minus the skirt's protrusion with the gasket stack fitted. Values worked by hand beside each check.
const plan = verificationPlan([{ label: "front left", plannedMm: 8.27 }]);
const cut = { cutDiameterMm: [55.1, 55.12, 55.08], cutDepthMm: [25.25, 25.27], sealingLandMm: [{ stud: " Front Left ", valueMm: 2.4 }], gasketStackMm: 0.2 };

describe("after-cut figures against the plan", () => {
  it("works out the clearances from the worst readings", () => {
    const fig = cutFigures(plan, cut);
    expect(fig.radial.actualMm).toBeCloseTo(0.56, 9); // (55.08 − 53.96) / 2
    expect(fig.radial.ok).toBe(true);
    expect(fig.depthClearance?.actualMm).toBeCloseTo(0.75, 9); // 25.25 − (24.7 − 0.2)
    expect(fig.lands[0].measured?.ok).toBe(false); // 2.4 < 2.5, the label matched ignoring case and spaces
    expect(fig.lands[0].measured?.shortMm).toBeCloseTo(0.1, 9);
  });

  it("a band says how far the worst reading sits outside it, and on which side", () => {
    const under = bandCheck(55.1, [54.9, 55.1], 0.05);
    expect(under.byMm).toBeCloseTo(0.15, 9); // 55.10 − 0.05 − 54.90
    expect(under.side).toBe("under");
    const over = bandCheck(55.1, [55.1, 55.3], 0.05);
    expect(over.side).toBe("over");
    expect(over.actualMm).toBeCloseTo(55.3, 9);
    expect(bandCheck(25.25, [27], 0.05, true).side).toBeNull(); // a cut through the mouth may run deeper
  });

  it("a cut through the mouth has no depth clearance to check", () => {
    expect(cutFigures({ ...plan, throughMouth: true }, cut).depthClearance).toBeNull();
  });

  it("takes the plan from the core's result and refuses a kit with no cut", () => {
    const result = evaluateStudy(parse(roundStudyInput()));
    const p = planFromResult(result, "k1");
    expect(p.cutDiameterMm).toBe(result.kits[0].cut?.diameterMm);
    const clear = roundStudyInput();
    clear.kits[0].skirtDiameterReadingsMm = [44];
    expect(() => planFromResult(evaluateStudy(parse(clear)), "k1")).toThrow(VerificationPlanError);
  });
});

// Worked by hand on binary-exact figures (halves and quarters), so each comparison is exact; the arithmetic is
// common practice, no published source.
describe("the band a reading must fall in", () => {
  it("inside the band: nothing out, no side, and the reading nearer an edge named", () => {
    // under = 10 − 0.5 − 9.75 = −0.25, over = 10.125 − 10.5 = −0.375: the smallest lies nearer its edge.
    expect(bandCheck(10, [10.125, 9.75, 10], 0.5)).toEqual({ plannedMm: 10, minMm: 9.75, maxMm: 10.125, actualMm: 9.75, byMm: 0, side: null });
    // under = −0.375, over = 10.25 − 10.5 = −0.25: the largest lies nearer its edge.
    expect(bandCheck(10, [9.875, 10.25], 0.5)).toEqual({ plannedMm: 10, minMm: 9.875, maxMm: 10.25, actualMm: 10.25, byMm: 0, side: null });
  });

  it("a reading right on either edge is inside", () => {
    expect(bandCheck(10, [9.5, 10.5], 0.5)).toMatchObject({ byMm: 0, side: null });
  });

  it("out on both sides by the same amount: the smallest reading is named, under", () => {
    // under = 10 − 0.5 − 9 = 0.5 = over = 11 − 10.5.
    expect(bandCheck(10, [11, 9], 0.5)).toEqual({ plannedMm: 10, minMm: 9, maxMm: 11, actualMm: 9, byMm: 0.5, side: "under" });
  });

  it("out on both sides: the further one decides", () => {
    expect(bandCheck(10, [9.25, 11], 0.5)).toMatchObject({ actualMm: 11, byMm: 0.5, side: "over" }); // under 0.25, over 0.5
    expect(bandCheck(10, [8.75, 10.75], 0.5)).toMatchObject({ actualMm: 8.75, byMm: 0.75, side: "under" }); // under 0.75, over 0.25
  });

  it("where running over is allowed, only running under counts", () => {
    expect(bandCheck(25, [30, 26], 0.5, true)).toMatchObject({ byMm: 0, side: null, maxMm: 30 });
    expect(bandCheck(25, [24, 30], 0.5, true)).toEqual({ plannedMm: 25, minMm: 24, maxMm: 30, actualMm: 24, byMm: 0.5, side: "under" });
  });

  it("rounds to the micrometre, so float noise at an edge is no failure", () => {
    // 10 − 0.5 − 9.4996 = 0.0004 mm under: below half a micrometre, nothing out.
    expect(bandCheck(10, [9.4996], 0.5)).toMatchObject({ byMm: 0, side: null });
    // 0.0006 mm under rounds to one micrometre out.
    expect(bandCheck(10, [9.4994], 0.5)).toMatchObject({ byMm: 0.001, side: "under", actualMm: 9.499 });
    expect(toMicron(1.23449)).toBe(1.234);
    expect(toMicron(1.2345 + 1e-9)).toBe(1.235);
    expect(toMicron(-0.0004)).toBe(-0);
  });

  it("at least, to the micrometre", () => {
    expect(atLeastToMicron(2, 2)).toBe(true);
    expect(atLeastToMicron(2 - 0.0004, 2)).toBe(true);
    expect(atLeastToMicron(2 - 0.0006, 2)).toBe(false);
    expect(atLeastToMicron(2.5, 2)).toBe(true);
  });
});

describe("measured clearances and lands", () => {
  const half: VerificationPlan = { ...plan, skirtDiameterMm: 50, skirtLengthMm: 20, minRadialClearanceMm: 0.5, minDepthClearanceMm: 0.5, minSealingLandMm: 2 };
  const measured = { cutDiameterMm: [51.5, 51, 52], cutDepthMm: [21, 20.75, 21.5], sealingLandMm: [], gasketStackMm: 0.25 };

  it("the radial clearance from the smallest diameter read, against the minimum", () => {
    // (51 − 50) / 2 = 0.5: exactly the minimum.
    expect(measuredRadialClearance(half, measured)).toEqual({ actualMm: 0.5, minMm: 0.5, ok: true, shortMm: 0 });
    // (50.5 − 50) / 2 = 0.25: 0.25 short.
    expect(measuredRadialClearance(half, { ...measured, cutDiameterMm: [52, 50.5] })).toEqual({ actualMm: 0.25, minMm: 0.5, ok: false, shortMm: 0.25 });
  });

  it("the depth clearance from the shallowest depth read, with the gasket stack fitted", () => {
    // 20.75 − (20 − 0.25) = 1.
    expect(measuredDepthClearance(half, measured)).toEqual({ actualMm: 1, minMm: 0.5, ok: true, shortMm: 0 });
    // 20 − (20 − 0) = 0: 0.5 short with no gasket.
    expect(measuredDepthClearance(half, { ...measured, cutDepthMm: [20, 22], gasketStackMm: 0 })).toEqual({ actualMm: 0, minMm: 0.5, ok: false, shortMm: 0.5 });
  });

  it("each planned stud's land, matched by label ignoring case and spaces, or none when not measured", () => {
    const p: VerificationPlan = { ...half, studs: [{ label: "Front Left", plannedMm: 8 }, { label: "rear", plannedMm: 7.5 }] };
    const lands = measuredLands(p, { ...measured, sealingLandMm: [{ stud: "  front LEFT", valueMm: 1.75 }, { stud: "other", valueMm: 9 }] });
    expect(lands).toEqual([
      { label: "Front Left", plannedMm: 8, measured: { actualMm: 1.75, minMm: 2, ok: false, shortMm: 0.25 } },
      { label: "rear", plannedMm: 7.5, measured: null },
    ]);
  });

  it("the figures of a cut: the depth may run over only when the cut goes through the mouth", () => {
    const deep = { ...measured, cutDiameterMm: [55.1], cutDepthMm: [26.25] };
    expect(cutFigures({ ...half, cutDepthMm: 25.25, cutDiameterMm: 55.1 }, deep).depth).toMatchObject({ byMm: 0.95, side: "over" }); // 26.25 − 25.30
    expect(cutFigures({ ...half, cutDepthMm: 25.25, cutDiameterMm: 55.1, throughMouth: true }, deep).depth).toMatchObject({ byMm: 0, side: null });
    expect(cutFigures({ ...half, cutDepthMm: 25.25, cutDiameterMm: 55.1 }, deep).diameter).toMatchObject({ byMm: 0, side: null });
  });

  it("the default tolerance is 0.05 mm either way", () => {
    expect(DEFAULT_VERIFY_TOLERANCE_MM).toBe(0.05); // common practice, no published source: a caliper read to 0.05 mm
    const p = { ...half, cutDiameterMm: 55, cutDepthMm: 25 };
    expect(cutFigures(p, { ...measured, cutDiameterMm: [55.05, 54.95], cutDepthMm: [25] }).diameter.byMm).toBe(0);
    expect(cutFigures(p, { ...measured, cutDiameterMm: [55.07], cutDepthMm: [25] }).diameter).toMatchObject({ byMm: 0.02, side: "over" });
  });
});

describe("the plan taken from a result", () => {
  it("carries the kit's cut, skirt, the study's minimums and the land planned at each stud (pockets and deck left out)", () => {
    const input = roundStudyInput();
    input.case.pockets = [{ label: "left", outline: { kind: "polygon", pointsMm: [[-36, -8], [-31, -8], [-31, 8], [-36, 8]] } }];
    const result = evaluateStudy(parse(input));
    const kit = result.kits[0];
    const p = planFromResult(result, "k1");
    expect(p).toEqual({
      kitName: "test kit",
      cutDiameterMm: kit.cut!.diameterMm,
      cutDepthMm: kit.cut!.depthMm,
      throughMouth: kit.cut!.throughMouth,
      skirtDiameterMm: 54,
      skirtLengthMm: 24.7,
      minRadialClearanceMm: result.limits.values.minRadialClearanceMm,
      minDepthClearanceMm: result.limits.values.minDepthClearanceMm,
      minSealingLandMm: result.limits.values.minSealingLandMm,
      studs: kit.walls.filter((w) => w.kind === "stud").map((w) => ({ label: w.label, plannedMm: w.minWallMm })),
    });
    expect(p.studs.map((s) => s.label)).toEqual(["a", "b", "c", "d"]);
    expect(kit.walls.some((w) => w.kind === "pocket")).toBe(true);
  });

  it("says which is missing: the kit, or its cut", () => {
    const result = evaluateStudy(parse(roundStudyInput()));
    expect(() => planFromResult(result, "nope")).toThrow("The chosen kit is not in the study's results.");
    const clear = roundStudyInput();
    clear.kits[0].skirtDiameterReadingsMm = [44];
    expect(() => planFromResult(evaluateStudy(parse(clear)), "k1")).toThrow("The plan for this kit has no cut to verify.");
    const err = (() => {
      try {
        planFromResult(result, "nope");
      } catch (e) {
        return e;
      }
    })();
    expect(err).toBeInstanceOf(VerificationPlanError);
    expect(err).toMatchObject({ name: "VerificationPlanError", code: "invalid-argument" });
  });
});
