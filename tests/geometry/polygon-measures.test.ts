import { describe, expect, it } from "vitest";
import { diskPolygonArea, pointInPolygon, pointToPolygonBoundary, polygonInsideDisk, signedArea } from "../../geometry/polygon";
import { expectSides } from "./point-sides";

type P = [number, number];

// The one-pass polygon measures of geometry/polygon.ts on figures checked by hand (plane geometry, no published
// source): the square 0..4 × 0..4 listed counter-clockwise and clockwise, and the U 0..10 × 0..10 with the notch
// 3..7 × 3..10.
describe("polygon measures on hand-checked figures", () => {
  const ccw: P[] = [[0, 0], [4, 0], [4, 4], [0, 4]];
  const cw: P[] = [[0, 0], [0, 4], [4, 4], [4, 0]];
  const u: P[] = [[0, 0], [10, 0], [10, 10], [7, 10], [7, 3], [3, 3], [3, 10], [0, 10]];

  it("signed area: + counter-clockwise, − clockwise", () => {
    expect(signedArea(ccw)).toBe(16);
    expect(signedArea(cw)).toBe(-16);
    expect(signedArea(u)).toBe(100 - 4 * 7); // 72
    expect(signedArea([[0, 0], [6, 0], [0, 3]])).toBe(9); // ½·6·3
  });

  it("a polygon inside a disk: every corner within the radius (plus the tolerance) of the centre", () => {
    const r: P[] = [[3, 4], [-3, 4], [-3, -4], [3, -4]]; // every corner 5 from the origin
    expect(polygonInsideDisk(r, [0, 0], 5, 0)).toBe(true);
    expect(polygonInsideDisk(r, [0, 0], 4.9, 0)).toBe(false);
    expect(polygonInsideDisk(r, [0, 0], 4.9, 0.1)).toBe(true);
    // About (1, 0): (−3, 4) is √(16 + 16) = 5.657 away, beyond 5.
    expect(polygonInsideDisk(r, [1, 0], 5, 0)).toBe(false);
    expect(polygonInsideDisk(r, [0, 1], 5, 0)).toBe(false); // (3, −4) is √(9 + 25) = 5.831 away
  });

  it("point in polygon: inside, outside, on an edge or a corner (inside), on an edge's line beyond it (outside)", () => {
    for (const sq of [ccw, cw]) {
      // Inside, on an edge, on a corner; outside, and on an edge's line beyond the square.
      expectSides((p) => pointInPolygon(p, sq), [[2, 2], [4, 2], [2, 0], [0, 0], [4, 4]], [[5, 2], [-1, 2], [2, 5], [2, -1], [6, 0], [0, 6], [-2, 4]]);
    }
    // (5, 5) is in the notch.
    expectSides((p) => pointInPolygon(p, u), [[1, 5], [8, 5], [5, 2]], [[5, 5]]);
  });

  it("distance to the boundary, the nearest point and inside, for either winding", () => {
    for (const sq of [ccw, cw]) {
      const a = pointToPolygonBoundary([1, 2.5], sq, 0);
      expect(a).toEqual({ distanceMm: 1, nearestMm: [0, 2.5], inside: true });
      const b = pointToPolygonBoundary([6, 5], sq, 0); // nearest the corner (4, 4): √(4 + 1)
      expect(b.distanceMm).toBeCloseTo(Math.sqrt(5), 12);
      expect(b.nearestMm).toEqual([4, 4]);
      expect(b.inside).toBe(false);
      expect(pointToPolygonBoundary([2, 0], sq, 0)).toEqual({ distanceMm: 0, nearestMm: [2, 0], inside: true });
      expect(pointToPolygonBoundary([2, 3.5], sq, 0)).toEqual({ distanceMm: 0.5, nearestMm: [2, 4], inside: true });
      expect(pointToPolygonBoundary([3.25, 1], sq, 0)).toEqual({ distanceMm: 0.75, nearestMm: [4, 1], inside: true });
      expect(pointToPolygonBoundary([2, -3], sq, 0)).toEqual({ distanceMm: 3, nearestMm: [2, 0], inside: false });
      expect(pointToPolygonBoundary([-1, 2], sq, 0).inside).toBe(false);
      expect(pointToPolygonBoundary([2, 5], sq, 0).inside).toBe(false);
    }
    // In the U's notch: outside, 2 mm from the notch's sides x = 3 and x = 7 and its bottom y = 3 (at (5, 5)).
    const n = pointToPolygonBoundary([5, 5], u, 0);
    expect(n.distanceMm).toBe(2);
    expect(n.inside).toBe(false);
    expect(pointToPolygonBoundary([5, 1], u, 0)).toEqual({ distanceMm: 1, nearestMm: [5, 0], inside: true });
  });

  it("equidistant edges: the first counter-clockwise wins, and a later one must be closer by more than the tolerance", () => {
    // The centre (2, 2) is 2 from all four edges. Counter-clockwise from (0, 0) the first edge is the bottom one;
    // the clockwise list is walked backwards, from its last corner (4, 0) up the right edge.
    // (Fresh copies: the winding is kept per array, and these must find it themselves.)
    expect(pointToPolygonBoundary([2, 2], [...ccw], 0).nearestMm).toEqual([2, 0]);
    expect(pointToPolygonBoundary([2, 2], [...cw], 0).nearestMm).toEqual([4, 2]);
    // (2.05, 2): the right edge (1.95) is nearer than the bottom (2) by 0.05 — enough with no tolerance, not with 0.1.
    const exact = pointToPolygonBoundary([2.05, 2], ccw, 0);
    expect(exact.nearestMm).toEqual([4, 2]);
    expect(exact.distanceMm).toBeCloseTo(1.95, 12);
    const tolerant = pointToPolygonBoundary([2.05, 2], ccw, 0.1);
    expect(tolerant.nearestMm).toEqual([2.05, 0]);
    expect(tolerant.distanceMm).toBe(2);
  });

  it("a right triangle: points on, inside and outside its slanted edge; a point on the top edge of a square", () => {
    // Triangle (0,0) (4,0) (0,4): the hypotenuse x + y = 4. (3, 3) lies outside it, though within its edge's box.
    const t: P[] = [[0, 0], [4, 0], [0, 4]];
    for (const tri of [t, [...t].reverse()]) {
      for (const f of [(p: P) => pointInPolygon(p, tri), (p: P) => pointToPolygonBoundary(p, [...tri], 0).inside]) {
        expect(f([2, 2])).toBe(true);
        expect(f([1, 1])).toBe(true);
        expect(f([3, 3])).toBe(false);
        expect(f([-1, 1])).toBe(false);
        expect(f([1, -1])).toBe(false);
      }
    }
    // (2, 4) on the top edge: the ray to +x meets no edge that counts, so only the on-edge test makes it inside.
    for (const sq of [ccw, cw]) expect(pointToPolygonBoundary([2, 4], [...sq], 0)).toEqual({ distanceMm: 0, nearestMm: [2, 4], inside: true });
  });

  it("a polygon inside a disk away from the origin", () => {
    // Corners 1 from (10, 0), and 1 from (0, 10).
    expect(polygonInsideDisk([[9, 0], [11, 0], [10, 1]], [10, 0], 1, 1e-9)).toBe(true);
    expect(polygonInsideDisk([[0, 9], [0, 11], [1, 10]], [0, 10], 1, 1e-9)).toBe(true);
  });

  it("the area of a disk inside a polygon when an edge starts inside the circle, or its line cuts the circle off the edge", () => {
    // The strip y ≥ 0.5 again, its bottom edge split at (0.2, 0.5), inside the unit circle: the same segment.
    const split: P[] = [[-2, 0.5], [0.2, 0.5], [2, 0.5], [2, 2], [-2, 2]];
    // The square 2..4 × −0.5..0.5: its edges' lines y = ±0.5 cut the unit circle at x = ±0.866, off the edges.
    const off: P[] = [[2, -0.5], [4, -0.5], [4, 0.5], [2, 0.5]];
    for (const w of [(p: P[]) => p, (p: P[]) => [...p].reverse()]) {
      expect(diskPolygonArea([0, 0], 1, w(split))).toBeCloseTo(Math.PI / 3 - 0.5 * Math.sqrt(0.75), 12);
      expect(diskPolygonArea([0, 0], 1, w(off))).toBeCloseTo(0, 12);
      expect(diskPolygonArea([0, 0], 1, w(off.map(([x, y]): P => [-x, y])))).toBeCloseTo(0, 12);
    }
  });

  it("the area of a disk inside a polygon: whole, quarter, half, a circular segment, a small polygon inside the disk, none", () => {
    for (const w of [(p: P[]) => p, (p: P[]) => [...p].reverse()]) {
      expect(diskPolygonArea([2, 2], 1, w(ccw))).toBeCloseTo(Math.PI, 12); // the whole unit disk
      expect(diskPolygonArea([0, 0], 1, w(ccw))).toBeCloseTo(Math.PI / 4, 12); // centre on a corner
      expect(diskPolygonArea([2, 0], 1, w(ccw))).toBeCloseTo(Math.PI / 2, 12); // centre on an edge
      expect(diskPolygonArea([10, 10], 1, w(ccw))).toBe(0);
      expect(diskPolygonArea([2, 2], 10, w(ccw))).toBeCloseTo(16, 12); // the square lies inside the disk
      // Strip y ≥ 0.5 of the unit disk about the origin: the segment r²·acos(d/r) − d·√(r² − d²), d = 0.5:
      // π/3 − 0.5·√0.75 = 0.614185.
      const strip: P[] = [[-2, 0.5], [2, 0.5], [2, 2], [-2, 2]];
      expect(diskPolygonArea([0, 0], 1, w(strip))).toBeCloseTo(Math.PI / 3 - 0.5 * Math.sqrt(0.75), 12);
      // Right triangle (0,0) (0.5,0) (0,0.5) inside the unit disk: ½·0.5·0.5.
      expect(diskPolygonArea([0, 0], 1, w([[0, 0], [0.5, 0], [0, 0.5]]))).toBeCloseTo(0.125, 12);
      // Triangle (0,0) (2,0) (0,2) about the origin, radius 1: the quarter disk, its far edge outside the circle.
      expect(diskPolygonArea([0, 0], 1, w([[0, 0], [2, 0], [0, 2]]))).toBeCloseTo(Math.PI / 4, 12);
      // Its hypotenuse x + y = 2 lies √2 from the origin: radius 1.5 cuts it at 45° ± acos(√2/1.5) = 25.5° and
      // 64.5°, so the whole segment beyond it, r²·acos(√2/r) − √2·√(r² − 2) = 0.05753, lies in the quarter:
      // π·2.25/4 − 0.05753 = 1.70962.
      const r = 1.5;
      const segment = r * r * Math.acos(Math.SQRT2 / r) - Math.SQRT2 * Math.sqrt(r * r - 2);
      expect(diskPolygonArea([0, 0], r, w([[0, 0], [2, 0], [0, 2]]))).toBeCloseTo((Math.PI * r * r) / 4 - segment, 12);
    }
  });
});

