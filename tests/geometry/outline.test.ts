// Distances to an outline's edge and areas of a disk inside an outline, on figures worked by hand (a 3-4-5 point in
// a circle, squares and half disks).
import { describe, expect, it } from "vitest";
import { boundaryRelation, circleCenter, diskInsideArea, outlineArea } from "../../geometry/outline";
import type { Outline } from "../../geometry/schema";

const TOL = 1e-9;
const square: Outline = { kind: "polygon", pointsMm: [[-10, -10], [10, -10], [10, 10], [-10, 10]] };
const squareCw: Outline = { kind: "polygon", pointsMm: [[-10, -10], [-10, 10], [10, 10], [10, -10]] };

describe("a point against an outline's edge", () => {
  it("a circle with no centre given is centred on the axis", () => {
    expect(circleCenter({ kind: "circle", diameterMm: 20 })).toEqual([0, 0]);
    expect(circleCenter({ kind: "circle", diameterMm: 20, centerMm: [1, 2] })).toEqual([1, 2]);
  });

  it("(3, 4) is 10 − 5 = 5 mm inside a Ø20 circle, nearest its edge at (6, 8); (0, 15) is 5 mm outside, nearest (0, 10)", () => {
    const c = { kind: "circle", diameterMm: 20 } as const;
    const inside = boundaryRelation([3, 4], c, TOL);
    expect(inside.signedDistanceMm).toBe(5);
    expect(inside.nearestMm[0]).toBeCloseTo(6, 12);
    expect(inside.nearestMm[1]).toBeCloseTo(8, 12);
    const outside = boundaryRelation([0, 15], c, TOL);
    expect(outside.signedDistanceMm).toBe(-5);
    expect(outside.nearestMm[1]).toBeCloseTo(10, 12);
  });

  it("a circle centred off the axis measures from its own centre", () => {
    const r = boundaryRelation([4, 5], { kind: "circle", diameterMm: 20, centerMm: [1, 1] }, TOL);
    expect(r.signedDistanceMm).toBe(5);
    expect(r.nearestMm[0]).toBeCloseTo(7, 12);
    expect(r.nearestMm[1]).toBeCloseTo(9, 12);
  });

  it("(7, 0) is 3 mm inside a 20 mm square, nearest (10, 0); (13, 0) is 3 mm outside", () => {
    const inside = boundaryRelation([7, 0], square, TOL);
    expect(inside.signedDistanceMm).toBeCloseTo(3, 12);
    expect(inside.nearestMm[0]).toBeCloseTo(10, 12);
    expect(inside.nearestMm[1]).toBeCloseTo(0, 12);
    expect(boundaryRelation([13, 0], square, TOL).signedDistanceMm).toBeCloseTo(-3, 12);
  });
});

describe("areas", () => {
  it("a Ø10 circle is 25π mm²; a 20 mm square 400 mm², whichever way round its corners go", () => {
    expect(outlineArea({ kind: "circle", diameterMm: 10 })).toBeCloseTo(25 * Math.PI, 12);
    expect(outlineArea(square)).toBe(400);
    expect(outlineArea(squareCw)).toBe(400);
  });

  it("a disk inside a square counts whole; outside it, nothing; a disk round the whole square, the square's area", () => {
    expect(diskInsideArea([0, 0], 5, square, TOL)).toBeCloseTo(25 * Math.PI, 9);
    expect(diskInsideArea([30, 0], 5, square, TOL)).toBe(0);
    expect(diskInsideArea([0, 0], 20, squareCw, TOL)).toBeCloseTo(400, 9);
  });

  it("a disk centred on a square's edge is half inside: 2π mm² of a radius-2 disk", () => {
    expect(diskInsideArea([10, 0], 2, square, TOL)).toBeCloseTo(2 * Math.PI, 9);
    // Just inside and just outside, by a fifth of its radius either way.
    expect(diskInsideArea([9.6, 0], 2, square, TOL)).toBeGreaterThan(2 * Math.PI);
    expect(diskInsideArea([10.4, 0], 2, square, TOL)).toBeLessThan(2 * Math.PI);
  });

  it("a disk touching a square's edge from inside, or from outside, counts whole, or nothing", () => {
    expect(diskInsideArea([5, 0], 5, square, 0)).toBeCloseTo(25 * Math.PI, 9);
    expect(diskInsideArea([15, 0], 5, square, 0)).toBe(0);
  });

  it("a disk inside a circle is the circle–circle lens (MathWorld): two unit circles one apart, 2π/3 − √3/2", () => {
    expect(diskInsideArea([1, 0], 1, { kind: "circle", diameterMm: 2 }, TOL)).toBeCloseTo((2 * Math.PI) / 3 - Math.sqrt(3) / 2, 12);
    expect(diskInsideArea([2, 1], 1, { kind: "circle", diameterMm: 2, centerMm: [1, 1] }, TOL)).toBeCloseTo((2 * Math.PI) / 3 - Math.sqrt(3) / 2, 12);
  });
});
