import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { StudySchema, evaluateStudy, type Study } from "../../geometry/index";
import { studyArb } from "./arbitraries";
import { parse, roundStudyInput, testRig } from "./fixtures";
import { propertyRuns } from "./runs";

/** The study with the diameter and depth left out (the centring offset kept), so the core proposes each kit's cut. */
const unplanned = (s: Study): Study => ({ ...s, cut: s.cut?.centerOffsetMm ? { centerOffsetMm: s.cut.centerOffsetMm } : undefined });

describe("each kit's least cut", { timeout: 60_000 }, () => {
  it("without a rig: D = skirt + 2·minimum clearance rounded up to 0.1 mm, depth = protrusion + minimum rounded up to 0.05 mm", () => {
    // Skirt 54 mm, minimum radial clearance 0.5 (default): 54 + 2·0.5 = 55.0 mm; length 24.7 + 0.5 = 25.2 mm.
    // Worked here by hand from the formula; the clearances are common practice, no published source.
    const k = evaluateStudy(parse(roundStudyInput())).kits[0];
    expect(k.leastCut?.diameterMm).toBeCloseTo(55, 9);
    expect(k.leastCut?.depthMm).toBeCloseTo(25.2, 9);
  });

  it("with a rig it is rounded up so the cutter setting lands on the rig's resolution, and stays whatever cut is planned", () => {
    // Needed 55.0 mm with a 34.5 mm head: setting (55 + 34.5)/2 = 44.75 → up to 0.2 mm steps 44.8 → D = 2·44.8 − 34.5 = 55.1 mm.
    const input = { ...roundStudyInput(), rig: { ...testRig, settingResolutionMm: 0.2 }, cut: { diameterMm: 58, depthMm: 26 } };
    const k = evaluateStudy(parse(input)).kits[0];
    expect(k.cut?.diameterMm).toBe(58);
    expect(k.leastCut?.diameterMm).toBeCloseTo(55.1, 9);
    expect(k.leastCut?.depthMm).toBeCloseTo(25.2, 9);
  });

  it("is null when the skirt already clears the mouth, even with a cut planned", () => {
    const input = { ...roundStudyInput(), cut: { diameterMm: 50 } };
    input.kits[0].skirtDiameterReadingsMm = [44.8];
    const k = evaluateStudy(parse(input)).kits[0];
    expect(k.cut).not.toBeNull();
    expect(k.leastCut).toBeNull();
  });

  it("equals the cut the core proposes when the study gives no diameter or depth, for any study", () => {
    fc.assert(
      fc.property(studyArb(), (input) => {
        const study = StudySchema.parse(input);
        const planned = evaluateStudy(study);
        const proposed = evaluateStudy(unplanned(study));
        planned.kits.forEach((k, i) => {
          const p = proposed.kits[i].cut;
          expect(k.leastCut).toEqual(p ? { diameterMm: p.diameterMm, depthMm: p.depthMm } : null);
          expect(proposed.kits[i].leastCut).toEqual(k.leastCut);
        });
      }),
      { numRuns: propertyRuns(60) },
    );
  });
});
