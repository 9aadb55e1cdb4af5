// Studies off the easy path: a stud pattern off the cylinder axis, a holder tilted in x and y, unequal
// sealing-land and wall minimums, a mouth off the axis, depths and diameters that round differently up than
// to nearest, a cut deeper than the mouth, pockets that start below the cut. Every expected figure is worked
// out by hand from the fixture's geometry beside it.
import { describe, expect, it } from "vitest";
import { evaluateStudy } from "../../geometry/index";
import { removal } from "../../geometry/removal";
import { featureReaches } from "../../geometry/wall";
import { offCentreStudyInput, parse, planeReadings, roundStudyInput, squarePattern } from "./fixtures";

const wallOf = (k: { walls: { label: string; minWallMm: number; requiredMm: number; ok: boolean }[] }, label: string) => {
  const w = k.walls.find((x) => x.label === label);
  if (!w) throw new Error(`no wall "${label}"`);
  return w;
};

describe("the rig's bearing sits at the stud-pattern centre", () => {
  // Common practice, no published source: the boring rig is bolted to the cylinder studs, so its bearing is
  // centred on the stud pattern, wherever that lies relative to the cylinder axis.
  const input = offCentreStudyInput([3, 0]);
  const r = evaluateStudy(parse(input));
  const k = r.kits[0];

  it("a pattern centred 3 mm off the axis puts the cut's centre 3 mm off the axis", () => {
    expect(r.case.studPatternCenterMm[0]).toBeCloseTo(3, 12);
    expect(r.case.studPatternCenterMm[1]).toBeCloseTo(0, 12);
    expect(k.cut?.centerMm[0]).toBeCloseTo(3, 12);
    expect(k.cut?.centerMm[1]).toBeCloseTo(0, 12);
  });

  it("the least cut grows by twice the 3 mm offset: 2·(27 + 0.5 + 3) = 61 mm", () => {
    expect(k.cut?.diameterMm).toBeCloseTo(61, 9);
    expect(k.leastCut?.diameterMm).toBeCloseTo(61, 9);
    // R − r − |bearing − skirt centre| = 30.5 − 27 − 3.
    expect(k.radialClearanceMm.vsCut).toBeCloseTo(0.5, 9);
  });

  it("the walls to the studs are measured from the pattern centre: the same 28√2 − 3.75 − R for all four", () => {
    const expected = 28 * Math.SQRT2 - 3.75 - 30.5;
    for (const label of ["a", "b", "c", "d"]) expect(wallOf(k, label).minWallMm).toBeCloseTo(expected, 9);
    // The deck outline (Ø110 on the axis) is 55 − 3 from the centre toward +x.
    expect(wallOf(k, "deck outline").minWallMm).toBeCloseTo(55 - 3 - 30.5, 9);
  });

  it("a pattern off the axis in y moves the cut in y", () => {
    const y = evaluateStudy(parse(offCentreStudyInput([0, -2]))).kits[0];
    expect(y.cut?.centerMm[0]).toBeCloseTo(0, 12);
    expect(y.cut?.centerMm[1]).toBeCloseTo(-2, 12);
    expect(y.cut?.diameterMm).toBeCloseTo(59, 9);
  });
});

describe("the direction of the holder's tilt", () => {
  // The high side is the gradient (a, b) of h = a·x + b·y + c, degrees counter-clockwise from +x
  // (common practice, no published source; the plane fit itself is checked against a worked example in sources.test.ts).
  const studs = squarePattern(28);
  const tilted = (a: number, b: number) => evaluateStudy(parse({ ...roundStudyInput(), readings: planeReadings(studs, a, b, 20) }));

  it("the high side of a holder tilted toward +x+y is reported at 45°, with a tilt of atan(0.01·√2)", () => {
    const r = tilted(0.01, 0.01);
    expect(r.alignment?.a).toBeCloseTo(0.01, 12);
    expect(r.alignment?.b).toBeCloseTo(0.01, 12);
    expect(r.alignment?.directionDeg).toBeCloseTo(45, 9);
    expect(r.alignment?.tiltDeg).toBeCloseTo((Math.atan(0.01 * Math.SQRT2) * 180) / Math.PI, 12);
    expect(r.kits[0].alignment?.directionDeg).toBeCloseTo(45, 9);
  });

  it("the high side of a holder tilted toward +x−y is reported at 360° − atan(2) = 296.57°", () => {
    const r = tilted(0.01, -0.02);
    expect(r.alignment?.b).toBeCloseTo(-0.02, 12);
    expect(r.alignment?.directionDeg).toBeCloseTo(360 - (Math.atan(2) * 180) / Math.PI, 9);
  });

  it("the tool axis leans toward the high side: at the cut's bottom its centre has moved (h₀ + z)·(a, b)", () => {
    const k = tilted(0.01, 0.01).kits[0];
    const z = k.cut?.depthMm ?? NaN;
    // h₀ = 20 at the pattern centre (0, 0).
    expect(k.cut?.centerAtBottomMm[0]).toBeCloseTo(0.01 * (20 + z), 12);
    expect(k.cut?.centerAtBottomMm[1]).toBeCloseTo(0.01 * (20 + z), 12);
    expect(k.alignment?.lateralShiftMm).toBeCloseTo(0.01 * Math.SQRT2 * (20 + z), 12);
  });
});

