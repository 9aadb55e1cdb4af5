// Benchmark of the geometry core: `npm run bench:geometry`. Not a timed test: it prints medians and ratios
// against baselines measured in the same run, on the same shapes.
//
// Evaluation: the median time of evaluateStudy per scenario, against two floors built from the result's own
// cut and skirt: the polygon queries a kit needs at least (the distance from each cut centre to every polygon
// outline, and the skirt's and the cut's area inside a polygon mouth), answered once by the core's analytic
// functions and once by @flatten-js/core (distance, containment and the boolean intersection on the exact
// circle), which the core used before. Validation: the sweep against the pairwise check it replaced. Depth stop:
// the largest rig the schema allows.

import { readFileSync } from "node:fs";
import { availableParallelism, loadavg } from "node:os";
import { depthStopWorkBound, searchDepthStop } from "../geometry/depth-stop";
import { flattenDiskPolygonArea, flattenPointToPolygonBoundary } from "../geometry/flatten-adapter";
import { type Outline, type Study, type StudyInput, StudySchema, evaluateStudy } from "../geometry/index";
import { diskInsideArea } from "../geometry/outline";
import { pointToPolygonBoundary } from "../geometry/polygon";
import { MAX_GROOVES, MAX_OUTLINE_CORNERS, MAX_SHIMS_PER_SIZE, MAX_SHIM_SIZES } from "../geometry/schema";
import { polygonProblem } from "../geometry/simplicity";
import { DEFAULT_TOLERANCE_MM } from "../geometry/tolerance";
import type { Vec2 } from "../geometry/vec";

type P = [number, number];
const TOL = DEFAULT_TOLERANCE_MM;

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
}

/** A timing: the median, and the best sample (what the call costs when nothing else takes the core). */
interface Timing {
  readonly median: number;
  readonly best: number;
}

/** Wall time of fn in ms; fast calls are timed in batches so the timer's resolution does not count. */
function timeMs(fn: () => void, budgetMs = 400): Timing {
  const t0 = performance.now();
  let calls = 0;
  while (performance.now() - t0 < budgetMs / 4 || calls < 3) {
    fn();
    calls++;
  }
  const perCall = (performance.now() - t0) / calls;
  const batch = Math.max(1, Math.round(0.2 / perCall));
  const samples: number[] = [];
  const t1 = performance.now();
  while ((performance.now() - t1 < budgetMs || samples.length < 15) && samples.length < 2000) {
    const s = performance.now();
    for (let i = 0; i < batch; i++) fn();
    samples.push((performance.now() - s) / batch);
  }
  return { median: median(samples), best: Math.min(...samples) };
}

type Query = { kind: "distance"; p: Vec2; points: readonly Vec2[] } | { kind: "area"; c: Vec2; r: number; outline: Outline & { kind: "polygon" } };

/** The polygon queries a study's kits need at least, from the result's own cut centres, cut and skirt. */
function polygonQueries(study: Study): Query[] {
  const result = evaluateStudy(study);
  const polygons: Outline[] = [study.case.deck, study.case.mouth.outline, ...study.case.pockets.map((p) => p.outline)];
  const mouth = study.case.mouth.outline;
  const out: Query[] = [];
  for (const k of result.kits) {
    const centres: Vec2[] = k.cut ? [k.cut.centerAtDeckMm, k.cut.centerAtBottomMm] : [];
    for (const o of polygons) if (o.kind === "polygon") for (const p of centres) out.push({ kind: "distance", p, points: o.pointsMm });
    if (mouth.kind === "polygon") {
      out.push({ kind: "distance", p: k.skirt.centerMm, points: mouth.pointsMm });
      out.push({ kind: "area", c: k.skirt.centerMm, r: k.skirt.diameterMm / 2, outline: mouth });
      if (k.cut) out.push({ kind: "area", c: k.cut.centerAtDeckMm, r: k.cut.diameterMm / 2, outline: mouth });
    }
  }
  return out;
}

function scenario(name: string, input: StudyInput) {
  const study = StudySchema.parse(input);
  const queries = polygonQueries(study);
  const evalMs = timeMs(() => void evaluateStudy(study));
  let flattenFailures = 0;
  const none: Timing = { median: 0, best: 0 };
  const analyticMs = queries.length
    ? timeMs(() => {
        for (const q of queries) {
          if (q.kind === "distance") pointToPolygonBoundary(q.p, q.points, TOL);
          else diskInsideArea(q.c, q.r, q.outline, TOL);
        }
      })
    : none;
  const flattenMs = queries.length
    ? timeMs(() => {
        for (const q of queries) {
          if (q.kind === "distance") flattenPointToPolygonBoundary(q.p, q.points);
          else {
            try {
              flattenDiskPolygonArea(q.c, q.r, q.outline.pointsMm);
            } catch {
              // A failed boolean is what the core no longer risks; it is counted, and the floor keeps its time.
              flattenFailures++;
            }
          }
        }
      })
    : none;
  return { name, kits: study.kits.length, queries: queries.length, evalMs, analyticMs, flattenMs, flattenFailed: flattenFailures > 0 };
}

