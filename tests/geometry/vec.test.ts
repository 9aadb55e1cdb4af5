// Plane vector arithmetic, checked on figures worked by hand (a 3-4-5 right triangle, the four axis directions).
import { describe, expect, it } from "vitest";
import { add, angleDeg, centroid, distance, length, scale, sub, unit } from "../../geometry/vec";

describe("vectors in the deck plane", () => {
  it("adds, subtracts and scales component by component", () => {
    expect(add([1, 2], [3, -5])).toEqual([4, -3]);
    expect(sub([1, 2], [3, -5])).toEqual([-2, 7]);
    expect(scale([1, -2], 3)).toEqual([3, -6]);
  });

  it("a 3-4-5 triangle: the length of (3, 4) and the distance from (1, 1) to (4, 5) are 5", () => {
    expect(length([3, 4])).toBe(5);
    expect(length([-3, -4])).toBe(5);
    expect(distance([1, 1], [4, 5])).toBe(5);
    expect(distance([4, 5], [1, 1])).toBe(5);
    expect(distance([1, 5], [4, 1])).toBe(5);
  });

  it("the unit vector of (3, 4) is (0.6, 0.8); a vector no longer than the tolerance has no direction and gives +x", () => {
    const u = unit([3, 4], 1e-9);
    expect(u[0]).toBeCloseTo(0.6, 15);
    expect(u[1]).toBeCloseTo(0.8, 15);
    expect(unit([0, 1e-12], 1e-9)).toEqual([1, 0]);
    // Exactly as long as the tolerance: still no direction.
    expect(unit([0, 0.5], 0.5)).toEqual([1, 0]);
    expect(unit([0, 0.5], 0.25)).toEqual([0, 1]);
  });

  it("directions run counter-clockwise from +x in [0°, 360°): +x 0°, +y 90°, −x 180°, −y 270°, (1, −1) 315°", () => {
    expect(angleDeg([1, 0])).toBe(0);
    expect(angleDeg([0, 1])).toBe(90);
    expect(angleDeg([-1, 0])).toBe(180);
    expect(angleDeg([0, -1])).toBe(270);
    expect(angleDeg([1, -1])).toBeCloseTo(315, 12);
    expect(angleDeg([1, 1])).toBeCloseTo(45, 12);
  });

  it("the centre of a stud pattern is the mean of its studs: (2, 1) for a 4 × 2 rectangle from the origin, (2, 3) between (1, 1) and (3, 5)", () => {
    expect(centroid([[0, 0], [4, 0], [4, 2], [0, 2]])).toEqual([2, 1]);
    expect(centroid([[1, 1], [3, 5]])).toEqual([2, 3]);
  });
});