describe("walls of a tilted cut", () => {
  // Tilt a = 0.01 in x, h₀ = 20: the axis is at x = 0.2 at the deck and x = 0.45 at the 25 mm bottom.
  const input = { ...roundStudyInput(), readings: planeReadings(squarePattern(28), 0.01, 0, 20), cut: { diameterMm: 56, depthMm: 25 } };
  const k = evaluateStudy(parse(input)).kits[0];

  it("the stud on the high side (+x) is thinnest at the cut's bottom", () => {
    expect(wallOf(k, "b").minWallMm).toBeCloseTo(Math.hypot(28 - 0.45, 28) - 3.75 - 28, 9);
    expect(wallOf(k, "c").minWallMm).toBeCloseTo(Math.hypot(28 - 0.45, 28) - 3.75 - 28, 9);
  });

  it("the stud on the low side (−x) is thinnest at the deck, and the thicker bottom wall is not taken", () => {
    expect(wallOf(k, "a").minWallMm).toBeCloseTo(Math.hypot(28 + 0.2, 28) - 3.75 - 28, 9);
    expect(wallOf(k, "d").minWallMm).toBeCloseTo(Math.hypot(28 + 0.2, 28) - 3.75 - 28, 9);
  });

  it("the deck outline is thinnest at the bottom, 55 − 0.45 − 28 mm", () => {
    expect(wallOf(k, "deck outline").minWallMm).toBeCloseTo(55 - 0.45 - 28, 9);
    expect(k.thinnestWall?.minWallMm).toBeCloseTo(Math.hypot(27.55, 28) - 3.75 - 28, 9);
  });
});

describe("sealing land and wall have their own minimums", () => {
  // Common practice, no published source: the shop sets the land around a stud hole apart from the wall to a pocket or the deck edge.
  const input = { ...roundStudyInput(), limits: { minSealingLandMm: 4, minWallMm: 1 }, cut: { diameterMm: 66, depthMm: 25 } };
  const r = evaluateStudy(parse(input));
  const k = r.kits[0];

  it("a stud wall of 28√2 − 3.75 − 33 = 2.85 mm fails a 4 mm sealing land though it passes the 1 mm wall minimum", () => {
    const w = wallOf(k, "a");
    expect(w.minWallMm).toBeCloseTo(28 * Math.SQRT2 - 3.75 - 33, 9);
    expect(w.requiredMm).toBe(4);
    expect(w.ok).toBe(false);
    expect(k.verdict).toBe("cannot-fit");
  });

  it("the deck outline's wall is held to the 1 mm wall minimum", () => {
    expect(wallOf(k, "deck outline").requiredMm).toBe(1);
    expect(wallOf(k, "deck outline").ok).toBe(true);
  });

  it("the case allows a cut of 2·(28√2 − 3.75 − 4) mm, the studs' land deciding", () => {
    expect(r.case.maxCutDiameterMm).toBeCloseTo(2 * (28 * Math.SQRT2 - 3.75 - 4), 9);
  });

  it("with the minimums the other way round a pocket is held to the 4 mm wall and a stud to the 1 mm land", () => {
    const cs = roundStudyInput().case;
    const pockets = [{ label: "p", startDepthMm: 0, outline: { kind: "polygon" as const, pointsMm: [[31, -4], [36, -4], [36, 4], [31, 4]] as [number, number][] } }];
    const f = featureReaches([0, 0], { ...cs, pockets }, 20, { minSealingLandMm: 1, minWallMm: 4 }, 1e-9);
    expect(f.find((x) => x.kind === "stud")?.requiredMm).toBe(1);
    expect(f.find((x) => x.kind === "pocket")?.requiredMm).toBe(4);
    expect(f.find((x) => x.kind === "outline")?.requiredMm).toBe(4);
  });
});

