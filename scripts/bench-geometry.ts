// Benchmark of the geometry core: `npm run bench:geometry`. Not a timed test.
// For each scenario it prints the median time per evaluateStudy call and its ratio to the floor: the
// bare @flatten-js/core distance, containment and boolean calls that the same evaluation makes, replayed
// on the very same shapes. The calls are recorded by wrapping the library's methods during one probe run.

import Flatten from "@flatten-js/core";
import { readFileSync } from "node:fs";
import { type Study, type StudyInput, StudySchema, evaluateStudy } from "../geometry/index";

type Call = () => unknown;

const SAMPLES = 1500;
const WARMUP = 300;

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
}

function timeMedianMs(fn: (i: number) => void, samples = SAMPLES): number {
  for (let i = 0; i < WARMUP; i++) fn(i);
  const t: number[] = [];
  for (let i = 0; i < samples; i++) {
    const t0 = performance.now();
    fn(i);
    t.push(performance.now() - t0);
  }
  return median(t);
}

/**
 * Runs one evaluation with the library's Point.distanceTo, Polygon.contains and the boolean intersection
 * observed, and returns each call as a replayable closure. BooleanOperations is a frozen module namespace,
 * so an intersection is recognised by its first steps (it clones both operands) and its end (the adapter
 * asks the result for its area); calls the library makes inside the boolean are not counted twice.
 */
function recordFlattenCalls(study: Study): Call[] {
  const calls: Call[] = [];
  const pointProto = Flatten.Point.prototype as unknown as { distanceTo: (s: unknown) => unknown };
  const polyProto = Flatten.Polygon.prototype as unknown as { contains: (s: unknown) => unknown; clone: () => unknown; area: () => number };
  const orig = { distanceTo: pointProto.distanceTo, contains: polyProto.contains, clone: polyProto.clone, area: polyProto.area };
  let operands: Flatten.Polygon[] = [];
  let depth = 0; // > 0 while inside a recorded call: the library's own nested calls are part of it
  const observe = <T>(replay: () => T): T => {
    if (depth === 0 && operands.length === 0) calls.push(replay);
    depth++;
    try {
      return replay();
    } finally {
      depth--;
    }
  };
  pointProto.distanceTo = function (this: unknown, shape: unknown) {
    return observe(() => orig.distanceTo.call(this, shape));
  };
  polyProto.contains = function (this: unknown, shape: unknown) {
    return observe(() => orig.contains.call(this, shape));
  };
  polyProto.clone = function (this: Flatten.Polygon) {
    if (depth === 0 && operands.length < 2) operands.push(this);
    return orig.clone.call(this);
  };
  polyProto.area = function (this: unknown) {
    if (depth === 0 && operands.length === 2) {
      const [a, b] = operands;
      calls.push(() => Flatten.BooleanOperations.intersect(a, b).area());
      operands = [];
    }
    return orig.area.call(this);
  };
  try {
    evaluateStudy(study);
  } finally {
    Object.assign(pointProto, { distanceTo: orig.distanceTo });
    Object.assign(polyProto, { contains: orig.contains, clone: orig.clone, area: orig.area });
  }
  if (operands.length !== 0) throw new Error("bench: an intersection was not closed by an area call; the recording is unreliable");
  return calls;
}

function scenario(name: string, input: StudyInput) {
  const study = StudySchema.parse(input);
  const calls = recordFlattenCalls(study);
  const evalMs = timeMedianMs(() => {
    evaluateStudy(study);
  });
  // Cold: a fresh study object each time, so no flatten polygon is reused from the per-study cache.
  const clones = Array.from({ length: SAMPLES + WARMUP }, () => StudySchema.parse(structuredClone(input)));
  const coldMs = timeMedianMs((i) => {
    evaluateStudy(clones[i]);
  });
  const floorMs = calls.length
    ? timeMedianMs(() => {
        for (const c of calls) c();
      })
    : 0;
  const ratio = (x: number) => (floorMs > 0 ? `${(x / floorMs).toFixed(2)}×` : "n/a (no flatten calls)");
  return { name, kits: study.kits.length, flattenCalls: calls.length, evalMs, coldMs, floorMs, ratio: ratio(evalMs), coldRatio: ratio(coldMs) };
}

const example = JSON.parse(readFileSync(new URL("../public/examples/study.json", import.meta.url), "utf8")) as StudyInput;

const roundCase: StudyInput = {
  ...example,
  case: { ...example.case, deck: { kind: "circle", diameterMm: 112 } },
  kits: [example.kits[0]],
};

const polygonCase: StudyInput = {
  ...example,
  case: {
    ...example.case,
    mouth: { outline: { kind: "polygon", pointsMm: [[-23, -20], [23, -20], [25, 0], [23, 20], [-23, 20], [-25, 0]] }, depthMm: 26 },
    pockets: [
      { label: "left transfer passage", outline: { kind: "polygon", pointsMm: [[-36, -9], [-30.5, -8], [-30, 0], [-30.5, 8], [-36, 9]] } },
      { label: "right transfer passage", outline: { kind: "polygon", pointsMm: [[36, -9], [36, 9], [30.5, 8], [30, 0], [30.5, -8]] } },
      { label: "front boost passage", outline: { kind: "polygon", pointsMm: [[-7, 30.5], [7, 30.5], [8, 35], [-8, 35]] } },
      { label: "rear cavity", outline: { kind: "polygon", pointsMm: [[-7, -30.5], [-8, -35], [8, -35], [7, -30.5]] } },
    ],
  },
  kits: [example.kits[0]],
};

const lineup: StudyInput = {
  ...example,
  kits: Array.from({ length: 20 }, (_, i) => ({
    ...example.kits[0],
    id: `kit-${i + 1}`,
    name: `Lineup kit ${i + 1}`,
    boreMm: 44 + i * 0.4,
    skirtDiameterReadingsMm: [50 + i * 0.3, 50.05 + i * 0.3],
  })),
};

const rows = [scenario("round case, 1 kit", roundCase), scenario("polygon case, 4 pockets, 1 kit", polygonCase), scenario("lineup, 20 kits", lineup)];

const ms = (x: number) => `${x.toFixed(4)} ms`;
console.log(`geometry bench — Node ${process.version}, median of ${SAMPLES} evaluations after ${WARMUP} warm-up\n`);
console.log("| scenario | kits | flatten calls | median per evaluation | cold (new study object) | flatten floor | ratio to floor | cold ratio |");
console.log("|---|---|---|---|---|---|---|---|");
for (const r of rows) {
  console.log(`| ${r.name} | ${r.kits} | ${r.flattenCalls} | ${ms(r.evalMs)} | ${ms(r.coldMs)} | ${ms(r.floorMs)} | ${r.ratio} | ${r.coldRatio} |`);
}
const one = rows[0].evalMs < 1 && rows[1].evalMs < 1;
const twenty = rows[2].evalMs < 10;
console.log(`\naims: one kit under 1 ms — ${one ? "met" : "NOT met"}; 20 kits under 10 ms — ${twenty ? "met" : "NOT met"}`);
