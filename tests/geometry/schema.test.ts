import { describe, expect, it } from "vitest";
import { LimitsSchema, OutlineSchema, StudyValidationError, StudySchema, parseStudy, safeParseStudy } from "../../geometry/index";
import { roundStudyInput } from "./fixtures";

const pathsOf = (input: unknown) => {
  const r = safeParseStudy(input);
  return r.ok ? [] : r.issues.map((i) => i.path);
};

describe("study validation", () => {
  it("accepts the fixture study and fills defaults such as an empty pocket list", () => {
    const s = StudySchema.parse(roundStudyInput());
    expect(s.case.pockets).toEqual([]);
    expect(s.case.cylinders).toBe(1);
    expect(s.kits[0].alwaysWithGasket).toBe(false);
  });

  it("rejects a negative bore by its path", () => {
    const input = roundStudyInput();
    input.kits[0].boreMm = -47;
    expect(pathsOf(input)).toContain("kits.0.boreMm");
  });

  it("rejects unknown keys (strict objects)", () => {
    expect(pathsOf({ ...roundStudyInput(), extra: 1 }).length).toBeGreaterThan(0);
    const input = roundStudyInput();
    (input.case as Record<string, unknown>).colour = "red";
    expect(pathsOf(input)).toContain("case");
  });

  it("rejects a self-crossing polygon and says which edges cross", () => {
    const r = OutlineSchema.safeParse({ kind: "polygon", pointsMm: [[0, 0], [10, 10], [10, 0], [0, 10]] });
    expect(r.success).toBe(false);
    expect(r.error?.issues[0].message).toMatch(/cross/);
  });

  it("rejects a reading at a stud the case does not have, and two kits with one id", () => {
    const input = { ...roundStudyInput(), readings: { holderHeights: [{ stud: "zz", heightMm: 30 }] } };
    input.kits = [input.kits[0], { ...input.kits[0] }];
    const paths = pathsOf(input);
    expect(paths).toContain("readings.holderHeights.0.stud");
    expect(paths).toContain("kits.1.id");
  });

  it("rejects a bit calibration whose smallest cut is not below its largest", () => {
    const input = {
      ...roundStudyInput(),
      rig: {
        name: "r",
        headDiameterMm: 34.5,
        bitLengthMm: 35,
        calibration: { bitLengthMm: 35, minCutDiameterMm: 62, maxCutDiameterMm: 52 },
        grooves: [{ label: "g", travelMm: 20 }],
        drillTopRpm: 2000,
      },
    };
    expect(pathsOf(input)).toContain("rig.calibration.maxCutDiameterMm");
  });

  it("rejects NaN, Infinity and a thread that is not ISO metric", () => {
    const input = roundStudyInput();
    input.case.strokeMm = Number.NaN;
    input.case.stockBoreMm = Number.POSITIVE_INFINITY;
    input.case.studThread = "1/4-20";
    const paths = pathsOf(input);
    expect(paths).toEqual(expect.arrayContaining(["case.strokeMm", "case.stockBoreMm", "case.studThread"]));
  });

  it("parseStudy throws a coded error carrying every bad field", () => {
    const input = roundStudyInput();
    input.kits = [];
    let caught: unknown = null;
    try {
      parseStudy(input);
    } catch (e) {
      caught = e;
    }
    expect(caught).toBeInstanceOf(StudyValidationError);
    expect((caught as StudyValidationError).code).toBe("invalid-study");
    expect((caught as StudyValidationError).issues.map((i) => i.path)).toContain("kits");
  });
});

describe("limits schema", () => {
  it("rejects a cutting-speed range that is upside down", () => {
    expect(LimitsSchema.safeParse({ cuttingSpeedMinMPerMin: 200, cuttingSpeedMaxMPerMin: 100 }).success).toBe(false);
  });
});
