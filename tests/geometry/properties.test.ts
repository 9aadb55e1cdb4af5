import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { DEFAULT_LIMITS, type StudyInput, StudyResultSchema, StudySchema, evaluateStudy } from "../../geometry/index";
import { studyArb } from "./arbitraries";
import { propertyRuns } from "./runs";

// 200 runs per property; on a failure fast-check throws with the seed and path to replay it (`{ seed, path }`).
const RUNS = propertyRuns(200);
const DEFAULT_LENGTH_LIMITS = {
  minRadialClearanceMm: DEFAULT_LIMITS.minRadialClearanceMm,
  minDepthClearanceMm: DEFAULT_LIMITS.minDepthClearanceMm,
  minSealingLandMm: DEFAULT_LIMITS.minSealingLandMm,
  minWallMm: DEFAULT_LIMITS.minWallMm,
  studToleranceMm: DEFAULT_LIMITS.studToleranceMm,
  hardwareMarginMm: DEFAULT_LIMITS.hardwareMarginMm,
  maxRockMm: DEFAULT_LIMITS.maxRockMm,
  minCrankClearanceMm: DEFAULT_LIMITS.minCrankClearanceMm,
  displacementClassesCc: [...DEFAULT_LIMITS.displacementClassesCc],
};
const evalInput = (s: StudyInput, toleranceMm?: number) => evaluateStudy(StudySchema.parse(s), toleranceMm === undefined ? {} : { toleranceMm });
const clone = <T>(x: T): T => structuredClone(x);

/** Every number in a value, with the key path it sits under. */
function numbers(value: unknown, path: string[] = [], out: Array<[string[], number]> = []): Array<[string[], number]> {
  if (typeof value === "number") out.push([path, value]);
  else if (Array.isArray(value)) value.forEach((v, i) => numbers(v, [...path, String(i)], out));
  else if (value && typeof value === "object") for (const [k, v] of Object.entries(value)) numbers(v, [...path, k], out);
  return out;
}

/** Multiplies every length (keys ending in Mm, and everything under them) by k, and cc thresholds by k³. */
function scaleStudy(value: unknown, k: number, power = 0): unknown {
  if (typeof value === "number") return value * k ** power;
  if (Array.isArray(value)) return value.map((v) => scaleStudy(v, k, power));
  if (value && typeof value === "object") {
    return Object.fromEntries(
      Object.entries(value).map(([key, v]) => [key, scaleStudy(v, k, power !== 0 ? power : key.endsWith("Mm") ? 1 : key === "displacementClassesCc" ? 3 : 0)]),
    );
  }
  return value;
}

/** The power of k a result number scales with, from the names on its path. */
function resultPower(path: string[]): number | null {
  // The least cut is quantised to fixed resolutions (0.1 mm of diameter, 0.05 mm of depth), which do not
  // scale; least-cut.test.ts checks it against the proposed cut of the same study instead.
  if (path.includes("leastCut")) return null;
  for (let i = path.length - 1; i >= 0; i--) {
    const key = path[i];
    if (/Mm3$/.test(key) || key === "massG") return 3;
    if (/Mm2$/.test(key)) return 2;
    if (/Mm$/.test(key)) return 1;
    if (key === "displacementCc") return path[i + 1]?.endsWith("Rounded") ? null : 3;
    if (key === "stockDisplacementCc" || key === "displacementClassesCc") return 3;
    if (key === "spindleRpm") return path[i + 1] === "drillTopRpm" ? 0 : -1;
  }
  return 0;
}

const close = (a: number, b: number, rel = 1e-7) => Math.abs(a - b) <= rel * Math.max(1, Math.abs(a), Math.abs(b));

