// One kit on a tilted holder: how far the tool axis strays from the skirt over the depth the skirt meets the
// mouth wall, and where the lateral shift is reported. The fixture is the invented round study (Ø54 skirt,
// Ø46 mouth 26 mm deep, 0.5 mm minimum clearance, proposed diameters rounded up to 0.1 mm: common practice, no
// published source), the holder on h = 0.04·x + 2, so the tool axis at depth z sits (2 + z)·0.04 mm toward +x
// (geometry/alignment.ts). Every expected figure is worked by hand beside the check.
import { describe, expect, it } from "vitest";
import { evaluateStudy, type StudyInput } from "../../geometry/index";
import { offCentreStudyInput, parse, planeReadings, roundStudyInput, testRig } from "./fixtures";

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

describe("the cut against the skirt on a tilted holder", () => {
  it("the skirt is checked against the cut where the axis strays most, at the skirt's end", () => {
    // Cut Ø55 given: at the skirt's end the axis is 1.068 off, so the Ø54 skirt reaches 27 − (27.5 − 1.068) = 0.568
    // past the cut; at the deck (0.08 off) it would clear.
    const k = evaluateStudy(parse(tiltedStudy({}, { diameterMm: 55, depthMm: 25.5 }))).kits[0];
    expect(k.interference.vsCut?.deepestMm).toBeCloseTo(0.568, 9);
    expect(k.effectiveRadialClearanceMm).toBeCloseTo(27.5 - 27 - 1.068, 9);
  });
});

describe("one kit's figures, level holder", () => {
  it("a skirt that clears the mouth by exactly the minimum fits as is, even with no tolerance", () => {
    // (46 − 45)/2 = 0.5 = the minimum.
    const input = roundStudyInput();
    input.kits[0].skirtDiameterReadingsMm = [45];
    const k = evaluateStudy(parse(input), { toleranceMm: 0 }).kits[0];
    expect(k.verdict).toBe("fits-as-is");
    expect(k.radialClearanceMm.vsMouth).toBe(0.5);
    expect(k.cut).toBeNull();
  });

  it("a skirt that ends exactly at the deck does not enter the case, even with no tolerance", () => {
    // 24.7 mm skirt on a 24.7 mm gasket: protrusion 0. The Ø54 skirt is wider than the Ø46 mouth, but never in it.
    const input = roundStudyInput();
    input.kits[0] = { ...input.kits[0], baseGasketsMm: [24.7], alwaysWithGasket: true };
    const k = evaluateStudy(parse(input), { toleranceMm: 0 }).kits[0];
    expect(k.skirt.protrusionMm).toBe(0);
    expect(k.verdict).toBe("fits-as-is");
    expect(k.interference.vsMouth).toBeNull();
    expect(k.cut).toBeNull();
    expect(k.leastCut).toBeNull();
  });

  it("a skirt that clears the mouth with only a depth given is still cut to that depth", () => {
    const input = { ...roundStudyInput(), cut: { depthMm: 20 } };
    input.kits[0].skirtDiameterReadingsMm = [44.8];
    const k = evaluateStudy(parse(input)).kits[0];
    expect(k.cut?.depthMm).toBe(20);
    expect(k.cut?.depthProposed).toBe(false);
    expect(k.leastCut).toBeNull();
  });

  it("with no cut: no cut clearance, walls or removal, and the case's own largest cut", () => {
    const input = roundStudyInput();
    input.kits[0].skirtDiameterReadingsMm = [44.8];
    const r = evaluateStudy(parse(input));
    const k = r.kits[0];
    expect(k.radialClearanceMm.vsCut).toBeNull();
    expect(k.effectiveRadialClearanceMm).toBeNull();
    expect(k.depthClearanceMm).toBeNull();
    expect(k.interference).toEqual({ vsMouth: null, vsCut: null });
    expect(k.walls).toEqual([]);
    expect(k.thinnestWall).toBeNull();
    expect(k.maxCutDiameterMm).toBe(r.case.maxCutDiameterMm);
    // The density defaulted: A356.0-T6, 2.67 g/cm³ (MatWeb), as geometry/limits.ts names it.
    expect(k.removal).toEqual({ areaMm2: 0, volumeMm3: 0, massG: 0, densityGPerCm3: 2.67, densityDefaulted: true });
  });

  it("a kit with its own stroke is measured on it, not the case's", () => {
    // V = π/4·B²·S/1000 (howmotorcycleswork.com, "engine mathematics"): 47 mm bore, 42 mm stroke → 72.87 cc;
    // the stock 40 × 39.2 → 49.26 cc.
    const input = roundStudyInput();
    input.kits[0].strokeMm = 42;
    const d = evaluateStudy(parse(input)).kits[0].displacementCc;
    const kit = (Math.PI / 4) * 47 * 47 * 42 / 1000;
    const stock = (Math.PI / 4) * 40 * 40 * 39.2 / 1000;
    expect(d.kit).toBeCloseTo(kit, 9);
    expect(d.stock).toBeCloseTo(stock, 9);
    expect(d.change).toBeCloseTo(kit - stock, 9);
    expect(d).toMatchObject({ kitRounded: 73, stockRounded: 49 });
  });
});

