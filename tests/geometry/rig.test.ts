import { describe, expect, it } from "vitest";
import { bitLengthWindowMm, checkBit, cutDiameterFromSettingMm, cutterSettingMm, hardwareClearanceMm } from "../../geometry/rig";
import { chooseDepthStop, depthStopWorkBound, searchDepthStop } from "../../geometry/depth-stop";
import { spindleSpeed } from "../../geometry/speed";
import { testRig } from "./fixtures";

const TOL = 1e-9;
// A bit cut down to 35 mm reaching 52.5–62 mm, and a cutter setting read across head and bit: common practice,
// no published source (the same figures as in sources.test.ts). Expected values are worked by hand.
const calibration = { bitLengthMm: 35, minCutDiameterMm: 52.5, maxCutDiameterMm: 62 };

describe("cutter setting", () => {
  it("converts back to the cut diameter it was computed from", () => {
    expect(cutDiameterFromSettingMm(cutterSettingMm(55.3, 34.5), 34.5)).toBeCloseTo(55.3, 12);
  });
});

describe("bit reach", () => {
  it("a bit too long for a small bore must be ground down to the window's longest length", () => {
    const bit = checkBit(50, { bitLengthMm: 35, calibration }, TOL);
    expect(bit.reaches).toBe(false);
    // Window max = 35 + (50 − 52.5)/2 = 33.75, so grind off 1.25 mm.
    expect(bit.grindOffMm).toBeCloseTo(1.25, 9);
    expect(bit.tooShortByMm).toBe(0);
  });
  it("a bit too short for a big bore needs to be longer by the window's shortest length minus its own", () => {
    const bit = checkBit(65, { bitLengthMm: 35, calibration }, TOL);
    expect(bit.reaches).toBe(false);
    expect(bit.tooShortByMm).toBeCloseTo(1.5, 9);
    expect(bit.grindOffMm).toBe(0);
  });
  it("every length inside the window reaches the cut and lengths outside do not", () => {
    const w = bitLengthWindowMm(57, calibration);
    for (const L of [w.min, (w.min + w.max) / 2, w.max]) expect(checkBit(57, { bitLengthMm: L, calibration }, TOL).reaches).toBe(true);
    expect(checkBit(57, { bitLengthMm: w.min - 0.01, calibration }, TOL).reaches).toBe(false);
    expect(checkBit(57, { bitLengthMm: w.max + 0.01, calibration }, TOL).reaches).toBe(false);
  });
});

describe("rotating hardware", () => {
  it("screw heads at 27 mm radius leave 0.5 mm inside a 55 mm cut", () => {
    expect(hardwareClearanceMm(55, 27)).toBeCloseTo(0.5, 12);
  });
});

describe("depth stop", () => {
  // Grooves at 22 and 26 mm; five 0.1 mm and four 0.5 mm shims.
  const rig = { grooves: testRig.grooves, shims: testRig.shims };

  it("picks the groove and shims whose travel is at or just above the wanted depth", () => {
    const s = chooseDepthStop(25.2, rig, TOL);
    expect(s.reached).toBe(true);
    expect(s.groove).toBe("g2");
    expect(s.travelMm).toBeCloseTo(25.2, 9);
    expect(s.shimStackMm).toBeCloseTo(0.8, 9);
  });

  it("prefers fewer shims when two stacks give the same travel", () => {
    // 0.5 mm can be one 0.5 shim or five 0.1 shims.
    const s = chooseDepthStop(25.5, rig, TOL);
    expect(s.shimCount).toBe(1);
    expect(s.shims).toEqual([{ thicknessMm: 0.5, count: 1 }]);
  });

  it("never undershoots, even when the next travel is far above", () => {
    const s = chooseDepthStop(22.05, { grooves: rig.grooves, shims: [] }, TOL);
    expect(s.groove).toBe("g2");
    expect(s.travelMm).toBeGreaterThanOrEqual(22.05);
  });

  it("says plainly that no combination reaches a depth beyond the deepest groove", () => {
    const s = chooseDepthStop(27, rig, TOL);
    expect(s.reached).toBe(false);
    expect(s.travelMm).toBe(26);
  });

  it("handles a large shim stock without blowing up", () => {
    const many = { grooves: rig.grooves, shims: [0.05, 0.1, 0.2, 0.25, 0.3, 0.5, 1, 2].map((t) => ({ thicknessMm: t, count: 20 })) };
    // The work, counted in stack states rather than timed (a clock flakes on a busy machine): within the search's
    // bound, far below the 21⁸ ≈ 3.8·10¹⁰ stacks of listing every combination.
    const { stop: s, statesVisited } = searchDepthStop(13.37, many, TOL);
    expect(statesVisited).toBeLessThanOrEqual(depthStopWorkBound(many));
    expect(depthStopWorkBound(many)).toBeLessThan(21 ** 4 * 20);
    expect(s).toEqual(chooseDepthStop(13.37, many, TOL));
    expect(s.reached).toBe(true);
    expect(s.overshootMm).toBeGreaterThanOrEqual(-TOL);
    expect(s.overshootMm).toBeLessThan(0.05 + TOL);
  });
});

