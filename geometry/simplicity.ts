import { orient2d } from "robust-predicates";
import { signedArea } from "./polygon";
import type { Vec2 } from "./vec";

// Whether a polygon is a simple outline: one loop that goes round once, never meets itself. Decided with
// exact orientation tests (Shewchuk's adaptive predicates, through robust-predicates), so a touch or an
// overlap is found exactly, with no tolerance to choose.

/** Least area a polygon outline must enclose, mm². */
export const DEFAULT_MIN_POLYGON_AREA_MM2 = 1e-6;

/** What keeps a polygon from being a simple outline; corners and edges by index from 0 (edge i runs from corner i to i + 1). */
export type PolygonProblem =
  | { readonly kind: "repeated-point"; readonly corner: number }
  | { readonly kind: "no-area" }
  | { readonly kind: "repeated-corner"; readonly first: number; readonly second: number }
  | { readonly kind: "edges-cross"; readonly edges: readonly [number, number] }
  | { readonly kind: "edges-touch"; readonly edges: readonly [number, number] };

/** The problem in words for the field, corners and edges counted from 1. */
export function describePolygonProblem(p: PolygonProblem, cornerCount: number): string {
  switch (p.kind) {
    case "repeated-point":
      return `corners ${p.corner + 1} and ${((p.corner + 1) % cornerCount) + 1} are the same point; remove one of them`;
    case "no-area":
      return "polygon has no area (points are collinear or repeated)";
    case "repeated-corner":
      return `corner ${p.second + 1} repeats corner ${p.first + 1}: the outline must go round once without coming back to a corner`;
    case "edges-cross":
      return `polygon edges ${p.edges[0] + 1} and ${p.edges[1] + 1} cross; the outline must not intersect itself`;
    case "edges-touch":
      return `polygon edges ${p.edges[0] + 1} and ${p.edges[1] + 1} touch or overlap; the outline must not meet itself`;
  }
}

interface Edge {
  readonly i: number;
  readonly lx: number;
  readonly ly: number;
  readonly rx: number;
  readonly ry: number;
}

/**
 * The first reason the polygon is not a simple outline, or null: repeated consecutive corners, no area, a corner
 * visited twice (an outline traced round twice), or two edges that cross, touch or overlap. O(n log n), by the
 * Shamos–Hoey sweep (Shamos and Hoey, "Geometric intersection problems", FOCS 1976; de Berg et al.,
 * Computational Geometry, 3rd ed., §2.1).
 */
export function polygonProblem(points: readonly Vec2[], minAreaMm2: number = DEFAULT_MIN_POLYGON_AREA_MM2): PolygonProblem | null {
  return polygonCheck(points, minAreaMm2).problem;
}

/**
 * polygonProblem's answer and how the edges were decided: "sweep", or "pairwise" if the sweep ever found its
 * order broken and checked every pair instead (never expected: it keeps a wrong answer impossible, at O(n²)).
 */
export function polygonCheck(points: readonly Vec2[], minAreaMm2: number = DEFAULT_MIN_POLYGON_AREA_MM2): { problem: PolygonProblem | null; method: "sweep" | "pairwise" } {
  const n = points.length;
  const early = (problem: PolygonProblem) => ({ problem, method: "sweep" as const });
  for (let i = 0; i < n; i++) {
    const p = points[i];
    const q = points[(i + 1) % n];
    if (p[0] === q[0] && p[1] === q[1]) return early({ kind: "repeated-point", corner: i });
  }
  const xs = Float64Array.from(points, (p) => p[0]);
  const ys = Float64Array.from(points, (p) => p[1]);
  const order = Uint32Array.from({ length: n }, (_, i) => i).sort((a, b) => xs[a] - xs[b] || ys[a] - ys[b]);
  for (let k = 1; k < n; k++) {
    const a = points[order[k - 1]];
    const b = points[order[k]];
    if (a[0] === b[0] && a[1] === b[1]) return early({ kind: "repeated-corner", first: Math.min(order[k - 1], order[k]), second: Math.max(order[k - 1], order[k]) });
  }
  const swept = sweep(points, order);
  const method = swept === LOST ? "pairwise" : "sweep";
  const met = swept === LOST ? pairwiseProblem(points) : swept;
  // Corners all on one line fold the outline onto itself: say it has no area rather than which edges overlap.
  const flat = Math.abs(signedArea(points)) < minAreaMm2;
  if (flat && (met === undefined || met.kind === "edges-touch")) return { problem: { kind: "no-area" }, method };
  return { problem: met ?? null, method };
}

/** What the sweep returns when its order is found broken. */
const LOST = "lost";

/** Compatibility form of polygonProblem's edge test: the first pair of edges that cross or touch, or none. */
export function selfIntersections(points: readonly Vec2[]): Array<[number, number]> {
  const p = polygonProblem(points, 0);
  return p && (p.kind === "edges-cross" || p.kind === "edges-touch") ? [[p.edges[0], p.edges[1]]] : [];
}

function edgesOf(points: readonly Vec2[]): Edge[] {
  const n = points.length;
  return points.map((a, i) => {
    const b = points[(i + 1) % n];
    const aFirst = a[0] < b[0] || (a[0] === b[0] && a[1] < b[1]);
    const [l, r] = aFirst ? [a, b] : [b, a];
    return { i, lx: l[0], ly: l[1], rx: r[0], ry: r[1] };
  });
}

const pair = (a: number, b: number): [number, number] => (a < b ? [a, b] : [b, a]);

