import { describe, expect, it } from "vitest";
import { evaluateStudy } from "@/geometry";
import { cutGeometry } from "@/scene/fit-model";
import { circleSegments } from "@/scene/outline";
import { meshVolume } from "@/scene/solids";
import { polygonStudy } from "./fixtures";

// While the cut is dragged its solid is written into the last step's buffers; what is drawn must be the
// very solid a fresh build gives. The volume check is that of a prism: the area of the inscribed regular
// n-gon, n/2 · r² · sin(2π/n), times the depth (elementary geometry, any handbook of mensuration).

const kitAt = (diameterMm: number, depthMm = 20) => evaluateStudy(polygonStudy({ diameterMm, depthMm })).kits[0];

describe("the cut's solid while it is dragged", () => {
  it("is written into the last step's geometry when the circle has as many segments, and equals a fresh build", () => {
    const a = kitAt(56), b = kitAt(56.05, 21);
    expect(circleSegments(56 / 2)).toBe(circleSegments(56.05 / 2));
    const g = cutGeometry(a)!;
    const buffer = g.getAttribute("position").array;
    const reused = cutGeometry(b, 1, g)!;
    expect(reused).toBe(g);
    expect(reused.getAttribute("position").array).toBe(buffer);
    const fresh = cutGeometry(b)!;
    expect(Array.from(reused.getAttribute("position").array)).toEqual(Array.from(fresh.getAttribute("position").array));
    expect(Array.from(reused.getAttribute("normal").array)).toEqual(Array.from(fresh.getAttribute("normal").array));
    expect(reused.boundingSphere!.radius).toBeCloseTo(fresh.boundingSphere!.radius, 9);
    const n = circleSegments(56.05 / 2), r = 56.05 / 2;
    // Vertices are stored in single precision: agreement to a few parts in ten million.
    expect(meshVolume(reused) / ((n / 2) * r * r * Math.sin((2 * Math.PI) / n) * b.cut!.depthMm)).toBeCloseTo(1, 6);
  });

  it("gets a new geometry when the circle needs another number of segments, and leaves the old one as it was", () => {
    const small = kitAt(46), large = kitAt(70);
    expect(circleSegments(46 / 2)).not.toBe(circleSegments(70 / 2));
    const g = cutGeometry(small)!;
    const before = Array.from(g.getAttribute("position").array);
    const next = cutGeometry(large, 1, g)!;
    expect(next).not.toBe(g);
    expect(Array.from(g.getAttribute("position").array)).toEqual(before);
    expect(next.getAttribute("position").count).toBe(cutGeometry(large)!.getAttribute("position").count);
  });
});
