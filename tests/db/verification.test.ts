import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { evaluateStudy, parseStudy } from "@/geometry";
import { verificationPlan } from "../geometry/verification-plan";
import { AfterCutReadingsSchema, planFromResult, verifyCut, type AfterCutReadings } from "@/db/verification";

// The plan comes from the core's own evaluation of the shipped example study (invented data); the
// verification arithmetic is common practice, no published source: worst reading wins, clearance is
// half the diameter difference, depth clearance is depth minus the skirt's protrusion with the stack used.
const study = parseStudy(JSON.parse(readFileSync("public/examples/study.json", "utf8")));
const result = evaluateStudy(study);
const kitId = study.kits[0].id;

const plan = verificationPlan([
  { label: "front left", plannedMm: 8.27 },
  { label: "rear right", plannedMm: 8.31 },
]);

const good: AfterCutReadings = {
  cutDiameterMm: [55.1, 55.12, 55.08],
  cutDepthMm: [25.25, 25.27],
  sealingLandMm: [
    { stud: "front left", valueMm: 8.2 },
    { stud: "rear right", valueMm: 8.25 },
  ],
  gasketStackMm: 0.2,
  chipsCleaned: true,
  trialFit: "goes-home",
};

const check = (v: ReturnType<typeof verifyCut>, key: string) => v.checks.find((c) => c.key === key)!;

describe("after-cut verification against the plan", () => {
  it("takes the plan for the chosen kit from the core's result", () => {
    const p = planFromResult(result, kitId);
    const kit = result.kits.find((k) => k.kitId === kitId)!;
    expect(p.cutDiameterMm).toBe(kit.cut!.diameterMm);
    expect(p.cutDepthMm).toBe(kit.cut!.depthMm);
    expect(p.skirtDiameterMm).toBe(kit.skirt.diameterMm);
    expect(p.studs.map((s) => s.label)).toEqual(study.case.studs.map((s) => s.label));
    expect(p.minSealingLandMm).toBe(2.5); // the example study's own limit
    expect(() => planFromResult(result, "no-such-kit")).toThrow(/not in the study/);
  });

  it("readings within tolerance of the plan pass, with the actual clearances worked out", () => {
    const v = verifyCut(plan, good);
    expect(v.verdict).toBe("pass");
    // (55.08 − 53.96) / 2 = 0.56 mm radial clearance from the smallest diameter read.
    expect(check(v, "radial-clearance").actualMm).toBeCloseTo(0.56, 6);
    // 25.25 − (24.7 − 0.2) = 0.75 mm under the skirt with a 0.2 mm gasket stack.
    expect(check(v, "depth-clearance").actualMm).toBeCloseTo(0.75, 6);
    expect(v.checks.every((c) => c.state === "ok")).toBe(true);
  });

  it("a cut 0.2 mm under the planned diameter fails by how far it sits outside the tolerance", () => {
    const v = verifyCut(plan, { ...good, cutDiameterMm: [54.9, 55.1] });
    expect(v.verdict).toBe("fail");
    const d = check(v, "cut-diameter");
    expect(d.state).toBe("fail");
    expect(d.byMm).toBeCloseTo(0.15, 6); // 55.10 − 0.05 − 54.90
    expect(d.message).toMatch(/smaller/);
    const r = check(v, "radial-clearance");
    expect(r.state).toBe("fail");
    expect(r.byMm).toBeCloseTo(0.03, 6); // 0.5 − (54.9 − 53.96) / 2
  });

  it("an over-cut diameter fails as larger than the plan allows", () => {
    const d = check(verifyCut(plan, { ...good, cutDiameterMm: [55.1, 55.3] }), "cut-diameter");
    expect(d.state).toBe("fail");
    expect(d.byMm).toBeCloseTo(0.15, 6);
    expect(d.message).toMatch(/larger/);
  });

  it("a thinner gasket stack than planned eats depth clearance", () => {
    const v = verifyCut(plan, { ...good, gasketStackMm: 0 });
    // 25.25 − 24.7 = 0.55 ≥ 0.5 still passes; a shallow cut with no gasket does not.
    expect(check(v, "depth-clearance").state).toBe("ok");
    const shallow = verifyCut(plan, { ...good, gasketStackMm: 0, cutDepthMm: [25.19, 25.25] });
    const dc = check(shallow, "depth-clearance");
    expect(dc.state).toBe("fail");
    expect(dc.byMm).toBeCloseTo(0.01, 6); // 0.5 − (25.19 − 24.7)
  });

  it("a sealing land below the minimum fails at that stud; a stud not measured leaves the verdict incomplete", () => {
    const thin = verifyCut(plan, { ...good, sealingLandMm: [{ stud: "front left", valueMm: 2.3 }, { stud: "rear right", valueMm: 8.25 }] });
    const land = thin.checks.filter((c) => c.key === "sealing-land");
    expect(land[0].state).toBe("fail");
    expect(land[0].byMm).toBeCloseTo(0.2, 6);
    expect(land[1].state).toBe("ok");
    const missing = verifyCut(plan, { ...good, sealingLandMm: [{ stud: "front left", valueMm: 8.2 }] });
    expect(missing.verdict).toBe("incomplete");
  });

  it("chips left in the case or a trial fit that binds fail; a trial fit not tried is incomplete", () => {
    expect(verifyCut(plan, { ...good, chipsCleaned: false }).verdict).toBe("fail");
    expect(verifyCut(plan, { ...good, trialFit: "binds" }).verdict).toBe("fail");
    expect(verifyCut(plan, { ...good, trialFit: "not-tried" }).verdict).toBe("incomplete");
  });

  it("exactly at the limit passes (float noise does not fail it)", () => {
    // (54.96 − 53.96) / 2 = 0.5 exactly the minimum; 0.1 + 0.2 style noise must not tip it over.
    const v = verifyCut({ ...plan, cutDiameterMm: 54.96 }, { ...good, cutDiameterMm: [54.96] });
    expect(check(v, "radial-clearance").state).toBe("ok");
  });

  it("a wider shop tolerance accepts what the default refuses", () => {
    const readings = { ...good, cutDiameterMm: [55.0] };
    expect(check(verifyCut(plan, readings), "cut-diameter").state).toBe("fail");
    expect(check(verifyCut(plan, readings, 0.1), "cut-diameter").state).toBe("ok");
  });

  it("the readings schema says what is wrong in words", () => {
    const r = AfterCutReadingsSchema.safeParse({ ...good, cutDiameterMm: [], gasketStackMm: -1 });
    expect(r.success).toBe(false);
    const messages = r.error!.issues.map((i) => i.message);
    expect(messages).toContain("Take at least one diameter reading.");
    expect(messages).toContain("The gasket stack cannot be negative.");
  });
});
