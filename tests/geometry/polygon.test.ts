import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { MAX_CASE_CORNERS, MAX_OUTLINE_CORNERS, OutlineSchema, StudySchema } from "../../geometry/schema";
import { describePolygonProblem, pairwiseProblem, polygonCheck, polygonProblem, selfIntersections } from "../../geometry/simplicity";
import { roundStudyInput } from "./fixtures";

type P = [number, number];

// The reference: every pair of edges, in plain arithmetic. On small integer coordinates every product is exact,
// so the reference is exact too, and the grid makes touches, overlaps and repeated corners common.
const orient = (a: P, b: P, c: P) => (b[0] - a[0]) * (c[1] - a[1]) - (b[1] - a[1]) * (c[0] - a[0]);
const onSegment = (a: P, b: P, p: P) => orient(a, b, p) === 0 && Math.min(a[0], b[0]) <= p[0] && p[0] <= Math.max(a[0], b[0]) && Math.min(a[1], b[1]) <= p[1] && p[1] <= Math.max(a[1], b[1]);
function segmentsMeet(a: P, b: P, c: P, d: P): boolean {
  const o1 = orient(a, b, c);
  const o2 = orient(a, b, d);
  const o3 = orient(c, d, a);
  const o4 = orient(c, d, b);
  if (Math.sign(o1) * Math.sign(o2) < 0 && Math.sign(o3) * Math.sign(o4) < 0) return true;
  return onSegment(a, b, c) || onSegment(a, b, d) || onSegment(c, d, a) || onSegment(c, d, b);
}
const crossProperly = (a: P, b: P, c: P, d: P) => Math.sign(orient(a, b, c)) * Math.sign(orient(a, b, d)) < 0 && Math.sign(orient(c, d, a)) * Math.sign(orient(c, d, b)) < 0;
const key = (p: P) => `${p[0]},${p[1]}`;
const distinctCorners = (pts: P[]) => new Set(pts.map(key)).size === pts.length;
const areaOf = (pts: P[]) => {
  let twice = 0;
  for (let i = 0; i < pts.length; i++) twice += pts[i][0] * pts[(i + 1) % pts.length][1] - pts[(i + 1) % pts.length][0] * pts[i][1];
  return Math.abs(twice / 2);
};
/** The first pair of edges (i < j, in index order) that meet anywhere but at the corner two neighbours share. */
function firstMeetingPair(pts: P[]): [number, number] | null {
  const n = pts.length;
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) {
      const [a, b, c, d] = [pts[i], pts[(i + 1) % n], pts[j], pts[(j + 1) % n]];
      if (j === i + 1 || (i === 0 && j === n - 1)) {
        // Adjacent edges share one corner and may meet nowhere else: the far end of one must not lie on the other.
        const [shared, p, q] = j === i + 1 ? [b, a, d] : [a, b, c];
        if (onSegment(shared, p, q) || onSegment(shared, q, p)) return [i, j];
      } else if (segmentsMeet(a, b, c, d)) {
        return [i, j];
      }
    }
  }
  return null;
}
const anyProperCrossing = (pts: P[]) => pts.some((_, i) => pts.some((__, j) => j > i + 1 && !(i === 0 && j === pts.length - 1) && crossProperly(pts[i], pts[(i + 1) % pts.length], pts[j], pts[(j + 1) % pts.length])));
const simpleByBruteForce = (pts: P[]) => distinctCorners(pts) && areaOf(pts) >= 1e-6 && firstMeetingPair(pts) === null;

const gridPolygonArb = fc.array(fc.tuple(fc.integer({ min: 0, max: 6 }), fc.integer({ min: 0, max: 6 })), { minLength: 3, maxLength: 12 }) as fc.Arbitrary<P[]>;

/** A star-shaped polygon snapped to a coarse grid: often simple, sometimes made invalid by the snapping. */
const snappedStarArb = fc
  .record({ n: fc.integer({ min: 3, max: 30 }), radii: fc.array(fc.integer({ min: 2, max: 40 }), { minLength: 30, maxLength: 30 }), cw: fc.boolean() })
  .map(({ n, radii, cw }) => {
    const pts = Array.from({ length: n }, (_, i): P => [Math.round(radii[i] * Math.cos((2 * Math.PI * i) / n)), Math.round(radii[i] * Math.sin((2 * Math.PI * i) / n))]);
    return cw ? pts.reverse() : pts;
  });

