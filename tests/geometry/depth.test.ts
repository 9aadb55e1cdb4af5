// The skirt's protrusion and the counterbore's depth clearance, on figures worked by hand. That a kit run with a
// base gasket sits higher by the gasket's thickness, and that the step the skirt would sit on is lost once the cut
// reaches the mouth's full depth: common practice, no published source.
import { describe, expect, it } from "vitest";
import { depthClearance, requiredCutDepthMm, skirtProtrusionMm } from "../../geometry/depth";

describe("skirt protrusion", () => {
  const readings = [24.55, 24.7, 24.62];

  it("is the longest skirt reading less the thinnest gasket the kit is always run with", () => {
    const p = skirtProtrusionMm({ skirtLengthReadingsMm: readings, baseGasketsMm: [0.5, 0.3], alwaysWithGasket: true });
    expect(p.lengthMm).toBe(24.7);
    expect(p.gasketMm).toBe(0.3);
    expect(p.protrusionMm).toBeCloseTo(24.4, 12);
  });

  it("takes no gasket off when the kit may run without one, or lists none", () => {
    expect(skirtProtrusionMm({ skirtLengthReadingsMm: readings, baseGasketsMm: [0.3], alwaysWithGasket: false })).toEqual({ protrusionMm: 24.7, lengthMm: 24.7, gasketMm: 0 });
    expect(skirtProtrusionMm({ skirtLengthReadingsMm: readings, baseGasketsMm: [], alwaysWithGasket: true })).toEqual({ protrusionMm: 24.7, lengthMm: 24.7, gasketMm: 0 });
  });
});

describe("depth clearance", () => {
  it("a 25 mm cut whose tilted bottom varies 0.2 mm leaves 24.8 − 24.4 = 0.4 mm under a 24.4 mm skirt", () => {
    const d = depthClearance(25, 0.2, 24.4, 26, 1e-9);
    expect(d.shallowestDepthMm).toBeCloseTo(24.8, 12);
    expect(d.depthClearanceMm).toBeCloseTo(0.4, 12);
    expect(d.throughMouth).toBe(false);
  });

  it("a cut whose shallowest point reaches the mouth's depth leaves no step", () => {
    expect(depthClearance(26, 0, 24, 26, 0)).toEqual({ depthClearanceMm: null, shallowestDepthMm: 26, throughMouth: true });
    // Short of the mouth's depth by less than the tolerance: through; by more: a step remains.
    expect(depthClearance(25.9995, 0, 24, 26, 0.001).throughMouth).toBe(true);
    expect(depthClearance(25.99, 0, 24, 26, 0.001).throughMouth).toBe(false);
    expect(depthClearance(26.5, 0.2, 24, 26, 0).throughMouth).toBe(true);
  });
});

describe("the cut depth wanted", () => {
  it("is protrusion + minimum clearance + the bottom's variation: 24.7 + 0.5 + 0.2 = 25.4 mm", () => {
    expect(requiredCutDepthMm(24.7, 0.5, 0.2, 26)).toBeCloseTo(25.4, 12);
  });

  it("goes no deeper than where the shallowest point meets a 25 mm mouth: 25 + 0.2", () => {
    expect(requiredCutDepthMm(24.7, 0.5, 0.2, 25)).toBeCloseTo(25.2, 12);
  });
});
