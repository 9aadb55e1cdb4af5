// Reading a study: every bad field by its dotted path and the reason, so a form can show each next to its field.
import { describe, expect, it } from "vitest";
import { GeometryError, StudyValidationError } from "../../geometry/errors";
import { parseStudy, safeParseStudy } from "../../geometry/parse";
import { roundStudyInput } from "./fixtures";

const bad = () => {
  const s = roundStudyInput();
  return { ...s, kits: [{ ...s.kits[0], boreMm: -1 }], case: { ...s.case, strokeMm: "long" } };
};

describe("reading a study", () => {
  it("a sound study reads as itself", () => {
    const r = safeParseStudy(roundStudyInput());
    expect(r.ok).toBe(true);
    if (r.ok) expect(r.study.kits[0].boreMm).toBe(47);
    expect(parseStudy(roundStudyInput()).case.strokeMm).toBe(39.2);
  });

  it("a bad study gives every bad field by its dotted path, each with a reason", () => {
    const r = safeParseStudy(bad());
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.issues.map((i) => i.path).sort()).toEqual(["case.strokeMm", "kits.0.boreMm"]);
    for (const i of r.issues) expect(i.message.length).toBeGreaterThan(0);
  });

  it("parseStudy throws the study's validation error, a geometry error carrying the same fields", () => {
    let caught: unknown;
    try {
      parseStudy(bad());
    } catch (e) {
      caught = e;
    }
    expect(caught).toBeInstanceOf(StudyValidationError);
    expect(caught).toBeInstanceOf(GeometryError);
    const e = caught as StudyValidationError;
    expect(e.code).toBe("invalid-study");
    expect(e.issues.map((i) => i.path).sort()).toEqual(["case.strokeMm", "kits.0.boreMm"]);
  });
});
