import { describe, expect, it } from "vitest";
import { matchStudPattern } from "../../geometry/studs";
import { parseMetricThread, threadsMatch } from "../../geometry/threads";
import { ThreadDesignationError } from "../../geometry/errors";

const TOL = 1e-9;
const caseStuds = [
  { label: "a", positionMm: [-28, 28] as const },
  { label: "b", positionMm: [28, 28] as const },
  { label: "c", positionMm: [28, -28] as const },
  { label: "d", positionMm: [-28, -28] as const },
];

describe("stud pattern match", () => {
  it("a kit stud 0.2 mm off its case stud passes a 0.3 mm tolerance and reports the offset", () => {
    const kit = caseStuds.map((s, i) => ({ label: s.label, positionMm: (i === 0 ? [-28.2, 28] : s.positionMm) as readonly [number, number] }));
    const m = matchStudPattern(kit, caseStuds, 0.3, TOL);
    expect(m.ok).toBe(true);
    expect(m.worstOffsetMm).toBeCloseTo(0.2, 9);
    expect(m.studs[0].caseStud).toBe("a");
  });

  it("a kit on a 60 mm square does not fit a 56 mm square case, whatever the cut", () => {
    const kit = caseStuds.map((s) => ({ label: s.label, positionMm: [s.positionMm[0] * (30 / 28), s.positionMm[1] * (30 / 28)] as const }));
    const m = matchStudPattern(kit, caseStuds, 0.3, TOL);
    expect(m.ok).toBe(false);
    expect(m.worstOffsetMm).toBeCloseTo(Math.hypot(2, 2), 9);
  });

  it("two kit studs landing on one case stud are a different pattern", () => {
    const kit = [
      { label: "x", positionMm: [-28, 28.1] as const },
      { label: "y", positionMm: [-28, 27.9] as const },
    ];
    const m = matchStudPattern(kit, caseStuds, 0.3, TOL);
    expect(m.ok).toBe(false);
    expect(m.sharedCaseStuds).toEqual(["a"]);
  });
});

describe("thread check", () => {
  it("M8 and M8x1.25 mate; M8x1 and M8 do not; M7 and M8 do not", () => {
    expect(threadsMatch("M8", "M8x1.25", TOL).ok).toBe(true);
    expect(threadsMatch("M8x1", "M8", TOL).ok).toBe(false);
    expect(threadsMatch("M7", "M8", TOL).ok).toBe(false);
  });
  it("rejects a designation that is not ISO metric with a coded error", () => {
    expect(() => parseMetricThread("1/4-20 UNC")).toThrow(ThreadDesignationError);
    const err = (() => {
      try {
        parseMetricThread("M9");
        return null;
      } catch (e) {
        return e;
      }
    })();
    expect(err).toBeInstanceOf(ThreadDesignationError);
    expect((err as ThreadDesignationError).code).toBe("invalid-thread");
  });
});
