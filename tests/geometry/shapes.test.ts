import { describe, expect, it } from "vitest";
import {
  CaptureSchema,
  arcSegments,
  arcSlot,
  boltCircleStuds,
  chamferedRectangle,
  mirrorOutline,
  outlineFromParams,
  outlineProblem,
  radialRectangle,
  rectangularStudPattern,
  roundedRectangle,
  shapeIssues,
  studsFromParams,
} from "../../geometry/shapes";
import { signedArea } from "../../geometry/polygon";
import { CaseProfileSchema } from "../../geometry/schema";

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