describe("the kit's studs on the case", () => {
  // ISO 262:1998, Table 1: the coarse pitch of M8 is 1.25 mm, so "M8" is M8×1.25 and M8×1 is a fine thread.
  const withThreads = (caseThread?: string, kitThread?: string): StudyInput => {
    const s = roundStudyInput();
    return { ...s, case: { ...s.case, studThread: caseThread }, kits: [{ ...s.kits[0], studThread: kitThread }] };
  };
  const codes = (input: StudyInput) => evaluateStudy(parse(input)).kits[0].warnings.map((w) => w.code);

  it("a kit on the case's own pattern and thread: matched, no warning about either", () => {
    const k = evaluateStudy(parse(withThreads("M8", "M8x1.25"))).kits[0];
    expect(k.studMatch.ok).toBe(true);
    expect(k.studMatch.thread).toEqual({ case: "M8x1.25", kit: "M8x1.25", ok: true });
    expect(codes(withThreads("M8", "M8x1.25"))).not.toContain("stud-pattern-mismatch");
    expect(codes(withThreads("M8", "M8x1.25"))).not.toContain("kit-thread-differs");
  });

  it("a kit thread that differs from the case's warns in words", () => {
    const k = evaluateStudy(parse(withThreads("M8", "M8x1"))).kits[0];
    expect(k.studMatch.thread).toEqual({ case: "M8x1.25", kit: "M8x1", ok: false });
    expect(k.warnings.filter((w) => w.code === "kit-thread-differs")).toHaveLength(1);
  });

  it("a thread is compared only when both the case and the kit give one", () => {
    expect(evaluateStudy(parse(withThreads("M8", undefined))).kits[0].studMatch.thread).toBeNull();
    expect(evaluateStudy(parse(withThreads(undefined, "M8"))).kits[0].studMatch.thread).toBeNull();
  });
});

describe("the cut against the skirt when the deck is where the axis strays most", () => {
  it("a pattern 1 mm off toward −x with the holder leaning to +x: the skirt is checked at the deck", () => {
    // Pattern centre (−1, 0), holder h = 0.04·x + 2.04, so h₀ = 2 at the bearing: the axis sits at
    // −1 + (2 + z)·0.04, 0.92 off at the deck and 0.068 off at the skirt's end (z = 24.7). Against a Ø55 cut
    // the Ø54 skirt reaches 27 − (27.5 − 0.92) = 0.42 past it toward +x, at the deck.
    const s = offCentreStudyInput([-1, 0]);
    const k = evaluateStudy(parse({ ...s, cut: { diameterMm: 55, depthMm: 25.5 }, readings: planeReadings(s.case.studs, 0.04, 0, 2.04) })).kits[0];
    expect(k.alignment?.worstAxisOffsetMm).toBeCloseTo(0.92, 9);
    expect(k.interference.vsCut?.deepestMm).toBeCloseTo(0.42, 9);
    expect(k.interference.vsCut?.angleDeg).toBeCloseTo(0, 9);
  });
});

describe("a clearance exactly at the minimum, with the core's own tolerance", () => {
  it("fits as is", () => {
    // (46 − 45)/2 = 0.5 = the minimum, exactly.
    const input = roundStudyInput();
    input.kits[0].skirtDiameterReadingsMm = [45];
    const k = evaluateStudy(parse(input)).kits[0];
    expect(k.verdict).toBe("fits-as-is");
    expect(k.cut).toBeNull();
  });
});

describe("one kit's result, each part", () => {
  // The invented round study: a Ø54 skirt in a Ø46 mouth on a 40 × 39.2 mm stock engine (49.26 cc, under the 50 cc
  // class) with a 47 mm kit (68.01 cc, over it); 50 cc the moped limit (Regulation (EU) No 168/2013, Annex I,
  // L1e-B, from memory).
  it("a kit made for another stud pattern is warned and cannot fit", () => {
    const s = roundStudyInput();
    const k = evaluateStudy(parse({ ...s, kits: [{ ...s.kits[0], studs: s.kits[0].studs.map((t) => ({ ...t, positionMm: [t.positionMm[0] * (30 / 28), t.positionMm[1] * (30 / 28)] as [number, number] })) }] })).kits[0];
    expect(k.warnings.map((w) => w.code)).toContain("stud-pattern-mismatch");
    expect(k.verdict).toBe("cannot-fit");
  });

  it("a kit that crosses a displacement class is warned", () => {
    const k = evaluateStudy(parse(roundStudyInput())).kits[0];
    expect(k.warnings.filter((w) => w.code === "displacement-crosses-class")).toHaveLength(1);
  });

  it("a planned cut on a rig gets the rig's set-up and the cut's own warnings", () => {
    // A Ø56 cut leaves 28√2 − 3.75 − 28 = 7.85 mm of land; a 9 mm minimum makes it fail.
    const k = evaluateStudy(parse({ ...roundStudyInput(), rig: testRig, cut: { diameterMm: 56, depthMm: 25.5 }, limits: { minSealingLandMm: 9 } })).kits[0];
    expect(k.rig).not.toBeNull();
    expect(k.warnings.map((w) => w.code)).toContain("sealing-land-below-minimum");
  });

  it("a skirt that already clears the mouth: no walls, no cut, unless a cut is given, which is then planned and warned as not needed", () => {
    const s = roundStudyInput();
    const small = { ...s, kits: [{ ...s.kits[0], skirtDiameterReadingsMm: [44] }] };
    const asIs = evaluateStudy(parse(small)).kits[0];
    expect(asIs.verdict).toBe("fits-as-is");
    expect(asIs.cut).toBeNull();
    expect(asIs.walls).toEqual([]);
    // Its only warnings: the crank chamber not checked (none given) and the displacement class crossed.
    expect(asIs.warnings.map((w) => w.code).sort()).toEqual(["crank-chamber-not-checked", "displacement-crosses-class"]);
    for (const cut of [{ diameterMm: 56 }, { depthMm: 25 }]) {
      const k = evaluateStudy(parse({ ...small, cut })).kits[0];
      expect(k.cut).not.toBeNull();
      expect(k.warnings.map((w) => w.code)).toContain("cut-not-needed");
    }
  });
});
