import { describe, expect, it } from "vitest";
import { CaptureSchema, ShapeParamsSchema, arcSegments, arcSlot, boltCircleStuds, chamferedRectangle, circleOutline, insideRing, mirrorOutline, outlineFromParams, outlineProblem, radialRectangle, rectangularStudPattern, roundedRectangle, shapeIssues, studsFromParams } from "../../geometry/shapes";
import { signedArea } from "../../geometry/polygon";
import { CaseProfileSchema } from "../../geometry/schema";
import { expectSides } from "./point-sides";

// The expected points below are worked by hand (plane trigonometry: x = r·cos θ, y = r·sin θ), written
// beside each check; the sagitta formula s = r·(1 − cos(φ/2)) for a chord of angle φ is the textbook
// circle-segment relation (any machinist's handbook, "segments of circles").

describe("stud patterns from centre distances", () => {
  it("a 56 × 48 mm rectangular pattern puts the studs at (±28, ±24)", () => {
    const s = rectangularStudPattern(56, 48);
    expect(s.map((x) => x.positionMm)).toEqual([
      [-28, 24],
      [28, 24],
      [28, -24],
      [-28, -24],
    ]);
    expect(new Set(s.map((x) => x.label)).size).toBe(4);
  });

  it("a 70 mm bolt circle of 4 starting at 45° puts stud 1 at (35·cos45°, 35·sin45°) = (24.7487, 24.7487)", () => {
    const s = boltCircleStuds(70, 4, 45);
    // 35 · √2/2 = 24.748737…
    expect(s[0].positionMm[0]).toBeCloseTo(24.748737, 5);
    expect(s[0].positionMm[1]).toBeCloseTo(24.748737, 5);
    // stud 3 at 225°: (−24.7487, −24.7487)
    expect(s[2].positionMm[0]).toBeCloseTo(-24.748737, 5);
    expect(s[2].positionMm[1]).toBeCloseTo(-24.748737, 5);
  });

  it("a bolt circle of 3 starting at 90° puts the studs 120° apart: (0, r), (−r·sin60°, −r/2), (r·sin60°, −r/2)", () => {
    const s = boltCircleStuds(60, 3, 90);
    expect(s[0].positionMm).toEqual([0, 30]);
    expect(s[1].positionMm[0]).toBeCloseTo(-30 * Math.sqrt(3) / 2, 9);
    expect(s[1].positionMm[1]).toBeCloseTo(-15, 9);
    expect(s[2].positionMm[0]).toBeCloseTo(30 * Math.sqrt(3) / 2, 9);
  });
});

describe("deck outlines", () => {
  it("a 100 × 80 mm deck chamfered 10 mm has eight corners, its area 8000 − 4·(10²/2) = 7800 mm²", () => {
    const d = chamferedRectangle(100, 80, 10);
    expect(d.pointsMm).toHaveLength(8);
    expect(d.pointsMm[0]).toEqual([50, -30]);
    expect(d.pointsMm[2]).toEqual([40, 40]);
    expect(signedArea(d.pointsMm)).toBeCloseTo(7800, 9);
    expect(outlineProblem(d)).toBeNull();
  });

  it("a chamfer of 0 gives the plain rectangle, counter-clockwise", () => {
    const d = chamferedRectangle(20, 10, 0);
    expect(d.pointsMm).toEqual([[10, -5], [10, 5], [-10, 5], [-10, -5]]);
    expect(signedArea(d.pointsMm)).toBeCloseTo(200, 9);
  });

  it("a rounded 100 × 80 deck of radius 10 approaches 8000 − (4 − π)·10² = 7914.16 mm² from below", () => {
    const d = roundedRectangle(100, 80, 10, 0.02);
    const exact = 8000 - (4 - Math.PI) * 100;
    const area = signedArea(d.pointsMm);
    expect(area).toBeLessThan(exact);
    // Each of the n chords loses at most (chord · sagitta) of area; with s ≤ 0.02 mm the loss is under 0.02 · 2πr.
    expect(exact - area).toBeLessThan(0.02 * 2 * Math.PI * 10);
    expect(outlineProblem(d)).toBeNull();
  });
});

