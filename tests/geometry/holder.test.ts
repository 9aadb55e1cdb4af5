// The holder's plane from height readings at the case studs (invented round study, studs on a 56 mm square).
// Least squares over a square of four readings: one reading e above a plane through the other three leaves
// residuals of ±e/4 at all four (worked by hand from the normal equations; the plane fit itself is checked
// against ml-matrix in alignment.test.ts). The 0.05 mm rock limit is the default: common practice, no published source.
import { describe, expect, it } from "vitest";
import { type Study, type StudyInput, evaluateStudy } from "../../geometry/index";
import { holderAlignment } from "../../geometry/holder";
import { parse, roundStudyInput } from "./fixtures";

type Reading = { stud: string; heightMm: number; straightedgeMm?: number };
const withReadings = (holderHeights: Reading[]): StudyInput => ({ ...roundStudyInput(), readings: { holderHeights } });
const level = (h: number, extra: Partial<Record<"a" | "b" | "c" | "d", number>> = {}): Reading[] =>
  (["a", "b", "c", "d"] as const).map((stud) => ({ stud, heightMm: h + (extra[stud] ?? 0) }));

/** The parsed round study with readings set after the schema, as a caller holding a Study might. */
function unchecked(readings: Reading[]): Study {
  const st = parse(roundStudyInput());
  return { ...st, readings: { holderHeights: readings.map((r) => ({ straightedgeMm: 0, ...r })) } } as Study;
}

describe("the holder's plane", () => {
  it("no readings: the holder is taken as level, with nothing to say", () => {
    const r = evaluateStudy(parse(roundStudyInput()));
    expect(r.alignment).toBeNull();
    expect(r.warnings).toEqual([]);
    expect(r.kits[0].alignment).toBeNull();
  });

  it("a straightedge laid on the deck adds its thickness to the reading", () => {
    // Stud d reads 27 on a 3 mm straightedge: 30, as the other three, so the holder is level at 30.
    const r = evaluateStudy(parse(withReadings([...level(30).slice(0, 3), { stud: "d", heightMm: 27, straightedgeMm: 3 }])));
    expect(r.alignment?.a).toBeCloseTo(0, 12);
    expect(r.alignment?.b).toBeCloseTo(0, 12);
    expect(r.alignment?.cMm).toBeCloseTo(30, 12);
    expect(r.alignment?.rockMm).toBeCloseTo(0, 12);
  });

  it("gives each stud's residual by its label", () => {
    // Stud b 0.2 high: residuals +0.05 at b and d, −0.05 at a and c (the plane takes a quarter of it each way).
    const r = evaluateStudy(parse(withReadings(level(30, { b: 0.2 }))));
    const res = Object.fromEntries(r.alignment!.residuals.map((x) => [x.stud, x.residualMm]));
    expect(Object.keys(res)).toEqual(["a", "b", "c", "d"]);
    expect(Math.abs(res.b)).toBeCloseTo(0.05, 9);
    expect(res.b).toBeCloseTo(res.d, 9);
    expect(res.a).toBeCloseTo(-res.b, 9);
    expect(r.alignment?.rockMm).toBeCloseTo(0.05, 9);
  });

  it("a reading at a stud the case does not have is left out", () => {
    // The study schema refuses such a reading; the plane fit, given one anyway, ignores it. Three level readings
    // and one 5 mm off at a stud that is not on the case: level, no rock.
    const h = holderAlignment(unchecked([...level(30).slice(0, 3), { stud: "nowhere", heightMm: 35 }]), 0.05, 1e-9);
    expect(h.alignment?.residuals.map((x) => x.stud)).toEqual(["a", "b", "c"]);
    expect(h.alignment?.a).toBeCloseTo(0, 12);
    expect(h.alignment?.cMm).toBeCloseTo(30, 12);
    expect(h.warnings).toEqual([]);
  });
});

describe("what the holder's readings warn about", () => {
  it("a rock exactly at the limit is accepted; beyond it the holder rocks", () => {
    // 0.2 high at one stud: a rock of 0.05, the limit. 0.4 high: 0.1.
    expect(evaluateStudy(parse(withReadings(level(30, { b: 0.2 })))).warnings).toEqual([]);
    const rocks = evaluateStudy(parse(withReadings(level(30, { b: 0.4 }))));
    expect(rocks.warnings.map((w) => w.code)).toEqual(["holder-rocks"]);
    expect(rocks.warnings[0].message).toContain("disagree by up to 0.10 mm from a flat plane (more than 0.05 mm)");
    expect(rocks.alignment).not.toBeNull();
    // With no tolerance: 0.25 high gives a rock of exactly 0.0625 (binary-exact), at a limit of 0.0625 accepted.
    const exact = holderAlignment(unchecked(level(30, { b: 0.25 })), 0.0625, 0);
    expect(exact.plane?.rockMm).toBe(0.0625);
    expect(exact.warnings).toEqual([]);
  });

  it("fewer than three readings at the case's studs give no plane, and say so", () => {
    const r = evaluateStudy(parse(withReadings(level(30).slice(0, 2))));
    expect(r.alignment).toBeNull();
    expect(r.kits[0].alignment).toBeNull();
    expect(r.warnings).toEqual([{ code: "readings-insufficient", message: expect.stringContaining("At least three holder readings") }]);
    // Two at the case's studs and one elsewhere are still two.
    const h = holderAlignment(unchecked([...level(30).slice(0, 2), { stud: "nowhere", heightMm: 30 }]), 0.05, 1e-9);
    expect(h).toMatchObject({ plane: null, alignment: null, warnings: [{ code: "readings-insufficient" }] });
  });
});
