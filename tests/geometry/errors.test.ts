// The core's errors: a code a caller can act on, a name, and words that say what was wrong.
import { describe, expect, it } from "vitest";
import { DegenerateGeometryError, GeometryError, StudyValidationError, ThreadDesignationError } from "../../geometry/errors";

describe("the core's errors", () => {
  it("a geometry error carries its code, its words and the cause it wraps", () => {
    const cause = new Error("inner");
    const e = new GeometryError("invalid-argument", "words", { cause });
    expect(e).toBeInstanceOf(Error);
    expect([e.name, e.code, e.message]).toEqual(["GeometryError", "invalid-argument", "words"]);
    expect(e.cause).toBe(cause);
  });

  it("an invalid study lists every field and its reason; an issue at the root is named so", () => {
    const e = new StudyValidationError([
      { path: "kits.0.boreMm", message: "too small" },
      { path: "", message: "unknown key" },
    ]);
    expect(e).toBeInstanceOf(GeometryError);
    expect([e.name, e.code]).toEqual(["StudyValidationError", "invalid-study"]);
    expect(e.message).toBe("Invalid study: kits.0.boreMm: too small; (root): unknown key");
    expect(e.issues).toHaveLength(2);
  });

  it("a thread that cannot be read quotes it and shows the ISO 262 form expected", () => {
    const e = new ThreadDesignationError("7mm");
    expect(e).toBeInstanceOf(GeometryError);
    expect([e.name, e.code]).toEqual(["ThreadDesignationError", "invalid-thread"]);
    expect(e.message).toBe('Not an ISO metric thread designation: "7mm" (expected e.g. M8 or M8x1.25)');
  });

  it("geometry with no answer keeps its words", () => {
    const e = new DegenerateGeometryError("the readings lie on one line");
    expect(e).toBeInstanceOf(GeometryError);
    expect([e.name, e.code, e.message]).toEqual(["DegenerateGeometryError", "degenerate-geometry", "the readings lie on one line"]);
  });
});
