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

// The 56 mm square pattern and the 0.3 mm stud tolerance are invented test figures; the tolerance is the shop's
// default (common practice, no published source).
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
  // ISO 262:1998, Table 1: the coarse pitch of M8 is 1.25 mm and 1 mm is one of its fine pitches, so "M8"
  // means M8×1.25; M7's coarse pitch is 1 mm (M7 appears in ISO 261 as a second-choice size — from memory).
  it("M8 and M8x1.25 mate; M8x1 and M8 do not; M7 and M8 do not", () => {
    expect(threadsMatch("M8", "M8x1.25", TOL).ok).toBe(true);
    expect(threadsMatch("M8x1", "M8", TOL).ok).toBe(false);
    expect(threadsMatch("M7", "M8", TOL).ok).toBe(false);
  });
  // "1/4-20 UNC" is a unified inch thread (ASME B1.1), not ISO metric; M9 is not among the sizes ISO 262
  // selects for bolts and screws (from memory), and the core knows only those.
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
