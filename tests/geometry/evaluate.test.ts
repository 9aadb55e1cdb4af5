import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { DEFAULT_LIMITS, StudyResultSchema, StudySchema, evaluateStudy, lensArea } from "../../geometry/index";
import { parse, polygonStudyInput, roundStudyInput, testRig } from "./fixtures";

const codes = (k: { warnings: { code: string }[] }) => k.warnings.map((w) => w.code);
type KitResult = ReturnType<typeof evaluateStudy>["kits"][number];
/** The kit cannot fit, with each of `reasons` among its reasons and each of `warned` among its warnings' codes. */
function expectCannotFit(k: KitResult, reasons: string[], warned: string[] = reasons) {
  expect(k.verdict).toBe("cannot-fit");
  expect(k.reasons).toEqual(expect.arrayContaining(reasons));
  expect(codes(k)).toEqual(expect.arrayContaining(warned));
}

// The default limits (0.5 mm radial and depth clearance, 2 mm land and wall, 0.3 mm stud tolerance) are the
// shop's defaults: common practice, no published source. Displacement is V = π/4·d²·s (howmotorcycleswork.com,
// "engine mathematics"); the 50 cc class is an example of a class that local rules set. Density 2.74 g/cm³ is
// die-casting alloy 383 (NADCA table A-3-2). Every other expected figure is worked by hand from the fixture.

describe("verdict", () => {
  it("a skirt narrower than the mouth by more than twice the minimum clearance fits as is, with no cut", () => {
    const input = roundStudyInput();
    input.kits[0].skirtDiameterReadingsMm = [44.8, 44.9];
    const k = evaluateStudy(parse(input)).kits[0];
    expect(k.verdict).toBe("fits-as-is");
    expect(k.reasons).toContain("clears-existing-mouth");
    expect(k.cut).toBeNull();
    expect(k.radialClearanceMm.vsMouth).toBeCloseTo(0.55, 9);
  });

  it("a skirt that clears the mouth by less than the minimum needs a cut", () => {
    const input = roundStudyInput();
    input.kits[0].skirtDiameterReadingsMm = [45.4];
    const k = evaluateStudy(parse(input)).kits[0];
    expect(k.verdict).toBe("fits-after-cut");
    expect(k.reasons).toContain("needs-cut");
    expect(k.cut?.diameterMm).toBeGreaterThan(46);
  });

  it("a wide skirt gets the smallest cut with the minimum clearance, rounded up to 0.1 mm without a rig", () => {
    const k = evaluateStudy(parse(roundStudyInput())).kits[0];
    expect(k.verdict).toBe("fits-after-cut");
    expect(k.cut?.proposed).toBe(true);
    // 54 + 2·0.5 = 55.0 exactly.
    expect(k.cut?.diameterMm).toBeCloseTo(55, 9);
    expect(k.effectiveRadialClearanceMm).toBeCloseTo(0.5, 9);
    // 24.7 + 0.5 = 25.2.
    expect(k.cut?.depthMm).toBeCloseTo(25.2, 9);
    expect(k.depthClearanceMm).toBeCloseTo(0.5, 9);
    expect(k.interference.vsMouth?.deepestMm).toBeCloseTo(4, 9);
    expect(k.interference.vsMouth?.areaMm2).toBeCloseTo(Math.PI * 27 * 27 - Math.PI * 23 * 23, 6);
  });

  it("with a rig, the proposed cut lands the cutter setting on the rig's resolution", () => {
    const input = { ...roundStudyInput(), rig: { ...testRig, settingResolutionMm: 0.2 } };
    const k = evaluateStudy(parse(input)).kits[0];
    const setting = k.rig?.cutterSettingMm ?? NaN;
    expect(Math.abs(setting / 0.2 - Math.round(setting / 0.2))).toBeLessThan(1e-6);
    expect(k.cut?.diameterMm).toBeGreaterThanOrEqual(55 - 1e-9);
    expect(k.cut?.diameterMm).toBeLessThan(55 + 0.4);
  });

  it("a kit on another stud pattern cannot fit even when its skirt clears", () => {
    const input = roundStudyInput();
    input.kits[0].skirtDiameterReadingsMm = [44];
    input.kits[0].studs = input.kits[0].studs.map((s) => ({ ...s, positionMm: [s.positionMm[0] * 1.1, s.positionMm[1] * 1.1] as [number, number] }));
    expectCannotFit(evaluateStudy(parse(input)).kits[0], ["stud-pattern-mismatch"]);
  });

  it("a skirt that needs more than the case can give cannot fit, naming the pocket it breaks into", () => {
    const input = polygonStudyInput();
    input.kits[0].skirtDiameterReadingsMm = [62];
    const k = evaluateStudy(parse(input)).kits[0];
    expectCannotFit(k, ["cut-breaks-into-pocket", "cut-larger-than-case-allows"], ["cut-breaks-into-pocket"]);
    expect(k.maxCutDiameterMm).toBeCloseTo(58, 9);
  });

  it("a planned cut that is too shallow is reported as such", () => {
    const k = evaluateStudy(parse({ ...roundStudyInput(), cut: { diameterMm: 55.2, depthMm: 25 } })).kits[0];
    expect(k.depthClearanceMm).toBeCloseTo(0.3, 9);
    expectCannotFit(k, ["depth-clearance-below-minimum"]);
  });

  it("a cut that reaches the mouth's depth leaves no step and warns that it opens into the crank chamber", () => {
    const input = roundStudyInput();
    input.kits[0].skirtLengthReadingsMm = [27];
    const k = evaluateStudy(parse(input)).kits[0];
    expect(k.cut?.throughMouth).toBe(true);
    expect(k.depthClearanceMm).toBeNull();
    expect(k.cut?.depthMm).toBeCloseTo(26, 9);
    expect(codes(k)).toContain("cut-through-mouth");
  });

  it("a kit always run with a gasket may subtract its thinnest gasket from the protrusion", () => {
    const input = roundStudyInput();
    input.kits[0] = { ...input.kits[0], baseGasketsMm: [0.5, 0.3], alwaysWithGasket: true };
    const k = evaluateStudy(parse(input)).kits[0];
    expect(k.skirt.protrusionMm).toBeCloseTo(24.4, 9);
    expect(k.cut?.depthMm).toBeCloseTo(24.9, 9);
  });
});