describe("arcs to chords", () => {
  it("a quarter arc of r = 10 within 0.02 mm needs ⌈(π/2) / (2·acos(1 − 0.002))⌉ = 13 segments", () => {
    // acos(0.998) = 0.063251 rad; π/2 / 0.126502 = 12.42 → 13
    expect(arcSegments(10, Math.PI / 2, 0.02)).toBe(13);
  });

  it("every chord of an arc slot stays within the tolerance of its arc", () => {
    const slot = arcSlot(30, 40, 60, 90, 0.02);
    const outer = slot.pointsMm.slice(0, slot.pointsMm.length / 2);
    for (let i = 0; i + 1 < outer.length; i++) {
      const mid = [(outer[i][0] + outer[i + 1][0]) / 2, (outer[i][1] + outer[i + 1][1]) / 2];
      expect(40 - Math.hypot(mid[0], mid[1])).toBeLessThanOrEqual(0.02 + 1e-9);
    }
  });

  it("an arc slot 30–40 mm spanning 60° about 90° starts at (40·cos60°, 40·sin60°) = (20, 34.641) and has area (π/6)·(40² − 30²)/… ≈ 366.5 mm²", () => {
    const slot = arcSlot(30, 40, 60, 90, 0.02);
    expect(slot.pointsMm[0][0]).toBeCloseTo(20, 9);
    expect(slot.pointsMm[0][1]).toBeCloseTo(34.641016, 5);
    // Annular sector area = (θ/2)·(R² − r²) = (π/6)·(1600 − 900) = 366.519 mm²; chords lose a little.
    const area = signedArea(slot.pointsMm);
    expect(area).toBeGreaterThan(366.519 - 2);
    expect(area).toBeLessThan(366.519);
    expect(outlineProblem(slot)).toBeNull();
  });

  it("a radial rectangle 12 wide, 8 long, near edge 30 mm out along +x spans x 30…38, y −6…6", () => {
    const r = radialRectangle(12, 8, 30, 0);
    expect(r.pointsMm).toEqual([[30, -6], [38, -6], [38, 6], [30, 6]]);
    const up = radialRectangle(12, 8, 30, 90);
    expect(up.pointsMm[0][0]).toBeCloseTo(6, 9);
    expect(up.pointsMm[0][1]).toBeCloseTo(30, 9);
  });
});

describe("mirroring", () => {
  it("mirroring across the y axis turns x into −x and keeps the outline counter-clockwise", () => {
    const r = radialRectangle(12, 8, 30, 0);
    const m = mirrorOutline(r, "y");
    expect(m.pointsMm).toContainEqual([-38, 6]);
    expect(signedArea(m.pointsMm)).toBeCloseTo(signedArea(r.pointsMm), 9);
    expect(signedArea(m.pointsMm)).toBeGreaterThan(0);
  });

  it("mirroring across the x axis twice gives the outline back", () => {
    const slot = arcSlot(30, 40, 50, 20);
    expect(mirrorOutline(mirrorOutline(slot, "x"), "x").pointsMm).toEqual(slot.pointsMm);
  });
});