describe("polygon validity by sweep", { timeout: 60_000 }, () => {
  it("agrees with the pairwise check on random polygons of a small grid (touches, overlaps and repeats included)", () => {
    const seen = { valid: 0, invalid: 0 };
    fc.assert(
      fc.property(fc.oneof(gridPolygonArb, snappedStarArb), (pts) => {
        const expected = simpleByBruteForce(pts);
        const { problem, method } = polygonCheck(pts);
        expect(problem === null).toBe(expected);
        // The sweep decides alone: the pairwise safety net, which would make it O(n²), is never needed.
        expect(method).toBe("sweep");
        seen[expected ? "valid" : "invalid"]++;
        // The reason given is the first that applies, in the order polygonCheck tests them.
        const n = pts.length;
        if (pts.some((p, i) => key(p) === key(pts[(i + 1) % n]))) expect(problem?.kind).toBe("repeated-point");
        else if (!distinctCorners(pts)) expect(problem?.kind).toBe("repeated-corner");
        else if (areaOf(pts) < 1e-6) expect(problem?.kind).toMatch(anyProperCrossing(pts) ? /^(no-area|edges-cross)$/ : /^no-area$/);
        else if (!expected) expect(problem?.kind).toMatch(/^edges-(cross|touch)$/);
        // An edge pair it names really meets, lower number first, and is called a crossing exactly when the two
        // edges cross properly (each one's ends strictly on either side of the other's line).
        if (problem && (problem.kind === "edges-cross" || problem.kind === "edges-touch")) {
          const [i, j] = problem.edges;
          expect(i).toBeLessThan(j);
          expect(segmentsMeet(pts[i], pts[(i + 1) % n], pts[j], pts[(j + 1) % n])).toBe(true);
          expect(problem.kind === "edges-cross").toBe(crossProperly(pts[i], pts[(i + 1) % n], pts[j], pts[(j + 1) % n]));
        }
      }),
      { numRuns: 3000 },
    );
    expect(seen.valid).toBeGreaterThan(300);
    expect(seen.invalid).toBeGreaterThan(300);
  });

  it("the pairwise safety net names the first pair of edges that meet, in index order, as the plain reference does", () => {
    // polygonCheck only falls back on it if the sweep's order breaks, which the property above shows never
    // happens; so it is checked here on its own, on outlines whose corners are all distinct (as polygonCheck
    // guarantees before it), touches, overlaps and folds included.
    const distinctGridArb = fc.uniqueArray(fc.tuple(fc.integer({ min: 0, max: 6 }), fc.integer({ min: 0, max: 6 })), { minLength: 3, maxLength: 12, selector: key }) as fc.Arbitrary<P[]>;
    const seen = { meeting: 0, clear: 0 };
    fc.assert(
      fc.property(fc.oneof(distinctGridArb, snappedStarArb.filter(distinctCorners)), (pts) => {
        const expected = firstMeetingPair(pts);
        const got = pairwiseProblem(pts);
        seen[expected ? "meeting" : "clear"]++;
        if (expected === null) {
          expect(got).toBeUndefined();
          return;
        }
        const n = pts.length;
        const [i, j] = expected;
        const kind = crossProperly(pts[i], pts[(i + 1) % n], pts[j], pts[(j + 1) % n]) ? "edges-cross" : "edges-touch";
        expect(got).toEqual({ kind, edges: expected });
      }),
      { numRuns: 3000 },
    );
    expect(seen.meeting).toBeGreaterThan(300);
    expect(seen.clear).toBeGreaterThan(300);
  });

  it("finds a crossing between a corner's new edge and its neighbour on the near side, by the sweep alone", () => {
    // Edge 2, (4, 3) → (4, 6), crosses edge 4, (1, 3) → (6, 6), at (4, 4.8). The sweep sees it only when the two
    // edges of corner 2 start and edge 4 is the neighbour of edge 2 on the side away from edge 1.
    expect(polygonCheck([[6, 6], [4, 3], [4, 6], [1, 3]])).toEqual({ problem: { kind: "edges-cross", edges: [1, 3] }, method: "sweep" });
  });

  it("names the two edges that leave a corner along the same line, one folding back over the other", () => {
    // Corner 1 (0, 0): edge 4 comes in from (5, 0) and edge 1 leaves along the same line to (10, 0).
    expect(polygonProblem([[0, 0], [10, 0], [10, 5], [5, 0]])).toEqual({ kind: "edges-touch", edges: [0, 3] });
  });

  it("refuses a square traced round twice, saying the outline comes back to a corner", () => {
    const twice: P[] = [[0, 0], [10, 0], [10, 10], [0, 10], [0, 0.0], [10, 0], [10, 10], [0, 10]];
    const r = OutlineSchema.safeParse({ kind: "polygon", pointsMm: twice });
    expect(r.success).toBe(false);
    expect(r.error?.issues[0].message).toBe("corner 5 repeats corner 1: the outline must go round once without coming back to a corner");
    // As a case's deck it is refused at the deck's corners.
    const input = roundStudyInput();
    input.case.deck = { kind: "polygon", pointsMm: twice.map(([x, y]): P => [x * 12 - 60, y * 12 - 60]) };
    const s = StudySchema.safeParse(input);
    expect(s.error?.issues.map((i) => i.path.join("."))).toContain("case.deck.pointsMm");
  });

  it("refuses a corner given twice in a row, naming both", () => {
    const r = OutlineSchema.safeParse({ kind: "polygon", pointsMm: [[0, 0], [10, 0], [10, 0], [10, 10]] });
    expect(r.error?.issues[0].message).toBe("corners 2 and 3 are the same point; remove one of them");
  });

  it("tells a crossing from a touch and from an edge folding back over the one before", () => {
    expect(polygonProblem([[0, 0], [10, 10], [10, 0], [0, 10]])).toEqual({ kind: "edges-cross", edges: [0, 2] });
    // Corner 4 (at 5, 0) lands on the first edge.
    expect(polygonProblem([[0, 0], [10, 0], [10, 10], [5, 0], [0, 10]])).toEqual({ kind: "edges-touch", edges: expect.arrayContaining([0]) });
    // A spike out and back along the same line.
    expect(polygonProblem([[0, 0], [10, 0], [10, 10], [10, 5], [0, 10]])?.kind).toBe("edges-touch");
    expect(describePolygonProblem({ kind: "edges-touch", edges: [1, 3] }, 5)).toBe("polygon edges 2 and 4 touch or overlap; the outline must not meet itself");
  });

  it("accepts concave outlines and outlines of the most corners allowed", () => {
    expect(polygonProblem([[0, 0], [10, 0], [10, 10], [5, 4], [0, 10]])).toBeNull();
    let seed = 11;
    const rnd = () => (seed = (seed * 16807) % 2147483647) / 2147483647;
    const n = MAX_OUTLINE_CORNERS;
    const traced = Array.from({ length: n }, (_, i): P => [23 * (1 + 0.001 * rnd()) * Math.cos((2 * Math.PI * i) / n), 23 * (1 + 0.001 * rnd()) * Math.sin((2 * Math.PI * i) / n)]);
    const star = Array.from({ length: n }, (_, i): P => [(i % 2 ? 1 : 100) * Math.cos((2 * Math.PI * i) / n), (i % 2 ? 1 : 100) * Math.sin((2 * Math.PI * i) / n)]);
    const comb: P[] = [];
    for (let t = 0; t < (n - 4) / 4; t++) comb.push([0, 2 * t], [1000, 2 * t], [1000, 2 * t + 1], [1, 2 * t + 1]);
    comb.push([1, n / 2], [-1, n / 2], [-1, 0]);
    for (const pts of [traced, star, comb]) expect(polygonCheck(pts)).toEqual({ problem: null, method: "sweep" });
    // One corner moved across the star's centre makes it cross itself.
    const broken = star.map((p, i): P => (i === 500 ? [-p[0], -p[1]] : p));
    expect(polygonProblem(broken)?.kind).toBe("edges-cross");
  });

  it("refuses a case whose outlines have more corners together than allowed, in words", () => {
    const input = roundStudyInput();
    const ring = (n: number, r: number): P[] => Array.from({ length: n }, (_, i): P => [r * Math.cos((2 * Math.PI * i) / n), r * Math.sin((2 * Math.PI * i) / n)]);
    input.case.deck = { kind: "polygon", pointsMm: ring(MAX_OUTLINE_CORNERS, 55) };
    input.case.mouth = { outline: { kind: "polygon", pointsMm: ring(MAX_OUTLINE_CORNERS, 23) }, depthMm: 26 };
    input.case.pockets = [1, 2].map((k) => ({ label: `p${k}`, outline: { kind: "polygon" as const, pointsMm: ring(MAX_OUTLINE_CORNERS, 2).map((p): P => [p[0] + 30 * (k === 1 ? 1 : -1), p[1]]) } }));
    const r = StudySchema.safeParse(input);
    expect(r.success).toBe(false);
    expect(r.error?.issues.map((i) => i.message)).toContain(`the deck, mouth and pockets have ${4 * MAX_OUTLINE_CORNERS} corners together; at most ${MAX_CASE_CORNERS}`);
  });
});

