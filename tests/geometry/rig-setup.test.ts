// The rig's set-up for one cut, and a warning for each thing the rig cannot do. The rig is the invented test rig
// (34.5 mm head, 35 mm bit reaching 52.5–62 mm, hardware radius 21 mm, grooves 22 and 26 mm, shims 5 × 0.1 and
// 4 × 0.5 mm, drill to 2800 min⁻¹). Setting s = (D + D_head)/2 and the bit's reach moving 2 mm of diameter per mm
// of bit: common practice, no published source. Spindle speed n = 1000·Vc/(π·D): Tungaloy technical data. The
// cutting-speed window and hardware margin below are the test's own. Every figure is worked by hand beside it.
import { describe, expect, it } from "vitest";
import type { Warning } from "../../geometry/result-schema";
import { rigSetup } from "../../geometry/rig-setup";
import { DEFAULT_LIMITS } from "../../geometry/index";
import { testRig } from "./fixtures";

const L = { ...DEFAULT_LIMITS, displacementClassesCc: [], hardwareMarginMm: 1, cuttingSpeedMinMPerMin: 100, cuttingSpeedMaxMPerMin: 200 };
const TOL = 1e-9;

function setUp(rig: Partial<typeof testRig> & { settingResolutionMm?: number; hardwareRadiusMm?: number }, diameterMm: number, depthMm: number, limits = L) {
  const warnings: Warning[] = [];
  const result = rigSetup({ ...testRig, ...rig } as never, diameterMm, depthMm, limits, TOL, warnings);
  return { result, warnings, codes: warnings.map((w) => w.code) };
}

describe("the rig's set-up for a cut", () => {
  it("a 55 mm cut 24.5 mm deep that the rig can do: every figure, no warning", () => {
    const { result, warnings } = setUp({}, 55, 24.5);
    expect(warnings).toEqual([]);
    expect(result.cutterSettingMm).toBeCloseTo(44.75, 12); // (55 + 34.5) / 2
    expect(result.cutterSettingToSetMm).toBe(44.75); // on the 0.05 mm default resolution already
    expect(result.cutAtSettingMm).toBe(55); // 2·44.75 − 34.5
    expect(result.settingResolutionMm).toBe(0.05);
    expect(result.bitLengthMm).toBe(35);
    expect(result.bitReachMm).toEqual({ min: 52.5, max: 62 });
    expect(result.bitReaches).toBe(true);
    // [35 + (55 − 62)/2, 35 + (55 − 52.5)/2]
    expect(result.bitLengthWindowMm).toEqual({ min: 31.5, max: 36.25 });
    expect(result.grindOffMm).toBe(0);
    expect(result.bitTooShortByMm).toBe(0);
    expect(result.hardwareClearanceMm).toBe(6.5); // 55/2 − 21
    expect(result.hardwareClears).toBe(true);
    // 26 − 24.5 = 1.5 mm of shims on the deeper groove: three 0.5 mm shims (fewer than 2 × 0.5 + 5 × 0.1).
    expect(result.depthStop).toMatchObject({ groove: "g2", shims: [{ thicknessMm: 0.5, count: 3 }], reached: true, shimCount: 3 });
    expect(result.depthStop.travelMm).toBeCloseTo(24.5, 12);
    expect(result.spindleRpm.min).toBeCloseTo(100_000 / (Math.PI * 55), 9);
    expect(result.spindleRpm.max).toBeCloseTo(200_000 / (Math.PI * 55), 9);
    expect(result.spindleRpm).toMatchObject({ drillTopRpm: 2800, drillLimited: false, drillTooSlow: false });
  });

  it("rounds the setting up to the rig's own resolution and gives the cut it makes", () => {
    // 44.75 up to 0.2 mm steps: 44.8; the cut at that setting 2·44.8 − 34.5 = 55.1.
    const { result } = setUp({ settingResolutionMm: 0.2 }, 55, 24.5);
    expect(result.cutterSettingMm).toBeCloseTo(44.75, 12);
    expect(result.cutterSettingToSetMm).toBe(44.8);
    expect(result.cutAtSettingMm).toBe(55.1);
    expect(result.settingResolutionMm).toBe(0.2);
  });

  it("hardware exactly at its margin clears; a rig that gives no hardware radius is not judged", () => {
    expect(setUp({}, 55, 24.5, { ...L, hardwareMarginMm: 6.5 })).toMatchObject({ result: { hardwareClearanceMm: 6.5, hardwareClears: true }, warnings: [] });
    // With no tolerance at all, exactly at the margin still clears.
    expect(rigSetup(testRig as never, 55, 24.5, { ...L, hardwareMarginMm: 6.5 }, 0, []).hardwareClears).toBe(true);
    const strikes = setUp({}, 55, 24.5, { ...L, hardwareMarginMm: 7 });
    expect(strikes.result.hardwareClears).toBe(false);
    expect(strikes.codes).toEqual(["hardware-strikes"]);
    expect(strikes.warnings[0].message).toContain("come within 6.50 mm of the cut radius (margin wanted 7.00 mm)");
    const none = setUp({ hardwareRadiusMm: undefined }, 55, 24.5, { ...L, hardwareMarginMm: 100 });
    expect(none.result).toMatchObject({ hardwareClearanceMm: null, hardwareClears: null });
    expect(none.codes).toEqual([]);
  });
});

describe("what the rig cannot do", () => {
  it("a bit too long for a small cut: how much to grind off", () => {
    // 50 mm: the window tops out at 35 + (50 − 52.5)/2 = 33.75, so 1.25 mm off the 35 mm bit.
    const { result, warnings } = setUp({}, 50, 24.5, { ...L, hardwareMarginMm: 0 });
    expect(result).toMatchObject({ bitReaches: false, grindOffMm: 1.25, bitTooShortByMm: 0 });
    expect(warnings).toEqual([{ code: "bit-cannot-reach", message: expect.stringContaining("too long to cut 50.00 mm: grind at least 1.25 mm off") }]);
  });

  it("a bit too short for a large cut: how much longer a bit must be", () => {
    // 64 mm: the window starts at 35 + (64 − 62)/2 = 36, so a bit 1 mm longer.
    const { result, warnings } = setUp({}, 64, 24.5);
    expect(result).toMatchObject({ bitReaches: false, grindOffMm: 0, bitTooShortByMm: 1 });
    expect(warnings).toEqual([{ code: "bit-cannot-reach", message: expect.stringContaining("too short to reach 64.00 mm: fit a bit at least 1.00 mm longer") }]);
  });

  it("a depth beyond the deepest groove", () => {
    const { result, warnings } = setUp({}, 55, 27);
    expect(result.depthStop).toMatchObject({ reached: false, groove: "g2", travelMm: 26 });
    expect(warnings).toEqual([{ code: "depth-stop-unreachable", message: expect.stringContaining("wanted depth of 27.00 mm; the deepest travel available is 26.00 mm") }]);
  });

  it("a drill slower than the window's bottom", () => {
    // The window's bottom at 55 mm: 100 000/(π·55) ≈ 578.7 min⁻¹.
    const slow = setUp({ drillTopRpm: 500 }, 55, 24.5);
    expect(slow.result.spindleRpm.drillTooSlow).toBe(true);
    expect(slow.warnings).toEqual([{ code: "drill-too-slow", message: expect.stringContaining("top speed of 500 min⁻¹ is below the 579 min⁻¹") }]);
    expect(setUp({ drillTopRpm: 600 }, 55, 24.5).codes).toEqual([]);
  });
});