describe("spindle speed window", () => {
  it("is limited by a drill whose top speed is inside the window and too slow below it", () => {
    const s = spindleSpeed(55, 100, 150, 700);
    expect(s.min).toBeCloseTo((1000 * 100) / (Math.PI * 55), 9);
    expect(s.drillLimited).toBe(true);
    expect(s.drillTooSlow).toBe(false);
    expect(spindleSpeed(55, 100, 150, 500).drillTooSlow).toBe(true);
  });
});

describe("the setting to dial in", () => {
  it("rounds the exact cutter setting up to the rig's resolution, so the cut never comes out smaller than planned", async () => {
    const { evaluateStudy, parseStudy } = await import("../../geometry/index");
    const example = JSON.parse((await import("node:fs")).readFileSync("public/examples/study.json", "utf8"));
    // A planned cut whose exact setting falls between two 0.05 mm marks: (55.13 + head) / 2.
    const study = parseStudy({ ...example, cut: { ...(example.cut ?? {}), diameterMm: 55.13 } });
    const rig = evaluateStudy(study).kits[0].rig!;
    const resolution = rig.settingResolutionMm;
    expect(rig.cutterSettingToSetMm! + 1e-9).toBeGreaterThanOrEqual(rig.cutterSettingMm);
    expect(rig.cutterSettingToSetMm! - rig.cutterSettingMm).toBeLessThan(resolution + 1e-9);
    // On the grid: a whole number of resolution steps (common practice: a caliper reads to 0.05 mm or 0.01 mm).
    expect(Math.abs(rig.cutterSettingToSetMm! / resolution - Math.round(rig.cutterSettingToSetMm! / resolution))).toBeLessThan(1e-6);
    expect(rig.cutAtSettingMm!).toBeGreaterThanOrEqual(55.13 - 1e-9);
  });
});

describe("a bit at the ends of its reach", () => {
  // A bit calibrated at 35 mm reaching 52.5–62 mm (common practice, no published source): the ends themselves are
  // within reach, with no computing tolerance at all.
  const rig = { bitLengthMm: 35, calibration: { bitLengthMm: 35, minCutDiameterMm: 52.5, maxCutDiameterMm: 62 } };

  it("reaches a cut of exactly its smallest and of exactly its largest diameter", () => {
    expect(checkBit(52.5, rig, 0)).toMatchObject({ reaches: true, grindOffMm: 0, tooShortByMm: 0 });
    expect(checkBit(62, rig, 0)).toMatchObject({ reaches: true, grindOffMm: 0, tooShortByMm: 0 });
  });

  it("just past either end it does not: 0.25 mm too long for a 52 mm cut, 0.5 mm too short for a 63 mm cut", () => {
    expect(checkBit(52, rig, 0)).toMatchObject({ reaches: false, grindOffMm: 0.25, tooShortByMm: 0 });
    expect(checkBit(63, rig, 0)).toMatchObject({ reaches: false, grindOffMm: 0, tooShortByMm: 0.5 });
  });
});