describe("each problem of an outline, by name", () => {
  it("corners on one line, or an outline too small to hold area, have no area", () => {
    expect(polygonProblem([[0, 0], [10, 0], [20, 0]])).toEqual({ kind: "no-area" });
    // 0.0001 mm legs: 5·10⁻⁹ mm², under the 10⁻⁶ mm² the core takes as no area, though no edges meet.
    expect(polygonProblem([[0, 0], [0.0001, 0], [0, 0.0001]])).toEqual({ kind: "no-area" });
    expect(polygonProblem([[0, 0], [0.0001, 0], [0, 0.0001]], 0)).toBeNull();
  });

  it("a square traced round twice: corner 5 repeats corner 1", () => {
    expect(polygonProblem([[0, 0], [10, 0], [10, 10], [0, 10], [0, 0], [10, 0], [10, 10], [0, 10]])).toEqual({ kind: "repeated-corner", first: 0, second: 4 });
  });

  it("a crossing, a touch and a collinear overlap are named by their edges, lower first", () => {
    expect(polygonProblem([[0, 0], [10, 10], [10, 0], [0, 10]])).toEqual({ kind: "edges-cross", edges: [0, 2] });
    // An edge running back along part of another: (10, 5) → (10, 2) over (10, 0) → (10, 10).
    const p = polygonProblem([[0, 0], [10, 0], [10, 10], [8, 10], [10, 5], [10, 2], [5, 5]]);
    expect(p?.kind).toBe("edges-touch");
  });

  it("each problem in words, corners and edges counted from 1", () => {
    expect(describePolygonProblem({ kind: "repeated-point", corner: 3 }, 4)).toBe("corners 4 and 1 are the same point; remove one of them");
    expect(describePolygonProblem({ kind: "no-area" }, 3)).toBe("polygon has no area (points are collinear or repeated)");
    expect(describePolygonProblem({ kind: "repeated-corner", first: 0, second: 4 }, 8)).toBe("corner 5 repeats corner 1: the outline must go round once without coming back to a corner");
    expect(describePolygonProblem({ kind: "edges-cross", edges: [0, 2] }, 4)).toBe("polygon edges 1 and 3 cross; the outline must not intersect itself");
  });

  it("the edge pairs that meet, for older callers: none for a simple outline, the pair for a crossing", () => {
    expect(selfIntersections([[0, 0], [10, 0], [10, 10], [0, 10]])).toEqual([]);
    expect(selfIntersections([[0, 0], [10, 10], [10, 0], [0, 10]])).toEqual([[0, 2]]);
    // A corner given twice is no pair of edges meeting.
    expect(selfIntersections([[0, 0], [10, 0], [10, 0], [0, 10]])).toEqual([]);
    // Corners on one line: the closing edge (20, 0) → (0, 0) runs back over the first.
    expect(selfIntersections([[0, 0], [10, 0], [20, 0]])).toEqual([[0, 2]]);
  });
});