describe("parameters kept beside the data", () => {
  it("the parameters write the same outline as the helper called directly", () => {
    expect(outlineFromParams({ kind: "chamfered-rect", widthMm: 100, heightMm: 80, chamferMm: 10 })).toEqual(chamferedRectangle(100, 80, 10));
    expect(studsFromParams({ kind: "rect-studs", spacingXMm: 56, spacingYMm: 56 })).toEqual(rectangularStudPattern(56, 56));
    expect(outlineFromParams({ kind: "rect-studs", spacingXMm: 56, spacingYMm: 56 })).toBeNull();
  });

  it("the capture record takes known shape keys only", () => {
    expect(CaptureSchema.safeParse({ deck: { kind: "circle", diameterMm: 90 }, "pockets.1": { kind: "arc-slot", innerRadiusMm: 30, outerRadiusMm: 40, spanDeg: 40, centerDeg: 0 } }).success).toBe(true);
    expect(CaptureSchema.safeParse({ wheel: { kind: "circle", diameterMm: 90 } }).success).toBe(false);
    expect(CaptureSchema.safeParse({ deck: { kind: "circle", diameterMm: -1 } }).success).toBe(false);
  });

  it("a case profile may carry its capture parameters, and the core accepts it unchanged otherwise", () => {
    const base = {
      name: "case",
      deck: chamferedRectangle(100, 80, 10),
      mouth: { outline: { kind: "circle", diameterMm: 46 }, depthMm: 20 },
      studs: rectangularStudPattern(56, 56),
      studHoleDiameterMm: 8,
      stockBoreMm: 40,
      strokeMm: 39.2,
    };
    expect(CaseProfileSchema.safeParse({ ...base, capture: { deck: { kind: "chamfered-rect", widthMm: 100, heightMm: 80, chamferMm: 10 } } }).success).toBe(true);
    expect(CaseProfileSchema.safeParse({ ...base, capture: { deck: { kind: "spiral" } } }).success).toBe(false);
  });
});

describe("what is wrong with a shape", () => {
  const deck = chamferedRectangle(100, 80, 10);
  const mouth = { kind: "circle" as const, diameterMm: 46 };

  it("a bow-tie outline is named by its crossing edges", () => {
    expect(outlineProblem({ kind: "polygon", pointsMm: [[0, 0], [10, 10], [10, 0], [0, 10]] })).toMatch(/edges 1 and 3 cross/);
    expect(outlineProblem({ kind: "polygon", pointsMm: [[0, 0], [10, 0], [20, 0]] })).toMatch(/no area/);
  });

  it("a passage past the deck edge, a stud in the mouth and a stud off the deck are each reported", () => {
    const issues = shapeIssues({
      deck,
      mouth,
      studs: [{ positionMm: [28, 28] }, { positionMm: [5, 5] }, { positionMm: [70, 0] }],
      pockets: [arcSlot(25, 35, 40, 0), radialRectangle(10, 20, 40, 0)],
    });
    expect(issues).toEqual([
      { at: "pockets.1", message: "passage 2 reaches outside the deck" },
      { at: "studs.1", message: "stud 2 is inside the mouth" },
      { at: "studs.2", message: "stud 3 is off the deck" },
    ]);
  });
});

describe("arcs to chords at their edges", () => {
  it("an arc no bigger than the tolerance is one chord, however far it turns", () => {
    // At r = tol the sagitta formula gives steps of π, so a full turn would be 2 chords; r < tol has no step at all.
    expect(arcSegments(0.02, 2 * Math.PI, 0.02)).toBe(1);
    expect(arcSegments(0.005, Math.PI / 2, 0.02)).toBe(1);
  });

  it("a half circle whose chord steps are exactly quarter circles takes 2 chords, not a third for the binary noise", () => {
    // 1 − cos(π/4) = 1 − √2/2: with that tolerance on r = 1 each chord spans exactly π/2 (the sagitta relation).
    expect(arcSegments(1, Math.PI, 1 - Math.SQRT1_2)).toBe(2);
  });
});

