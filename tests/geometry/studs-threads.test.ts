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

describe("stud pattern match at its edges", () => {
  const moved = (label: string, positionMm: readonly [number, number]) => caseStuds.map((s) => (s.label === label ? { label: s.label, positionMm } : s));

  it("one kit stud beyond the tolerance is enough to refuse the pattern, the other three matching exactly", () => {
    const m = matchStudPattern(moved("c", [28.5, -28]), caseStuds, 0.3, TOL);
    expect(m.ok).toBe(false);
    expect(m.studs.map((s) => s.ok)).toEqual([true, true, false, true]);
    expect(m.sharedCaseStuds).toEqual([]);
  });

  it("a stud off by exactly the tolerance passes; the computing tolerance widens it, never narrows it", () => {
    // −28.25 − (−28) = −0.25 exactly in binary, so the offset is exactly 0.25 mm.
    expect(matchStudPattern(moved("a", [-28.25, 28]), caseStuds, 0.25, 0).ok).toBe(true);
    expect(matchStudPattern(moved("a", [-28.25, 28]), caseStuds, 0.25, 0.01).ok).toBe(true);
    expect(matchStudPattern(moved("a", [-28.25, 28]), caseStuds, 0.24, 0.005).ok).toBe(false);
  });

  it("a kit stud exactly between two case studs is paired with the one listed first", () => {
    const m = matchStudPattern([{ label: "x", positionMm: [0, 28] }], caseStuds, 0.3, TOL);
    expect(m.studs[0].caseStud).toBe("a");
    expect(m.studs[0].offsetMm).toBe(28);
  });

  it("case studs claimed twice are listed by label, whatever order the kit's studs come in", () => {
    const kit = [
      { label: "p", positionMm: [28, 28.1] as const },
      { label: "q", positionMm: [28, 27.9] as const },
      { label: "r", positionMm: [-28, 28.1] as const },
      { label: "s", positionMm: [-28, 27.9] as const },
    ];
    expect(matchStudPattern(kit, caseStuds, 0.3, TOL).sharedCaseStuds).toEqual(["a", "b"]);
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

describe("reading a thread designation", () => {
  // ISO 262:1998, Table 1, coarse pitches of the selected sizes M3–M16 (from memory): 0.5, 0.7, 0.8, 1, 1.25, 1.5,
  // 1.75, 2, 2; M7 × 1 from ISO 261 (from memory). The designation form M<d>×<P> is that of ISO 965-1 (from memory).
  it("a designation without a pitch takes the ISO 262 coarse pitch of its size", () => {
    const coarse = { M3: 0.5, M4: 0.7, M5: 0.8, M6: 1, M7: 1, M8: 1.25, M10: 1.5, M12: 1.75, M14: 2, M16: 2 };
    for (const [designation, pitchMm] of Object.entries(coarse)) {
      const t = parseMetricThread(designation);
      expect([designation, t.pitchMm, t.pitchImplied]).toEqual([designation, pitchMm, true]);
      expect(t.designation).toBe(`${designation}x${pitchMm}`);
    }
  });

  it("reads the pitch given, with × or x, spaces round it, any case and spaces round the whole", () => {
    expect(parseMetricThread("M8x1.25")).toEqual({ nominalDiameterMm: 8, pitchMm: 1.25, pitchImplied: false, designation: "M8x1.25" });
    expect(parseMetricThread("M10 × 1.25").designation).toBe("M10x1.25");
    expect(parseMetricThread("m12x1.5").designation).toBe("M12x1.5");
    expect(parseMetricThread("  M8  ").designation).toBe("M8x1.25");
    // A size with a decimal: M3.5 × 0.6 (ISO 262, from memory).
    expect(parseMetricThread("M3.5x0.6")).toMatchObject({ nominalDiameterMm: 3.5, pitchMm: 0.6 });
  });

  it("reads a diameter or a pitch with more digits as written, a size no ISO 261 row lists included", () => {
    // No ISO 261 size has a diameter with two decimals or a pitch of 10 mm or more (from memory); the parser does
    // not judge the size, it reads the figures, and the mate check compares them.
    expect(parseMetricThread("M10.25x1.25")).toEqual({ nominalDiameterMm: 10.25, pitchMm: 1.25, pitchImplied: false, designation: "M10.25x1.25" });
    expect(parseMetricThread("M100x10")).toEqual({ nominalDiameterMm: 100, pitchMm: 10, pitchImplied: false, designation: "M100x10" });
    expect(parseMetricThread("M80 × 12.5")).toMatchObject({ nominalDiameterMm: 80, pitchMm: 12.5 });
    expect(threadsMatch("M10.25x1.25", "M10.2x1.25", TOL).ok).toBe(false);
  });

  it("refuses text before or after the designation: a left-hand thread (LH, ISO 965-1, from memory) does not mate with a right-hand one", () => {
    expect(() => parseMetricThread("M8x1.25 LH")).toThrow(ThreadDesignationError);
    expect(() => parseMetricThread("BM8")).toThrow(ThreadDesignationError);
  });

  it("refuses a pitch of zero, and names the size whose coarse pitch it does not know", () => {
    expect(() => parseMetricThread("M8x0")).toThrow(ThreadDesignationError);
    expect(() => parseMetricThread("M9")).toThrow('M9 (no ISO 262 coarse pitch known for M9; give the pitch, e.g. M9x1)');
  });

  it("threads mate only with the same diameter and the same pitch, exactly equal figures included", () => {
    expect(threadsMatch("M7x1", "M8x1", TOL).ok).toBe(false);
    expect(threadsMatch("M8", "M8x1.25", 0)).toEqual({ a: "M8x1.25", b: "M8x1.25", ok: true });
    expect(threadsMatch("M8x1", "M8x1.25", TOL)).toEqual({ a: "M8x1", b: "M8x1.25", ok: false });
  });
});