describe("rig warnings", () => {
  it("a bit too long, hardware that strikes, a stop that cannot reach and mismatched threads each warn in words", () => {
    const input = {
      ...roundStudyInput(),
      case: { ...roundStudyInput().case, studThread: "M7" },
      rig: { ...testRig, bitLengthMm: 40, hardwareRadiusMm: 27, grooves: [{ label: "short", travelMm: 20 }], studThread: "M8" },
    };
    const r = evaluateStudy(parse(input));
    const k = r.kits[0];
    expect(k.rig?.bitReaches).toBe(false);
    expect(k.rig?.grindOffMm).toBeGreaterThan(0);
    expect(k.rig?.hardwareClears).toBe(false);
    expect(k.rig?.depthStop.reached).toBe(false);
    expect(codes(k)).toEqual(expect.arrayContaining(["bit-cannot-reach", "hardware-strikes", "depth-stop-unreachable"]));
    expect(r.warnings.map((w) => w.code)).toContain("thread-mismatch");
    for (const w of [...k.warnings, ...r.warnings]) expect(w.message.length).toBeGreaterThan(20);
  });
});

describe("displacement", () => {
  it("a 40 → 47 mm bore on a 39.2 mm stroke crosses the 50 cc class and warns that local rules decide", () => {
    const k = evaluateStudy(parse(roundStudyInput())).kits[0];
    expect(k.displacementCc.stock).toBeCloseTo((Math.PI / 4) * 40 * 40 * 39.2 / 1000, 9);
    expect(k.displacementCc.change).toBeCloseTo(k.displacementCc.kit - k.displacementCc.stock, 12);
    expect(k.displacementCc.crossesClasses).toEqual([50]);
    const w = k.warnings.find((x) => x.code === "displacement-crosses-class");
    expect(w?.message).toMatch(/local rules/);
  });
});

