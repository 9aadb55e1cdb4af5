// The limits in force: the study's own where it gives them, the shop defaults (geometry/limits.ts, each marked
// there as common practice or with its source) for the rest, and the names of those defaulted, so the result can
// show which figures were defaults.
import { describe, expect, it } from "vitest";
import { DEFAULT_LIMITS, type LimitName } from "../../geometry/limits";
import { resolveLimits } from "../../geometry/resolve-limits";

const NAMES = Object.keys(DEFAULT_LIMITS) as LimitName[];

describe("the limits in force", () => {
  it("a study with no limits takes every default and lists all eleven as defaulted", () => {
    const r = resolveLimits(undefined);
    expect(r.values).toEqual(DEFAULT_LIMITS);
    expect(r.defaulted.sort()).toEqual([...NAMES].sort());
    expect(NAMES).toHaveLength(11);
  });

  it("the default displacement class is 50 cc, the moped limit (Regulation (EU) No 168/2013, Annex I, L1e-B, from memory)", () => {
    expect(resolveLimits({}).values.displacementClassesCc).toEqual([50]);
  });

  it("a study's own figure is kept and not listed as defaulted", () => {
    const r = resolveLimits({ minWallMm: 3 });
    expect(r.values.minWallMm).toBe(3);
    expect(r.values.minSealingLandMm).toBe(DEFAULT_LIMITS.minSealingLandMm);
    expect(r.defaulted).not.toContain("minWallMm");
    expect(r.defaulted).toHaveLength(10);
  });

  it("every field given is kept, zero included", () => {
    const given = {
      minRadialClearanceMm: 0,
      minDepthClearanceMm: 0.7,
      minSealingLandMm: 4,
      minWallMm: 1,
      studToleranceMm: 0.2,
      hardwareMarginMm: 2,
      maxRockMm: 0.1,
      minCrankClearanceMm: 1.5,
      cuttingSpeedMinMPerMin: 80,
      cuttingSpeedMaxMPerMin: 120,
      displacementClassesCc: [50, 125],
    };
    const r = resolveLimits(given);
    expect(r.values).toEqual(given);
    expect(r.defaulted).toEqual([]);
  });

  it("the classes are a copy: changing them changes neither the study's nor the defaults", () => {
    const given = { displacementClassesCc: [125] };
    const r = resolveLimits(given);
    r.values.displacementClassesCc.push(250);
    expect(given.displacementClassesCc).toEqual([125]);
    resolveLimits(undefined).values.displacementClassesCc.push(250);
    expect(DEFAULT_LIMITS.displacementClassesCc).toEqual([50]);
  });
});