// 200 generated studies take about a second on an idle machine and many times that on a busy one: a wall-clock
// limit of their own, so load never fails a property that holds.
describe("properties of the fit computation", { timeout: 120_000 }, () => {
  it("no valid study gives NaN or Infinity, and every result matches the result schema", () => {
    fc.assert(
      fc.property(studyArb(), (s) => {
        const r = evalInput(s);
        for (const [path, n] of numbers(r)) if (!Number.isFinite(n)) throw new Error(`${path.join(".")} = ${n}`);
        expect(StudyResultSchema.safeParse(r).success).toBe(true);
      }),
      { numRuns: RUNS },
    );
  });

  it("a bigger cut diameter gives more clearance and thinner walls", () => {
    fc.assert(
      fc.property(studyArb({ withCut: true }), fc.double({ min: 0.01, max: 5, noNaN: true }), (s, grow) => {
        const small = evalInput(s);
        const big = clone(s);
        const cut = big.cut;
        if (cut?.diameterMm === undefined) throw new Error("the generator gave no cut diameter");
        cut.diameterMm += grow;
        const large = evalInput(big);
        small.kits.forEach((k, i) => {
          const l = large.kits[i];
          expect((l.effectiveRadialClearanceMm ?? NaN) - (k.effectiveRadialClearanceMm ?? NaN)).toBeCloseTo(grow / 2, 9);
          expect((l.radialClearanceMm.vsCut ?? NaN) - (k.radialClearanceMm.vsCut ?? NaN)).toBeCloseTo(grow / 2, 9);
          k.walls.forEach((w, j) => expect(l.walls[j].minWallMm).toBeLessThan(w.minWallMm));
          expect(l.removal.volumeMm3).toBeGreaterThanOrEqual(k.removal.volumeMm3 - 1e-6);
        });
      }),
      { numRuns: RUNS },
    );
  });

  it("a larger skirt never fits where a smaller one did not", () => {
    fc.assert(
      fc.property(studyArb(), fc.double({ min: 0.01, max: 6, noNaN: true }), (s, grow) => {
        const bigger = clone(s);
        bigger.kits = bigger.kits.map((k) => ({ ...k, skirtDiameterReadingsMm: k.skirtDiameterReadingsMm.map((d) => d + grow) }));
        const a = evalInput(s);
        const b = evalInput(bigger);
        a.kits.forEach((k, i) => {
          if (b.kits[i].verdict !== "cannot-fit") expect(k.verdict).not.toBe("cannot-fit");
          if (b.kits[i].verdict === "fits-as-is") expect(k.verdict).toBe("fits-as-is");
          expect(k.radialClearanceMm.vsMouth).toBeGreaterThan(b.kits[i].radialClearanceMm.vsMouth);
        });
      }),
      { numRuns: RUNS },
    );
  });

  it("scaling every length by k scales every length result by k, areas by k² and volumes by k³", () => {
    fc.assert(
      fc.property(studyArb({ withCut: true }), fc.constantFrom(0.5, 2, 4), (s, k) => {
        // Limits left to their defaults are absolute numbers; give them explicitly so they scale too.
        s.limits = { ...DEFAULT_LENGTH_LIMITS, ...s.limits };
        const base = evalInput(s, 1e-9);
        const scaled = evalInput(scaleStudy(s, k) as StudyInput, 1e-9 * k);
        expect(scaled.kits.map((x) => [x.verdict, x.reasons])).toEqual(base.kits.map((x) => [x.verdict, x.reasons]));
        const bn = numbers(base);
        const sn = numbers(scaled);
        expect(sn.map(([p]) => p.join(".")), "the same figures are present").toEqual(bn.map(([p]) => p.join(".")));
        bn.forEach(([path, v], i) => {
          const p = resultPower(path);
          if (p === null) return;
          if (!close(sn[i][1], v * k ** p, 1e-6)) throw new Error(`${path.join(".")}: ${v} · ${k}^${p} ≠ ${sn[i][1]}`);
        });
      }),
      { numRuns: RUNS },
    );
  });

  it("a study mirrored about the y axis gives mirrored results", () => {
    const mirror = (v: unknown, inPoint = false): unknown => {
      if (Array.isArray(v)) {
        if (inPoint && v.length === 2 && typeof v[0] === "number") return [-v[0], v[1]];
        return v.map((x) => mirror(x, inPoint));
      }
      if (v && typeof v === "object") return Object.fromEntries(Object.entries(v).map(([k, x]) => [k, mirror(x, inPoint || /(points|position|center|centerOffset)Mm$/.test(k))]));
      return v;
    };
    fc.assert(
      fc.property(studyArb(), (s) => {
        const a = evalInput(s);
        const b = evalInput(mirror(s) as StudyInput);
        expect(b.kits.map((x) => [x.verdict, x.reasons])).toEqual(a.kits.map((x) => [x.verdict, x.reasons]));
        a.kits.forEach((k, i) => {
          const m = b.kits[i];
          expect(m.effectiveRadialClearanceMm ?? 0).toBeCloseTo(k.effectiveRadialClearanceMm ?? 0, 6);
          expect(m.radialClearanceMm.vsMouth).toBeCloseTo(k.radialClearanceMm.vsMouth, 6);
          expect(m.maxCutDiameterMm).toBeCloseTo(k.maxCutDiameterMm, 6);
          k.walls.forEach((w, j) => expect(m.walls[j].minWallMm).toBeCloseTo(w.minWallMm, 6));
          // Present on both sides or on neither, and mirrored where present.
          const ki = k.interference.vsMouth;
          const mi = m.interference.vsMouth;
          expect(mi === null).toBe(ki === null);
          expect(mi?.areaMm2 ?? 0).toBeCloseTo(ki?.areaMm2 ?? 0, 4);
          expect(-(mi?.atMm[0] ?? 0)).toBeCloseTo(ki?.atMm[0] ?? 0, 6);
          expect(mi?.atMm[1] ?? 0).toBeCloseTo(ki?.atMm[1] ?? 0, 6);
          expect(m.cut === null).toBe(k.cut === null);
          expect(-(m.cut?.centerAtBottomMm[0] ?? 0)).toBeCloseTo(k.cut?.centerAtBottomMm[0] ?? 0, 9);
          expect(m.cut?.centerAtBottomMm[1] ?? 0).toBeCloseTo(k.cut?.centerAtBottomMm[1] ?? 0, 9);
          // The holder's gradient (a, b) mirrors to (−a, b): its high side turns from θ to 180° − θ.
          expect(m.alignment === null).toBe(k.alignment === null);
          // Three or four readings at studs of a regular pattern always define a plane.
          expect(k.alignment === null).toBe(s.readings === undefined);
          expect(-(b.alignment?.a ?? 0)).toBeCloseTo(a.alignment?.a ?? 0, 9);
          expect(b.alignment?.b ?? 0).toBeCloseTo(a.alignment?.b ?? 0, 9);
          expect(m.alignment?.tiltDeg ?? 0).toBeCloseTo(k.alignment?.tiltDeg ?? 0, 9);
        });
      }),
      { numRuns: RUNS },
    );
  });

  it("every invalid study is rejected with a reason at a path", () => {
    type Loose = { kits: Record<string, unknown>[]; case: Record<string, unknown> & { mouth: Record<string, unknown> }; [key: string]: unknown };
    const mutations: Array<[string, (s: Loose) => void]> = [
      ["negative bore", (s) => (s.kits[0].boreMm = -1)],
      ["zero stud hole", (s) => (s.case.studHoleDiameterMm = 0)],
      ["missing stroke", (s) => delete s.case.strokeMm],
      ["unknown key", (s) => (s.case.surprise = true)],
      ["string for a number", (s) => (s.case.mouth.depthMm = "26")],
      ["NaN skirt", (s) => (s.kits[0].skirtDiameterReadingsMm = [Number.NaN])],
      ["no kits", (s) => (s.kits = [])],
      ["two points", (s) => (s.case.deck = { kind: "polygon", pointsMm: [[0, 0], [1, 1]] })],
      ["unknown outline kind", (s) => (s.case.mouth.outline = { kind: "ellipse", diameterMm: 4 })],
      ["negative cut", (s) => (s.cut = { diameterMm: -3 })],
      ["reading at no stud", (s) => (s.readings = { holderHeights: [{ stud: "nowhere", heightMm: 1 }] })],
    ];
    fc.assert(
      fc.property(studyArb(), fc.integer({ min: 0, max: mutations.length - 1 }), (s, m) => {
        const bad = clone(s) as unknown as Loose;
        mutations[m][1](bad);
        const r = StudySchema.safeParse(bad);
        expect(r.success, mutations[m][0]).toBe(false);
        expect(r.error?.issues.length).toBeGreaterThan(0);
        for (const issue of r.error?.issues ?? []) expect(issue.message.length).toBeGreaterThan(0);
      }),
      { numRuns: RUNS },
    );
  });
});
