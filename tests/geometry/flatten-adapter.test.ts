// The adapter over @flatten-js/core (the cross-check of the core's own polygon measures): the library's failure
// comes out as the core's coded error, with the library's reason kept in its words.
import { describe, expect, it } from "vitest";
import { DegenerateGeometryError } from "../../geometry/errors";
import { flattenDiskPolygonArea } from "../../geometry/flatten-adapter";

describe("the flatten-js adapter", () => {
  it("a unit disk on the corner of a 2 mm square holds a quarter of it inside, π/4, whichever way round the square runs", () => {
    expect(flattenDiskPolygonArea([0, 0], 1, [[0, 0], [2, 0], [2, 2], [0, 2]])).toBeCloseTo(Math.PI / 4, 9);
    expect(flattenDiskPolygonArea([0, 0], 1, [[0, 0], [0, 2], [2, 2], [2, 0]])).toBeCloseTo(Math.PI / 4, 9);
  });

  it("a polygon the library cannot build (a corner that is not a number) is a degenerate-geometry error naming the boolean", () => {
    const call = () => flattenDiskPolygonArea([0, 0], 1, [[0, 0], [Number.NaN, 0], [1, 1]]);
    expect(call).toThrow(DegenerateGeometryError);
    // The library's reason in its own words, without the class name String(error) would put before it.
    expect(call).toThrow(/^the disk ∩ polygon boolean failed \((?!Error: ).+\)$/);
  });
});