/** The sweep proper, over corners that are all distinct: the status holds the edges the sweep line crosses, bottom to top. */
function sweep(points: readonly Vec2[], order: Uint32Array): PolygonProblem | undefined | typeof LOST {
  const n = points.length;
  const edges = edgesOf(points);
  const adjacent = (a: Edge, b: Edge) => (a.i + 1) % n === b.i || (b.i + 1) % n === a.i;
  const status: Edge[] = [];
  const check = (a: Edge | undefined, b: Edge | undefined): PolygonProblem | undefined => {
    if (!a || !b || adjacent(a, b)) return undefined;
    const m = meet(a, b);
    return m ? { kind: m === "cross" ? "edges-cross" : "edges-touch", edges: pair(a.i, b.i) } : undefined;
  };
  for (const v of order) {
    const [x, y] = points[v];
    const prev = edges[(v - 1 + n) % n];
    const next = edges[v];
    const prevEnds = prev.rx === x && prev.ry === y;
    const nextEnds = next.rx === x && next.ry === y;
    const ending = prevEnds ? (nextEnds ? [prev, next] : [prev]) : nextEnds ? [next] : [];
    const starting = prevEnds ? (nextEnds ? [] : [next]) : nextEnds ? [prev] : [prev, next];
    // The edges below the corner come first in the status; those through it follow, then those above.
    let lo = 0;
    let hi = status.length;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      const s = status[mid];
      if (orient2d(s.lx, s.ly, s.rx, s.ry, x, y) > 0) lo = mid + 1;
      else hi = mid;
    }
    let end = lo;
    while (end < status.length && orient2d(status[end].lx, status[end].ly, status[end].rx, status[end].ry, x, y) === 0) {
      const s = status[end];
      if (s !== prev && s !== next) return { kind: "edges-touch", edges: pair(s.i, adjacent(s, next) ? prev.i : next.i) };
      end++;
    }
    // Every edge ending here must be in the status at this corner; if not, the order was lost.
    if (end - lo !== ending.length) return LOST;
    // Two edges ending here along one line need no test of their own: the nearer one's left end lies inside the
    // other, so the check above refused it at that corner, met earlier.
    status.splice(lo, ending.length);
    if (starting.length === 2) {
      const turn = orient2d(x, y, starting[0].rx, starting[0].ry, starting[1].rx, starting[1].ry);
      if (turn === 0) return { kind: "edges-touch", edges: pair(prev.i, next.i) };
      if (turn < 0) starting.reverse();
    }
    if (starting.length === 2) status.splice(lo, 0, starting[0], starting[1]);
    else if (starting.length === 1) status.splice(lo, 0, starting[0]);
    // The new neighbours: below the corner's edges and above them (the same pair when nothing starts here).
    const found = check(status[lo - 1], status[lo]) ?? check(status[lo + starting.length - 1], status[lo + starting.length]);
    if (found) return found;
  }
  return undefined;
}

/** How two edges meet: a proper crossing, a touch (an end on the other edge, or a collinear overlap), or not at all. */
function meet(s: Edge, t: Edge): "cross" | "touch" | null {
  const o1 = orient2d(s.lx, s.ly, s.rx, s.ry, t.lx, t.ly);
  const o2 = orient2d(s.lx, s.ly, s.rx, s.ry, t.rx, t.ry);
  const o3 = orient2d(t.lx, t.ly, t.rx, t.ry, s.lx, s.ly);
  const o4 = orient2d(t.lx, t.ly, t.rx, t.ry, s.rx, s.ry);
  if (((o1 > 0 && o2 < 0) || (o1 < 0 && o2 > 0)) && ((o3 > 0 && o4 < 0) || (o3 < 0 && o4 > 0))) return "cross";
  if ((o1 === 0 && within(s, t.lx, t.ly)) || (o2 === 0 && within(s, t.rx, t.ry)) || (o3 === 0 && within(t, s.lx, s.ly)) || (o4 === 0 && within(t, s.rx, s.ry))) return "touch";
  return null;
}

/** For a point on the edge's line: whether it lies between the edge's ends (lexicographic order along the line). */
function within(e: Edge, x: number, y: number): boolean {
  return (x > e.lx || (x === e.lx && y >= e.ly)) && (x < e.rx || (x === e.rx && y <= e.ry));
}

/**
 * The first pair of edges, in index order, that cross, touch or overlap, found by testing every pair: O(n²). For
 * corners that are all distinct (polygonCheck refuses repeated ones first). polygonCheck's safety net for a sweep
 * that finds its order broken (kept so that a wrong answer is never given), and the plain reference the sweep is
 * tested against.
 */
export function pairwiseProblem(points: readonly Vec2[]): PolygonProblem | undefined {
  const n = points.length;
  const edges = edgesOf(points);
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) {
      const a = edges[i];
      const b = edges[j];
      if (j === i + 1 || (i === 0 && j === n - 1)) {
        // Adjacent edges share one corner; they fail only by folding back along each other.
        const shared = j === i + 1 ? points[j] : points[0];
        const other = (e: Edge) => (e.lx === shared[0] && e.ly === shared[1] ? [e.rx, e.ry] : [e.lx, e.ly]);
        const [ax, ay] = other(a);
        const [bx, by] = other(b);
        if (orient2d(shared[0], shared[1], ax, ay, bx, by) === 0 && (ax - shared[0]) * (bx - shared[0]) + (ay - shared[1]) * (by - shared[1]) > 0) {
          return { kind: "edges-touch", edges: [i, j] };
        }
        continue;
      }
      const m = meet(a, b);
      if (m) return { kind: m === "cross" ? "edges-cross" : "edges-touch", edges: [i, j] };
    }
  }
  return undefined;
}