describe("a mouth off the cylinder axis", () => {
  it("a Ø46 mouth centred 1.5 mm off the axis leaves a Ø42.4 skirt 23 − 21.2 − 1.5 = 0.3 mm, so a cut is needed", () => {
    const input = roundStudyInput();
    input.case.mouth = { outline: { kind: "circle", diameterMm: 46, centerMm: [1.5, 0] }, depthMm: 26 };
    input.kits[0].skirtDiameterReadingsMm = [42.4];
    const k = evaluateStudy(parse(input)).kits[0];
    expect(k.radialClearanceMm.vsMouth).toBeCloseTo(0.3, 9);
    expect(k.verdict).toBe("fits-after-cut");
  });
});

describe("proposed figures round up, never to nearest", () => {
  it("a protrusion of 24.71 mm asks for 25.21 mm of depth, proposed as 25.25 mm (nearest would be 25.2)", () => {
    const input = roundStudyInput();
    input.kits[0].skirtLengthReadingsMm = [24.71];
    const k = evaluateStudy(parse(input)).kits[0];
    expect(k.cut?.depthMm).toBeCloseTo(25.25, 12);
    expect(k.depthClearanceMm).toBeCloseTo(0.54, 9);
    expect(k.leastCut?.depthMm).toBeCloseTo(25.25, 12);
  });

  it("a Ø54.03 skirt asks for 55.03 mm of diameter, proposed as 55.1 mm (nearest would be 55.0)", () => {
    const input = roundStudyInput();
    input.kits[0].skirtDiameterReadingsMm = [54.03];
    const k = evaluateStudy(parse(input)).kits[0];
    expect(k.cut?.diameterMm).toBeCloseTo(55.1, 12);
    expect(k.effectiveRadialClearanceMm).toBeGreaterThanOrEqual(0.5 - 1e-9);
  });
});

describe("a cut deeper than the mouth", () => {
  // Below the mouth's depth is the crank chamber: nothing more is removed there.
  it("removes the ring between Ø56 and the Ø46 mouth over the mouth's 26 mm, not the cut's 30 mm", () => {
    const k = evaluateStudy(parse({ ...roundStudyInput(), cut: { diameterMm: 56, depthMm: 30 } })).kits[0];
    expect(k.removal.volumeMm3).toBeCloseTo((Math.PI / 4) * (56 * 56 - 46 * 46) * 26, 6);
    expect(k.cut?.throughMouth).toBe(true);
  });

  it("removal caps the depth at the mouth's and keeps a shallower cut's own depth", () => {
    const ring = Math.PI * (28 * 28 - 23 * 23);
    const mouth = { kind: "circle" as const, diameterMm: 46 };
    expect(removal([0, 0], 28, 30, mouth, 26, 2.7, 1e-9).volumeMm3).toBeCloseTo(ring * 26, 6);
    expect(removal([0, 0], 28, 20, mouth, 26, 2.7, 1e-9).volumeMm3).toBeCloseTo(ring * 20, 6);
    expect(removal([0, 0], 28, 20, mouth, 26, 2.7, 1e-9).massG).toBeCloseTo(((ring * 20) / 1000) * 2.7, 6);
  });
});

describe("pockets that start below the cut", () => {
  const withPocket = (startDepthMm: number) => {
    const input = roundStudyInput();
    input.case.pockets = [{ label: "deep", startDepthMm, outline: { kind: "polygon", pointsMm: [[31, -4], [36, -4], [36, 4], [31, 4]] } }];
    return evaluateStudy(parse({ ...input, cut: { diameterMm: 60, depthMm: 25 } })).kits[0];
  };

  it("a pocket starting at 28 mm, below a 25 mm cut, is not reached: its 1 mm wall neither fails nor limits the cut", () => {
    const k = withPocket(28);
    const w = wallOf(k, "deep");
    expect(w.minWallMm).toBeCloseTo(1, 9);
    expect(w.ok).toBe(true);
    expect(k.thinnestWall?.label).not.toBe("deep");
    // The studs decide: 2·(28√2 − 3.75 − 2).
    expect(k.maxCutDiameterMm).toBeCloseTo(2 * (28 * Math.SQRT2 - 3.75 - 2), 9);
  });

  it("the same pocket starting at 10 mm is reached: its 1 mm wall fails the 2 mm minimum and caps the cut at 2·(31 − 2)", () => {
    const k = withPocket(10);
    expect(wallOf(k, "deep").ok).toBe(false);
    expect(k.maxCutDiameterMm).toBeCloseTo(58, 9);
    expect(k.verdict).toBe("cannot-fit");
  });
});
