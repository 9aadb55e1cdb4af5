// One kit on a tilted holder: how far the tool axis strays from the skirt over the depth the skirt meets the
// mouth wall, and where the lateral shift is reported. The fixture is the invented round study (Ø54 skirt,
// Ø46 mouth 26 mm deep, 0.5 mm minimum clearance, proposed diameters rounded up to 0.1 mm: common practice, no
// published source), the holder on h = 0.04·x + 2, so the tool axis at depth z sits (2 + z)·0.04 mm toward +x
// (geometry/alignment.ts). Every expected figure is worked by hand beside the check.
import { describe, expect, it } from "vitest";
import { evaluateStudy, type StudyInput } from "../../geometry/index";
import { parse, planeReadings, roundStudyInput } from "./fixtures";

function tiltedStudy(kit: Partial<StudyInput["kits"][number]>, cut?: StudyInput["cut"]): StudyInput {
  const s = roundStudyInput();
  return { ...s, cut, kits: [{ ...s.kits[0], ...kit }], readings: planeReadings(s.case.studs, 0.04, 0, 2) };
}

describe("the tool axis's stray over the skirt", () => {
  it("a skirt longer than the mouth is deep counts only down to the mouth's depth", () => {
    // Protrusion 30 mm, mouth 26 mm: the worst stray is at 26, (2 + 26)·0.04 = 1.12 mm (not (2 + 30)·0.04 = 1.28);
    // the least cut 2·(27 + 0.5 + 1.12) = 57.24, up to 57.3.
    const k = evaluateStudy(parse(tiltedStudy({ skirtLengthReadingsMm: [30] }))).kits[0];
    expect(k.alignment?.worstAxisOffsetMm).toBeCloseTo(1.12, 9);
    expect(k.leastCut?.diameterMm).toBeCloseTo(57.3, 9);
  });

  it("a skirt shorter than the mouth counts down to its own end", () => {
    // Protrusion 24.7: (2 + 24.7)·0.04 = 1.068; at the deck 2·0.04 = 0.08. Least cut 2·(27.5 + 1.068) = 57.136, up to 57.2.
    const k = evaluateStudy(parse(tiltedStudy({}))).kits[0];
    expect(k.alignment?.worstAxisOffsetMm).toBeCloseTo(1.068, 9);
    expect(k.leastCut?.diameterMm).toBeCloseTo(57.2, 9);
  });
});

describe("the lateral shift reported", () => {
  it("with no cut, at the skirt's end; no depth variation", () => {
    // Ø44.8 clears the Ø46 mouth by 0.6: no cut. Shift (2 + 24.7)·0.04 = 1.068.
    const k = evaluateStudy(parse(tiltedStudy({ skirtDiameterReadingsMm: [44.8] }))).kits[0];
    expect(k.cut).toBeNull();
    expect(k.alignment?.lateralShiftMm).toBeCloseTo(1.068, 9);
    expect(k.alignment?.depthVariationMm).toBe(0);
    expect(k.alignment?.directionDeg).toBeCloseTo(0, 9);
    expect(k.alignment?.tiltDeg).toBeCloseTo((Math.atan(0.04) * 180) / Math.PI, 9);
  });

  it("with a cut, at the cut's bottom, and the bottom varies by D·0.04", () => {
    // Cut 58 × 25: shift (2 + 25)·0.04 = 1.08; variation 58·0.04 = 2.32.
    const k = evaluateStudy(parse(tiltedStudy({}, { diameterMm: 58, depthMm: 25 }))).kits[0];
    expect(k.alignment?.lateralShiftMm).toBeCloseTo(1.08, 9);
    expect(k.alignment?.depthVariationMm).toBeCloseTo(2.32, 9);
  });
});
