import { describe, expect, it } from "vitest";
import { type VerificationPlan, bandCheck, cutFigures, evaluateStudy, planFromResult, VerificationPlanError } from "../../geometry/index";
import { parse, roundStudyInput } from "./fixtures";

// The verification arithmetic is common practice, no published source: the worst reading counts, radial
// clearance is half the difference of the smallest cut diameter and the skirt, depth clearance is the
// shallowest depth minus the skirt's protrusion with the gasket stack fitted. Values worked by hand beside each check.
const plan: VerificationPlan = {
  kitName: "test kit",
  cutDiameterMm: 55.1,
  cutDepthMm: 25.25,
  throughMouth: false,
  skirtDiameterMm: 53.96,
  skirtLengthMm: 24.7,
  minRadialClearanceMm: 0.5,
  minDepthClearanceMm: 0.5,
  minSealingLandMm: 2.5,
  studs: [{ label: "front left", plannedMm: 8.27 }],
};
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