describe("material removed", () => {
  it("is the ring between the cut and the round mouth times the depth, and its mass at the alloy density", () => {
    const input = roundStudyInput();
    input.case.densityGPerCm3 = 2.74;
    const k = evaluateStudy(parse({ ...input, cut: { diameterMm: 56, depthMm: 25 } })).kits[0];
    const v = (Math.PI / 4) * (56 * 56 - 46 * 46) * 25;
    expect(k.removal.volumeMm3).toBeCloseTo(v, 6);
    expect(k.removal.massG).toBeCloseTo((v / 1000) * 2.74, 6);
    expect(k.removal.densityDefaulted).toBe(false);
  });
  it("an offset cut removes the cut's area minus its lens with the mouth", () => {
    const k = evaluateStudy(parse({ ...roundStudyInput(), cut: { diameterMm: 56, depthMm: 25, centerOffsetMm: [1, 0] } })).kits[0];
    expect(k.removal.areaMm2).toBeCloseTo(Math.PI * 28 * 28 - lensArea(28, 23, 1), 6);
  });
});

describe("limits", () => {
  it("lists every limit the study leaves out as defaulted and uses the study's own values", () => {
    const r = evaluateStudy(parse({ ...roundStudyInput(), limits: { minWallMm: 3 } }));
    expect(r.limits.values.minWallMm).toBe(3);
    expect(r.limits.defaulted).not.toContain("minWallMm");
    expect(r.limits.defaulted).toContain("minRadialClearanceMm");
    expect(r.limits.values.minRadialClearanceMm).toBe(DEFAULT_LIMITS.minRadialClearanceMm);
    expect(r.limits.defaulted).toHaveLength(Object.keys(DEFAULT_LIMITS).length - 1);
  });
});

describe("the example study", () => {
  const raw = JSON.parse(readFileSync(new URL("../../public/examples/study.json", import.meta.url), "utf8"));
  it("is valid, evaluates, and the result matches the result schema", () => {
    const study = StudySchema.parse(raw);
    const r = evaluateStudy(study);
    expect(StudyResultSchema.safeParse(r).success).toBe(true);
    expect(r.kits.map((k) => k.kitId)).toEqual(study.kits.map((k) => k.id));
    expect(r.kits.some((k) => k.verdict === "fits-after-cut")).toBe(true);
  });
  it("leaves the study it evaluates unchanged, so a page can evaluate the same study again", () => {
    const study = StudySchema.parse(raw);
    const before = structuredClone(study);
    evaluateStudy(study);
    expect(study).toEqual(before);
  });
});

describe("the study-wide figures", () => {
  it("the holder's warnings are the study's: two readings cannot show a tilt", () => {
    const s = roundStudyInput();
    const r = evaluateStudy(parse({ ...s, readings: { holderHeights: [{ stud: "a", heightMm: 20 }, { stud: "b", heightMm: 20.1 }] } }));
    expect(codes(r)).toContain("readings-insufficient");
  });

  it("the rig's studs are checked against the case's thread: M8 and M8x1.25 mate, M8x1 does not (ISO 262:1998, Table 1)", () => {
    const s = roundStudyInput();
    const at = (rigThread: string) => evaluateStudy(parse({ ...s, case: { ...s.case, studThread: "M8" }, rig: { ...testRig, studThread: rigThread } }));
    expect(at("M8x1.25").case.rigThread).toEqual({ case: "M8x1.25", rig: "M8x1.25", ok: true });
    expect(codes(at("M8x1.25"))).not.toContain("thread-mismatch");
    expect(codes(at("M8x1"))).toContain("thread-mismatch");
  });

  it("says whether the crank chamber was checked", () => {
    const s = roundStudyInput();
    expect(evaluateStudy(parse(s)).case.crankChecked).toBe(false);
    expect(evaluateStudy(parse({ ...s, case: { ...s.case, crank: { deckToAxisMm: 45.7, webRadiusMm: 21, webSpanMm: 40 } } })).case.crankChecked).toBe(true);
  });
});