const example = JSON.parse(readFileSync(new URL("../public/examples/study.json", import.meta.url), "utf8")) as StudyInput;
const kit0 = example.kits[0];
const lineupKits = (n: number) =>
  Array.from({ length: n }, (_, i) => ({ ...kit0, id: `kit-${i + 1}`, name: `Lineup kit ${i + 1}`, boreMm: 44 + i * 0.4, skirtDiameterReadingsMm: [50 + i * 0.3, 50.05 + i * 0.3] }));

const polygonCase: StudyInput["case"] = {
  ...example.case,
  mouth: { outline: { kind: "polygon", pointsMm: [[-23, -20], [23, -20], [25, 0], [23, 20], [-23, 20], [-25, 0]] }, depthMm: 26 },
  pockets: [
    { label: "left transfer passage", outline: { kind: "polygon", pointsMm: [[-36, -9], [-30.5, -8], [-30, 0], [-30.5, 8], [-36, 9]] } },
    { label: "right transfer passage", outline: { kind: "polygon", pointsMm: [[36, -9], [36, 9], [30.5, 8], [30, 0], [30.5, -8]] } },
    { label: "front boost passage", outline: { kind: "polygon", pointsMm: [[-7, 30.5], [7, 30.5], [8, 35], [-8, 35]] } },
    { label: "rear cavity", outline: { kind: "polygon", pointsMm: [[-7, -30.5], [-8, -35], [8, -35], [7, -30.5]] } },
  ],
};

/** A circle of radius 23 mm traced as 500 corners with 0.1 % jitter (a seeded sequence). */
function jitteredRing(n: number, r: number, jitter: number, seed0 = 7): P[] {
  let seed = seed0;
  const rnd = () => (seed = (seed * 16807) % 2147483647) / 2147483647;
  return Array.from({ length: n }, (_, i): P => {
    const t = (2 * Math.PI * i) / n;
    const rr = r * (1 + jitter * (2 * rnd() - 1));
    return [rr * Math.cos(t), rr * Math.sin(t)];
  });
}

const rows = [
  scenario("round case, 1 kit", { ...example, case: { ...example.case, deck: { kind: "circle", diameterMm: 112 } }, kits: [kit0] }),
  scenario("polygon case, 4 pockets, 1 kit", { ...example, case: polygonCase, kits: [kit0] }),
  scenario("polygon case, 4 pockets, 20 kits", { ...example, case: polygonCase, kits: lineupKits(20) }),
  scenario("example case, 20 kits", { ...example, kits: lineupKits(20) }),
  scenario("traced mouth of 500 corners, 1 kit", {
    ...example,
    case: { ...example.case, mouth: { outline: { kind: "polygon", pointsMm: jitteredRing(500, 23, 0.001) }, depthMm: 26 } },
    kits: [{ ...kit0, skirtDiameterReadingsMm: [46.002] }],
  }),
];

const one_ = (x: number) => (x < 0.1 ? `${(x * 1000).toFixed(1)} µs` : `${x.toFixed(3)} ms`);
const ms = (t: Timing) => `${one_(t.median)} (best ${one_(t.best)})`;
const ratio = (a: Timing, b: Timing) => (b.median > 0 ? `${(a.median / b.median).toFixed(2)}× (best ${(a.best / b.best).toFixed(2)}×)` : "n/a");
console.log(`geometry bench — Node ${process.version}, medians; ${availableParallelism()} cores, load average ${loadavg()[0].toFixed(1)} (figures scale with it)\n`);
console.log("## Evaluation (evaluateStudy)\n");
console.log("| scenario | kits | polygon queries | evaluation | analytic floor | flatten-js floor | evaluation / flatten floor | analytic / flatten floor |");
console.log("|---|---|---|---|---|---|---|---|");
for (const r of rows) {
  const flat = `${ms(r.flattenMs)}${r.flattenFailed ? " (its boolean threw)" : ""}`;
  console.log(`| ${r.name} | ${r.kits} | ${r.queries} | ${ms(r.evalMs)} | ${ms(r.analyticMs)} | ${flat} | ${ratio(r.evalMs, r.flattenMs)} | ${ratio(r.analyticMs, r.flattenMs)} |`);
}

