import { expect } from "vitest";

type P = [number, number];

/**
 * A point test checked on both sides at once: every point of `inside` is in, every point of `outside` is out. On
 * failure it lists the points on the wrong side.
 */
export function expectSides(contains: (p: P) => boolean, inside: P[], outside: P[]): void {
  expect(inside.filter((p) => !contains(p)), "points that should be inside").toEqual([]);
  expect(outside.filter((p) => contains(p)), "points that should be outside").toEqual([]);
}