describe("shapes, each as the core reads it", () => {
  it("bolt-circle studs are numbered from 1 in the order they go round", () => {
    expect(boltCircleStuds(70, 3, 90).map((s) => s.label)).toEqual(["stud 1", "stud 2", "stud 3"]);
  });

  it("a point on an axis is written 0, not −0 (Intl.NumberFormat writes −0 as “-0”)", () => {
    const [a] = rectangularStudPattern(0, 10);
    expect(Object.is(a.positionMm[0], 0)).toBe(true);
    const [c] = mirrorOutline({ kind: "polygon", pointsMm: [[0, 5], [5, 5], [5, 0]] }, "y").pointsMm;
    expect(Object.is(c[0], 0)).toBe(false);
    expect(c).toEqual([-5, 0]);
    expect(Object.is(mirrorOutline({ kind: "circle", diameterMm: 10, centerMm: [0, 3] }, "y").centerMm?.[0], 0)).toBe(true);
  });

  it("a round outline is a circle of that diameter on the axis", () => {
    expect(circleOutline(46)).toEqual({ kind: "circle", diameterMm: 46 });
  });

  it("every polygon helper writes a polygon", () => {
    expect(chamferedRectangle(100, 80, 0).kind).toBe("polygon");
    expect(roundedRectangle(100, 80, 10).kind).toBe("polygon");
    expect(radialRectangle(12, 8, 30, 0).kind).toBe("polygon");
  });

  it("a rounded rectangle of radius 0 is the plain rectangle; of radius 10 it has 4 × (13 + 1) corners", () => {
    expect(roundedRectangle(100, 80, 0)).toEqual(chamferedRectangle(100, 80, 0));
    expect(roundedRectangle(100, 80, 0).pointsMm).toHaveLength(4);
    // 13 chords per quarter arc of r = 10 within 0.02 mm (see "arcs to chords" above), each arc with both ends.
    expect(roundedRectangle(100, 80, 10).pointsMm).toHaveLength(4 * 14);
  });
});

describe("mirroring at its edges", () => {
  it("across the x axis a polygon's y turns to −y and its order is reversed", () => {
    const m = mirrorOutline({ kind: "polygon", pointsMm: [[0, 1], [4, 1], [4, 3]] }, "x");
    expect(m.pointsMm).toEqual([[4, -3], [4, -1], [0, -1]]);
  });

  it("a circle's centre is mirrored too; a circle on the axis stays on the axis with no centre written", () => {
    expect(mirrorOutline({ kind: "circle", diameterMm: 10, centerMm: [3, 4] }, "x")).toEqual({ kind: "circle", diameterMm: 10, centerMm: [3, -4] });
    expect(mirrorOutline({ kind: "circle", diameterMm: 10, centerMm: [3, 4] }, "y")).toEqual({ kind: "circle", diameterMm: 10, centerMm: [-3, 4] });
    expect(mirrorOutline({ kind: "circle", diameterMm: 10 }, "x")).toEqual({ kind: "circle", diameterMm: 10 });
  });
});