// A ray to +x that passes exactly through a corner must count the crossing once (Sunday, "Inclusion of a point in
// a polygon", geomalgorithms.com, 2001: an upward edge includes its start and excludes its end, a downward edge the
// reverse). The diamond's corners lie on the lines x = 20 and y = 20; each point below is level with a corner.
describe("the winding rule level with a corner", () => {
  const diamondCcw: P[] = [[20, 15], [25, 20], [20, 25], [15, 20]];
  const diamondCw: P[] = [[20, 15], [15, 20], [20, 25], [25, 20]];
  const square: P[] = [[0, 0], [10, 0], [10, 10], [0, 10]];

  it("a point inside, level with the right-hand corner, is inside whichever way the corners run", () => {
    expect(pointInPolygon([18, 20], diamondCcw)).toBe(true);
    expect(pointInPolygon([18, 20], diamondCw)).toBe(true);
    expect(pointToPolygonBoundary([18, 20], diamondCcw, 0).inside).toBe(true);
    expect(pointToPolygonBoundary([18, 20], diamondCw, 0).inside).toBe(true);
  });

  it("a point outside to the left, level with both side corners, is outside whichever way the corners run", () => {
    expect(pointInPolygon([10, 20], diamondCcw)).toBe(false);
    expect(pointInPolygon([10, 20], diamondCw)).toBe(false);
    expect(pointToPolygonBoundary([10, 20], diamondCcw, 0).inside).toBe(false);
    expect(pointToPolygonBoundary([10, 20], diamondCw, 0).inside).toBe(false);
    // Level with the top corner and left of it: outside.
    expect(pointToPolygonBoundary([10, 25], diamondCcw, 0).inside).toBe(false);
  });

  it("every corner of a square counts as on it (inside); a point on an edge's line beyond the edge does not", () => {
    for (const c of square) {
      expect(pointInPolygon(c, square)).toBe(true);
      expect(pointToPolygonBoundary(c, square, 0).inside).toBe(true);
    }
    expect(pointInPolygon([0, -5], square)).toBe(false);
    expect(pointInPolygon([15, 0], square)).toBe(false);
    expect(pointToPolygonBoundary([15, 0], square, 0)).toMatchObject({ inside: false, distanceMm: 5 });
    expect(pointToPolygonBoundary([0, -5], square, 0)).toMatchObject({ inside: false, distanceMm: 5 });
  });
});