// Validation: one outline of the most corners allowed, by the sweep and by the pairwise check it replaced.
function pairwiseCrossings(points: readonly P[]): number {
  const n = points.length;
  const o = (a: P, b: P, c: P) => (b[0] - a[0]) * (c[1] - a[1]) - (b[1] - a[1]) * (c[0] - a[0]);
  let found = 0;
  for (let i = 0; i < n; i++) {
    for (let j = i + 2; j < n; j++) {
      if (i === 0 && j === n - 1) continue;
      const [a, b, c, d] = [points[i], points[(i + 1) % n], points[j], points[(j + 1) % n]];
      if (o(a, b, c) * o(a, b, d) < 0 && o(c, d, a) * o(c, d, b) < 0) found++;
    }
  }
  return found;
}
const n = MAX_OUTLINE_CORNERS;
const shapes: [string, P[]][] = [
  [`traced ring, ${n} corners`, jitteredRing(n, 30, 0.001)],
  [`star, ${n} corners`, Array.from({ length: n }, (_, i): P => [(i % 2 ? 1 : 100) * Math.cos((2 * Math.PI * i) / n), (i % 2 ? 1 : 100) * Math.sin((2 * Math.PI * i) / n)])],
];
console.log("\n## Outline validation (one polygon)\n");
console.log("| outline | sweep (polygonProblem) | pairwise check (before) | sweep / pairwise |");
console.log("|---|---|---|---|");
for (const [name, pts] of shapes) {
  const sweepMs = timeMs(() => void polygonProblem(pts));
  const pairMs = timeMs(() => void pairwiseCrossings(pts), 1500);
  console.log(`| ${name} | ${ms(sweepMs)} | ${ms(pairMs)} | ${ratio(sweepMs, pairMs)} |`);
}
const bigCase = {
  ...example,
  case: {
    ...example.case,
    deck: { kind: "polygon" as const, pointsMm: jitteredRing(n, 60, 0.001, 3) },
    mouth: { outline: { kind: "polygon" as const, pointsMm: jitteredRing(n, 23, 0.001, 5) }, depthMm: 26 },
    pockets: [{ label: "traced passage", outline: { kind: "polygon" as const, pointsMm: jitteredRing(n, 3, 0.001, 9).map((p): P => [p[0] + 33, p[1]]) } }],
  },
};
const parseMs = timeMs(() => void StudySchema.parse(bigCase), 1500);
console.log(`\nWhole study with the most case corners allowed (3 outlines × ${n}): StudySchema.parse ${ms(parseMs)}`);

// Depth stop: the largest rig the schema allows, thicknesses with no two stacks alike.
const odd = [0.0137, 0.0291, 0.0433, 0.0577, 0.0711, 0.0853];
const rig = {
  grooves: Array.from({ length: MAX_GROOVES }, (_, i) => ({ label: `g${i + 1}`, travelMm: 20 + i * 1.37 })),
  shims: odd.slice(0, MAX_SHIM_SIZES).map((thicknessMm) => ({ thicknessMm, count: MAX_SHIMS_PER_SIZE })),
};
let visited = 0;
// A new stock array each call, so the halves are built afresh rather than taken from the per-stock cache.
const freshMs = timeMs(() => void (visited = searchDepthStop(27.77, { grooves: rig.grooves, shims: [...rig.shims] }, TOL).statesVisited), 1500);
const cachedMs = timeMs(() => void searchDepthStop(27.77, rig, TOL), 1500);
console.log(`\n## Depth stop\n\nLargest rig allowed (${MAX_GROOVES} grooves, ${MAX_SHIM_SIZES} sizes × ${MAX_SHIMS_PER_SIZE}): first search ${ms(freshMs)}, ${visited} states visited (bound ${depthStopWorkBound(rig)}); the next kit of the study ${ms(cachedMs)}`);

const aim = (t: Timing, limitMs: number) => (t.median <= limitMs ? "met" : t.best <= limitMs ? "met by the best sample only (a busy machine)" : "NOT met");
console.log(`\naims: polygon case one kit ≤ 0.1 ms — ${aim(rows[1].evalMs, 0.1)} (${ms(rows[1].evalMs)}); 20 kits ≤ 1 ms — ${aim(rows[2].evalMs, 1)} (${ms(rows[2].evalMs)})`);