describe("the parameters of each helper", () => {
  const every = [
    { kind: "rect-studs", spacingXMm: 56, spacingYMm: 48 },
    { kind: "bolt-circle", diameterMm: 70, count: 4, startDeg: 45 },
    { kind: "circle", diameterMm: 46 },
    { kind: "chamfered-rect", widthMm: 100, heightMm: 80, chamferMm: 10 },
    { kind: "rounded-rect", widthMm: 100, heightMm: 80, radiusMm: 10 },
    { kind: "arc-slot", innerRadiusMm: 30, outerRadiusMm: 40, spanDeg: 60, centerDeg: 90 },
    { kind: "radial-rect", widthMm: 12, lengthMm: 8, nearEdgeMm: 30, angleDeg: 0 },
  ] as const;

  it("each kind is read with its own fields, and an unknown kind or an extra field is refused", () => {
    for (const p of every) expect(ShapeParamsSchema.safeParse(p).success, p.kind).toBe(true);
    expect(ShapeParamsSchema.safeParse({ kind: "spiral", diameterMm: 46 }).success).toBe(false);
    expect(ShapeParamsSchema.safeParse({ kind: "circle", diameterMm: 46, depthMm: 3 }).success).toBe(false);
  });

  it("a bolt circle has 1 to 16 studs", () => {
    const bolt = (count: number) => ShapeParamsSchema.safeParse({ kind: "bolt-circle", diameterMm: 70, count, startDeg: 0 }).success;
    expect([bolt(0), bolt(1), bolt(16), bolt(17), bolt(2.5)]).toEqual([false, true, true, false, false]);
  });

  it("each writes what its helper writes: an outline or studs, never both", () => {
    expect(outlineFromParams(every[2])).toEqual(circleOutline(46));
    expect(outlineFromParams(every[4])).toEqual(roundedRectangle(100, 80, 10));
    expect(outlineFromParams(every[5])).toEqual(arcSlot(30, 40, 60, 90));
    expect(outlineFromParams(every[6])).toEqual(radialRectangle(12, 8, 30, 0));
    expect(outlineFromParams(every[1])).toBeNull();
    expect(studsFromParams(every[1])).toEqual(boltCircleStuds(70, 4, 45));
    expect(studsFromParams(every[2])).toBeNull();
    expect(studsFromParams(every[4])).toBeNull();
  });

  it("the capture record's keys name the shape exactly: pockets and ports by a number up to two digits", () => {
    const circle = { kind: "circle", diameterMm: 46 };
    const ok = (key: string) => CaptureSchema.safeParse({ [key]: circle }).success;
    expect([ok("deck"), ok("mouth"), ok("studs"), ok("gasket"), ok("pockets.0"), ok("ports.12")]).toEqual([true, true, true, true, true, true]);
    expect([ok("pockets.123"), ok("thedeck"), ok("decks"), ok("pockets")]).toEqual([false, false, false, false]);
    const r = CaptureSchema.safeParse({ wheel: circle });
    // The key's own issue, under the record's "invalid key", says why in words.
    const inner = r.success ? [] : r.error.issues.flatMap((i) => ("issues" in i ? (i.issues as { message: string }[]) : []));
    expect(inner.map((i) => i.message)).toEqual(["unknown shape"]);
  });
});

describe("inside a ring (even-odd ray casting)", () => {
  // An L-shaped ring off the origin, worked on squared paper: the notch (12…16, 14…18) is outside.
  const L: [number, number][] = [[10, 10], [16, 10], [16, 14], [12, 14], [12, 18], [10, 18]];
  // A diamond with corners on the axes through (20, 20): points level with a corner test the ray's ends.
  const diamond: [number, number][] = [[20, 15], [25, 20], [20, 25], [15, 20]];

  it("tells inside from outside in a concave ring", () => {
    expectSides((p) => insideRing(p, L), [[11, 11], [15, 12], [11, 17]], [[14, 16], [9, 12], [17, 12], [11, 19]]);
  });

  it("points level with a corner, inside and on either side outside", () => {
    expectSides((p) => insideRing(p, diamond), [[20, 20], [24, 20]], [[10, 20], [30, 20], [20, 14], [20, 26]]);
  });

  it("near a slanted edge: just inside and just outside", () => {
    // The diamond's edge from (20, 15) to (25, 20) is x − y = 5; at y = 17 it is at x = 22. The edge from (15, 20)
    // to (20, 25) is y − x = 5; at y = 23 it is at x = 18.
    expectSides((p) => insideRing(p, diamond), [[21.9, 17], [18.1, 23]], [[22.1, 17], [17.9, 23]]);
  });
});

describe("what is wrong with a shape, each case", () => {
  const deck = chamferedRectangle(100, 80, 10);

  it("a circle of no diameter and a polygon of two corners are named as such, at the shape they belong to", () => {
    expect(outlineProblem({ kind: "circle", diameterMm: 0 })).toBe("the diameter must be more than 0");
    expect(outlineProblem({ kind: "circle", diameterMm: 0.5 })).toBeNull();
    expect(outlineProblem({ kind: "polygon", pointsMm: [[0, 0], [10, 0]] })).toBe("needs at least 3 corners");
    expect(outlineProblem(deck)).toBeNull();
    const issues = shapeIssues({
      deck: { kind: "circle", diameterMm: 0 },
      mouth: { kind: "polygon", pointsMm: [[0, 0], [10, 0]] },
      studs: [],
      pockets: [null, { kind: "polygon", pointsMm: [[0, 0], [1, 0]] }],
      pocketWord: "port",
    });
    expect(issues).toEqual([
      { at: "deck", message: "deck outline: the diameter must be more than 0" },
      { at: "mouth", message: "mouth: needs at least 3 corners" },
      { at: "pockets.1", message: "port 2: needs at least 3 corners" },
    ]);
  });

  it("with no deck or mouth yet, and shapes not yet readable, nothing is reported", () => {
    expect(shapeIssues({ deck: null, mouth: null, studs: [null, { positionMm: [300, 0] }], pockets: [null, radialRectangle(10, 20, 400, 0)] })).toEqual([]);
  });

  it("a bad deck or mouth is not used to judge the studs and passages", () => {
    const issues = shapeIssues({
      deck: { kind: "polygon", pointsMm: [[0, 0], [10, 10], [10, 0], [0, 10]] },
      mouth: { kind: "circle", diameterMm: 0 },
      studs: [{ positionMm: [300, 0] }],
      pockets: [radialRectangle(10, 20, 400, 0)],
    });
    expect(issues.map((i) => i.at)).toEqual(["deck", "mouth"]);
  });

  it("a round passage is judged by points round its edge: inside the deck it is fine, past its edge it is reported", () => {
    const ok = shapeIssues({ deck, mouth: null, studs: [], pockets: [{ kind: "circle", diameterMm: 10, centerMm: [40, 0] }] });
    expect(ok).toEqual([]);
    const out = shapeIssues({ deck, mouth: null, studs: [], pockets: [{ kind: "circle", diameterMm: 10, centerMm: [48, 0] }] });
    expect(out).toEqual([{ at: "pockets.0", message: "passage 1 reaches outside the deck" }]);
    // A round passage on the axis, bigger than the deck, reaches out; a small one on the axis does not.
    expect(shapeIssues({ deck, mouth: null, studs: [], pockets: [{ kind: "circle", diameterMm: 120 }] })).toHaveLength(1);
    expect(shapeIssues({ deck, mouth: null, studs: [], pockets: [{ kind: "circle", diameterMm: 20 }] })).toEqual([]);
  });

  it("a round passage that reaches out past the deck's top edge only is reported", () => {
    // The deck's top edge is at y = 40; a Ø10 passage centred at (0, 37) reaches y = 42 at its top.
    expect(shapeIssues({ deck, mouth: null, studs: [], pockets: [{ kind: "circle", diameterMm: 10, centerMm: [0, 37] }] })).toEqual([
      { at: "pockets.0", message: "passage 1 reaches outside the deck" },
    ]);
  });

  it("a stud not yet placed is passed over, and the next is still numbered by its place", () => {
    expect(shapeIssues({ deck, mouth: null, studs: [null, { positionMm: [200, 0] }], pockets: [] })).toEqual([{ at: "studs.1", message: "stud 2 is off the deck" }]);
  });

  it("a mouth off the axis: a stud inside it is reported, one inside its mirror image is not", () => {
    const mouth = { kind: "circle" as const, diameterMm: 20, centerMm: [20, 10] as [number, number] };
    const issues = shapeIssues({ deck, mouth, studs: [{ positionMm: [25, 12] }, { positionMm: [-25, -12] }], pockets: [] });
    expect(issues).toEqual([{ at: "studs.0", message: "stud 1 is inside the mouth" }]);
  });

  it("a stud centred exactly on a round mouth's edge is not called inside it: only a centre strictly inside is", () => {
    // Ø20 mouth about (20, 10): (30, 10) and (20, 20) are 10 mm from its centre, exactly on its edge; (29.9, 10) is inside.
    const mouth = { kind: "circle" as const, diameterMm: 20, centerMm: [20, 10] as [number, number] };
    const issues = shapeIssues({ deck, mouth, studs: [{ positionMm: [30, 10] }, { positionMm: [20, 20] }, { positionMm: [29.9, 10] }], pockets: [] });
    expect(issues).toEqual([{ at: "studs.2", message: "stud 3 is inside the mouth" }]);
  });
});
