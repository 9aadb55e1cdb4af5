import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { type StudyInput, evaluateStudy, lineSpans, matchedPassageReachMm, outlineCentroid, passageUnderPort, portSteps } from "../../geometry/index";
import { parse, roundStudyInput } from "./fixtures";
import { propertyRuns } from "./runs";

// Hand-computed plane geometry (no published source). The passage is an arc slot about the bore axis: radii
// 30 and 36 mm over ±15° about +x, its arcs flattened with a vertex every 7.5° (one on the x axis). The port
// window is the rectangle x ∈ [29, 35], y ∈ [−10, 10]: centroid (32, 0), so the radial section line is the x
// axis and the square one is x = 32.
const deg = Math.PI / 180;
const arc = (r: number, from: number, to: number) =>
  Array.from({ length: 5 }, (_, i) => {
    const a = (from + ((to - from) * i) / 4) * deg;
    return [r * Math.cos(a), r * Math.sin(a)] as [number, number];
  });
const slot = { kind: "polygon" as const, pointsMm: [...arc(30, -15, 15), ...arc(36, 15, -15)] };
const port = { kind: "polygon" as const, pointsMm: [[29, -10], [35, -10], [35, 10], [29, 10]] as [number, number][] };
const rectanglePort = port; // the same window, for the building blocks below (where `port` is a circle)

describe("steps between a port window and the passage under it", () => {
  it("a rectangle port over an arc-slot passage: steps at the inner, outer and side edges", () => {
    const o = portSteps(port, slot, 1e-9);
    expect(o.centroidMm[0]).toBeCloseTo(32, 12);
    expect(o.centroidMm[1]).toBeCloseTo(0, 12);
    expect(o.directionDeg).toBeCloseTo(0, 9);
    // Radial line (the x axis): port 29 → 35, passage 30 → 36 (the vertices at 0°).
    expect(o.steps.innerMm).toBeCloseTo(30 - 29, 9); // +1: a 1 mm ledge where the passage starts outside the port
    expect(o.steps.outerMm).toBeCloseTo(35 - 36, 9); // −1: the passage runs 1 mm past the port
    // Square line x = 32: port −10 → 10; passage between its radial sides y = ±32·tan 15° = ±8.5744 mm.
    const side = 32 * Math.tan(15 * deg);
    expect(o.steps.ccwMm).toBeCloseTo(10 - side, 9); // +1.4256 mm on each side
    expect(o.steps.cwMm).toBeCloseTo(10 - side, 9);
  });

  it("a section line's stretches inside a polygon pair its crossings, a vertex on the line counted once", () => {
    const spans = lineSpans([32, 0], [1, 0], slot);
    expect(spans).toHaveLength(1);
    expect(spans[0].from).toBeCloseTo(-2, 12);
    expect(spans[0].to).toBeCloseTo(4, 12);
  });
});

describe("the matched passage in the study result", { timeout: 60_000 }, () => {
  const study = (ports: { label: string; outline: typeof port }[]): StudyInput => {
    const s = roundStudyInput();
    s.case.pockets = [{ label: "right transfer passage", outline: slot }];
    s.kits[0].baseGasket = { ports };
    s.cut = { diameterMm: 55, depthMm: 25.2 };
    return s;
  };

  it("opening the passage to the port leaves the wall to the port's inner edge, and warns below the minimum", () => {
    const k = evaluateStudy(parse(study([{ label: "right transfer", outline: port }]))).kits[0];
    // As it is: the slot's inner chord nearest the cut is 30·cos 3.75° = 29.9358 mm out; R = 27.5 → 2.4358 mm.
    const wall = k.walls.find((w) => w.kind === "pocket");
    expect(wall?.minWallMm).toBeCloseTo(30 * Math.cos(3.75 * deg) - 27.5, 9);
    expect(wall?.ok).toBe(true);
    // Matched to the port: the union reaches in to x = 29, so 29 − 27.5 = 1.5 mm < 2 mm (the default minimum wall).
    expect(k.ports).toHaveLength(1);
    const p = k.ports[0];
    expect(p.portLabel).toBe("right transfer");
    expect(p.pocketLabel).toBe("right transfer passage");
    expect(p.matchedWallMm).toBeCloseTo(1.5, 9);
    expect(p.requiredMm).toBe(2);
    expect(p.ok).toBe(false);
    expect(p.steps.innerMm).toBeCloseTo(1, 9);
    expect(k.warnings.map((w) => w.code)).toContain("matched-passage-wall-below-minimum");
    expect(k.warnings.find((w) => w.code === "matched-passage-wall-below-minimum")?.message).toContain("If right transfer passage were opened to match port right transfer");
    // A what-if: the verdict is the cut's own.
    expect(k.verdict).toBe("fits-after-cut");
  });

  it("a port over no passage has no steps, and its matched wall is to the port alone", () => {
    const lone = { kind: "polygon" as const, pointsMm: [[-35, -10], [-29.5, -10], [-29.5, 10], [-35, 10]] as [number, number][] };
    const k = evaluateStudy(parse(study([{ label: "left transfer", outline: lone }]))).kits[0];
    const p = k.ports[0];
    expect(p.pocketLabel).toBeNull();
    expect(p.steps).toEqual({ innerMm: null, outerMm: null, ccwMm: null, cwMm: null });
    expect(p.matchedWallMm).toBeCloseTo(29.5 - 27.5, 9); // 2.0 mm: exactly the minimum, so ok
    expect(p.ok).toBe(true);
  });

  it("opening a passage to the port never leaves more wall than the passage alone does", () => {
    const f = (min: number, max: number) => fc.double({ min, max, noNaN: true });
    fc.assert(
      fc.property(f(27, 33), f(33.5, 38), f(2, 12), f(50, 58), (inner, outer, half, cutD) => {
        const window = { kind: "polygon" as const, pointsMm: [[inner, -half], [outer, -half], [outer, half], [inner, half]] as [number, number][] };
        const s = study([{ label: "right transfer", outline: window }]);
        s.cut = { diameterMm: cutD, depthMm: 25.2 };
        const k = evaluateStudy(parse(s)).kits[0];
        const passageWall = k.walls.find((w) => w.kind === "pocket")!.minWallMm;
        expect(k.ports[0].matchedWallMm!).toBeLessThanOrEqual(passageWall + 1e-9);
        // The port's inner edge lies at x = inner on the x axis: the matched wall is at most inner − R.
        expect(k.ports[0].matchedWallMm!).toBeLessThanOrEqual(inner - cutD / 2 + 1e-9);
      }),
      { numRuns: propertyRuns(60) },
    );
  });

  it("without a cut there is no matched wall; without a gasket there are no ports", () => {
    const s = study([{ label: "right transfer", outline: port }]);
    delete s.cut;
    s.kits[0].skirtDiameterReadingsMm = [44];
    const k = evaluateStudy(parse(s)).kits[0];
    expect(k.cut).toBeNull();
    expect(k.ports[0].matchedWallMm).toBeNull();
    expect(k.ports[0].ok).toBeNull();
    expect(evaluateStudy(parse(roundStudyInput())).kits[0].ports).toEqual([]);
  });
});

// Hand-computed plane geometry (no published source) for the building blocks, each on figures small enough to
// check with pencil and paper.
describe("the port overlay's building blocks", () => {
  const circle = (centerMm: [number, number], diameterMm: number) => ({ kind: "circle" as const, centerMm, diameterMm });
  const poly = (pointsMm: [number, number][]) => ({ kind: "polygon" as const, pointsMm });

  it("the area centroid of a triangle is the mean of its corners, whichever way it is wound; a circle's is its centre", () => {
    // Triangle (0,0) (6,0) (0,3): centroid ((0+6+0)/3, (0+0+3)/3) = (2, 1).
    for (const t of [poly([[0, 0], [6, 0], [0, 3]]), poly([[0, 0], [0, 3], [6, 0]])]) {
      const g = outlineCentroid(t);
      expect(g[0]).toBeCloseTo(2, 12);
      expect(g[1]).toBeCloseTo(1, 12);
    }
    // L-shape: square 0..4 × 0..4 less 2..4 × 2..4 (area 12) = rectangle 0..4 × 0..2 (area 8, centre (2,1)) plus
    // 0..2 × 2..4 (area 4, centre (1,3)): centroid ((8·2 + 4·1)/12, (8·1 + 4·3)/12) = (5/3, 5/3).
    const l = outlineCentroid(poly([[0, 0], [4, 0], [4, 2], [2, 2], [2, 4], [0, 4]]));
    expect(l[0]).toBeCloseTo(5 / 3, 12);
    expect(l[1]).toBeCloseTo(5 / 3, 12);
    expect(outlineCentroid(circle([5, -3], 8))).toEqual([5, -3]);
  });

  it("a line's chord through a circle, a line that misses it and a tangent line", () => {
    // Circle centre (3, 4), radius 5, the x axis from the origin: (x − 3)² + 16 = 25 → x = 0 and x = 6.
    expect(lineSpans([0, 0], [1, 0], circle([3, 4], 10))).toEqual([{ from: 0, to: 6 }]);
    // Along (0.6, 0.8) from the origin the line runs through the centre (at t = 5): the diameter, t = 0 … 10.
    const [s] = lineSpans([0, 0], [0.6, 0.8], circle([3, 4], 10));
    expect(s.from).toBeCloseTo(0, 12);
    expect(s.to).toBeCloseTo(10, 12);
    // The line y = 10 lies 6 mm from the centre (> 5): no chord; y = 9 touches it (5 mm): a tangent has no inside.
    expect(lineSpans([0, 10], [1, 0], circle([3, 4], 10))).toEqual([]);
    expect(lineSpans([0, 9], [1, 0], circle([3, 4], 10))).toEqual([]);
  });

  it("a line across a U-shaped polygon has two stretches, sorted along the line whichever way it runs", () => {
    // U: 0..10 × 0..10 with the notch 3..7 × 3..10 open at the top.
    const u = poly([[0, 0], [10, 0], [10, 10], [7, 10], [7, 3], [3, 3], [3, 10], [0, 10]]);
    // y = 5 from (−2, 5) along +x crosses x = 0, 3, 7, 10 → t = 2, 5, 9, 12.
    expect(lineSpans([-2, 5], [1, 0], u)).toEqual([{ from: 2, to: 5 }, { from: 9, to: 12 }]);
    // x = 5 from (5, 1) along −y crosses y = 3 (t = −2) and y = 0 (t = 1): inside from −2 to 1.
    expect(lineSpans([5, 1], [0, -1], u)).toEqual([{ from: -2, to: 1 }]);
  });

  // Port: circle centre g = (30, 40), radius 5, so |g| = 50, the radial line u = (0.6, 0.8) (53.1301° = atan(4/3))
  // and the square line v = (−0.8, 0.6); the port's stretch on both is t = −5 … 5.
  const port = circle([30, 40], 10);
  const at = (a: number, b: number): [number, number] => [30 + 0.6 * a - 0.8 * b, 40 + 0.8 * a + 0.6 * b]; // g + a·u + b·v

  it("steps to a round passage off the port's centre along both section lines", () => {
    // Passage radius 4 centred at g + 1·u + 0.5·v. Radial line: foot at t = 1, off the line 0.5 → half chord
    // √(16 − 0.25) = √15.75; stretch 1 ∓ √15.75. Square line: foot at t = 0.5, off 1 → half chord √15.
    const o = portSteps(port, circle(at(1, 0.5), 8), 1e-9);
    expect(o.centroidMm).toEqual([30, 40]);
    expect(o.directionDeg).toBeCloseTo((Math.atan(4 / 3) * 180) / Math.PI, 9);
    expect(o.steps.innerMm).toBeCloseTo(1 - Math.sqrt(15.75) + 5, 9); // q₁ − p₁ = 2.0314
    expect(o.steps.outerMm).toBeCloseTo(5 - (1 + Math.sqrt(15.75)), 9); // p₂ − q₂ = 0.0314
    expect(o.steps.cwMm).toBeCloseTo(0.5 - Math.sqrt(15) + 5, 9); // near (clockwise) side: 1.6270
    expect(o.steps.ccwMm).toBeCloseTo(5 - (0.5 + Math.sqrt(15)), 9); // far (counter-clockwise) side: 0.6270
  });

  it("a passage that overlaps the port by less than the tolerance does not count", () => {
    // Passage radius 5 centred 9.7 out along u: its stretch 4.7 … 14.7 overlaps the port's (to 5) by 0.3 mm.
    expect(portSteps(port, circle(at(9.7, 0), 10), 0.5).steps).toEqual({ innerMm: null, outerMm: null, ccwMm: null, cwMm: null });
    expect(portSteps(port, circle(at(-9.7, 0), 10), 0.5).steps.innerMm).toBeNull();
    // Overlapping by 0.7 mm (> 0.5) it does: inner 4.3 − (−5) = 9.3, outer 5 − 14.3 = −9.3.
    const s = portSteps(port, circle(at(9.3, 0), 10), 0.5).steps;
    expect(s.innerMm).toBeCloseTo(9.3, 9);
    expect(s.outerMm).toBeCloseTo(-9.3, 9);
    expect(s.ccwMm).toBeNull(); // the square line through g lies 9.3 mm from its centre, beyond its radius
    const n = portSteps(port, circle(at(-9.3, 0), 10), 0.5).steps;
    expect(n.innerMm).toBeCloseTo(-14.3 + 5, 9);
    expect(n.outerMm).toBeCloseTo(5 + 4.3, 9);
  });

  it("a port centred on the bore axis takes +x as its radial line", () => {
    const o = portSteps(circle([0, 0], 10), circle([1, 0], 10), 1e-9);
    expect(o.directionDeg).toBe(0);
    expect(o.steps.innerMm).toBeCloseTo(1, 9); // passage −4 … 6 on the x axis, port −5 … 5
    expect(o.steps.outerMm).toBeCloseTo(-1, 9);
  });

  it("the passage under a port: the one holding its centroid, else the nearest that overlaps it, else none", () => {
    const pocket = (label: string, c: [number, number], d: number) => ({ label, outline: circle(c, d), startDepthMm: 0 });
    const w = { label: "port", outline: port };
    const far = pocket("far", [-30, -40], 10);
    const holding = pocket("holding", at(1, 0), 6);
    // Radius 2, 6 mm out along u: stretch 4 … 8 overlaps the port's; 4 mm from g to its edge.
    const outward = pocket("outward", at(6, 0), 4);
    // Radius 2, 6.5 mm in along u: stretch −8.5 … −4.5 overlaps; 4.5 mm from g.
    const inward = pocket("inward", at(-6.5, 0), 4);
    // Radius 2, 6 mm along v: only the square line meets it.
    const beside = pocket("beside", at(0, 6), 4);
    expect(passageUnderPort(w, [far, outward, holding], 1e-9)?.label).toBe("holding");
    expect(passageUnderPort(w, [far, inward, outward], 1e-9)?.label).toBe("outward");
    expect(passageUnderPort(w, [outward, inward], 1e-9)?.label).toBe("outward");
    expect(passageUnderPort(w, [far, beside], 1e-9)?.label).toBe("beside");
    expect(passageUnderPort(w, [far], 1e-9)).toBeNull();
    // A pocket whose edge runs 0.5 mm short of g holds it within a 1 mm tolerance, not within 0.1 mm.
    const short = pocket("short", at(3.5, 0), 6);
    expect(passageUnderPort(w, [outward, short], 1)?.label).toBe("short");
    expect(passageUnderPort(w, [inward, short], 0.1)?.label).toBe("short"); // nearer (0.5 mm) of two overlapping
  });

  it("a slanted line across a square: the stretch between where it enters and leaves", () => {
    // From (1, 1) along (0.6, 0.8): back to y = 0 at t = −1.25 (x = 0.25), on to y = 4 at t = 3.75 (x = 3.25).
    const [s] = lineSpans([1, 1], [0.6, 0.8], poly([[0, 0], [4, 0], [4, 4], [0, 4]]));
    expect(s.from).toBeCloseTo(-1.25, 12);
    expect(s.to).toBeCloseTo(3.75, 12);
  });

  // A port centred on the bore axis: circle radius 5 about the origin, radial line +x, square line +y; stretch −5 … 5.
  const centred = circle([0, 0], 10);

  it("a passage that overlaps the port by exactly the tolerance does not count", () => {
    // Radius 5 centred at x = ±9.5: the stretch −14.5 … −4.5 (or 4.5 … 14.5) meets the port's −5 … 5 by 0.5 mm.
    for (const x of [-9.5, 9.5]) expect(portSteps(centred, circle([x, 0], 10), 0.5).steps.innerMm).toBeNull();
  });

  it("a passage crossed twice by a section line counts from its first stretch's start to its last one's end", () => {
    // Port x ∈ [29, 35], y ∈ [−10, 10], centroid (32, 0). Passage: a C of x ∈ [26, 30] (its back, y ∈ [−8, 9])
    // with arms x ∈ [30, 34] at y ∈ [−8, −2] and y ∈ [3, 9]. On x = 32 it has two stretches, −8 … −2 and 3 … 9,
    // counted as −8 … 9 against the port's −10 … 10. On the x axis only its back, t = −6 … −2, against −3 … 3.
    const c = poly([[26, -8], [34, -8], [34, -2], [30, -2], [30, 3], [34, 3], [34, 9], [26, 9]]);
    const s = portSteps(rectanglePort, c, 1e-9).steps;
    expect(s.cwMm).toBeCloseTo(-8 - -10, 9); // 2
    expect(s.ccwMm).toBeCloseTo(10 - 9, 9); // 1
    expect(s.innerMm).toBeCloseTo(-6 - -3, 9); // −3
    expect(s.outerMm).toBeCloseTo(3 - -2, 9); // 5
  });

  // A port whose square line crosses it twice. Back x ∈ [31, 32], y ∈ [−5, 5] (area 10), prongs toward +x at
  // y ∈ [−5, −4] to x = 37 (area 5) and y ∈ [1, 4] to x = 35 (area 9): y moments 0 − 22.5 + 22.5 = 0, so the
  // centroid is on the x axis, at x = (10·31.5 + 5·34.5 + 9·33.5)/24 = 32.875 — between the prongs, outside the
  // port. The square line x = 32.875 crosses the prongs at t = y: −5 … −4 and 1 … 4. With a middle prong
  // y ∈ [−0.5, 0.5] to x = 35 (area 3, no y moment) the centroid is at x = (789 + 3·33.5)/27 = 32.944, inside it.
  // The passage under both: the rectangle x ∈ [30, 40], y ∈ [−6, 6].
  const box = poly([[30, -6], [40, -6], [40, 6], [30, 6]]);

  it("a centroid outside the port: each section line takes the port's longest stretch", () => {
    const f = poly([[31, -5], [37, -5], [37, -4], [32, -4], [32, 1], [35, 1], [35, 4], [32, 4], [32, 5], [31, 5]]);
    const o = portSteps(f, box, 1e-9);
    expect(o.centroidMm[0]).toBeCloseTo(32.875, 12);
    expect(o.centroidMm[1]).toBeCloseTo(0, 12);
    // Square line: the prong 1 … 4 (3 long, not the first, −5 … −4): passage −6 … 6.
    expect(o.steps.cwMm).toBeCloseTo(-6 - 1, 9); // −7
    expect(o.steps.ccwMm).toBeCloseTo(4 - 6, 9); // −2
    // Radial line (the x axis): only the back, x = 31 … 32; the passage x = 30 … 40.
    expect(o.steps.innerMm).toBeCloseTo(30 - 31, 9); // −1
    expect(o.steps.outerMm).toBeCloseTo(32 - 40, 9); // −8
  });

  it("the same port mirrored across the x axis: the longest stretch is now the first along the square line", () => {
    // Mirrored: the prongs at y ∈ [−4, −1] (3 long) and y ∈ [4, 5]; the centroid stays at (32.875, 0).
    const f = poly([[31, 5], [37, 5], [37, 4], [32, 4], [32, -1], [35, -1], [35, -4], [32, -4], [32, -5], [31, -5]].reverse() as [number, number][]);
    const o = portSteps(f, box, 1e-9);
    expect(o.centroidMm[0]).toBeCloseTo(32.875, 12);
    expect(o.steps.cwMm).toBeCloseTo(-6 - -4, 9); // −2
    expect(o.steps.ccwMm).toBeCloseTo(-1 - 6, 9); // −7
  });

  it("a centroid inside the port: the section line takes the stretch holding it, not a longer one", () => {
    const e = poly([[31, -5], [37, -5], [37, -4], [32, -4], [32, -0.5], [35, -0.5], [35, 0.5], [32, 0.5], [32, 1], [35, 1], [35, 4], [32, 4], [32, 5], [31, 5]]);
    const o = portSteps(e, box, 1e-9);
    expect(o.centroidMm[0]).toBeCloseTo(889.5 / 27, 12);
    // Square line: the middle prong −0.5 … 0.5 (1 long) holds the centroid; the top prong 1 … 4 is longer.
    expect(o.steps.cwMm).toBeCloseTo(-6 - -0.5, 9); // −5.5
    expect(o.steps.ccwMm).toBeCloseTo(0.5 - 6, 9); // −5.5
    // Radial line: back and middle prong, x = 31 … 35; the passage x = 30 … 40.
    expect(o.steps.innerMm).toBeCloseTo(30 - 31, 9);
    expect(o.steps.outerMm).toBeCloseTo(35 - 40, 9);
  });

  // The centroid exactly on an edge of the port (plane geometry, common practice, no published source): the
  // middle prong is y ∈ [0, 0.5] to x = 36.5 (area 2.25, y moment 2.25·0.25 = 0.5625) and the bottom prong runs
  // on to x = 37.125 (area 5.125, y moment −23.0625), so 0.5625 − 23.0625 + 22.5 = 0: the centroid is on the x
  // axis, the middle prong's bottom edge, at x = 111449/3376 = 33.0121 (all corners in eighths, so the
  // shoelace sums are exact and the centroid's y is exactly 0). The square line meets the prongs at t = y:
  // −5 … −4, 0 … 0.5 and 1 … 4; the centroid is the middle one's end, t = 0 exactly.
  const edgePort = [[31, -5], [37.125, -5], [37.125, -4], [32, -4], [32, 0], [36.5, 0], [36.5, 0.5], [32, 0.5], [32, 1], [35, 1], [35, 4], [32, 4], [32, 5], [31, 5]] as [number, number][];

  it("a centroid on the port's edge where a stretch starts: the section line takes that stretch, not a longer one", () => {
    const o = portSteps(poly(edgePort), box, 1e-9);
    expect(o.centroidMm[0]).toBeCloseTo(111449 / 3376, 12);
    expect(o.centroidMm[1]).toBe(0);
    // Square line: the stretch 0 … 0.5 starts at the centroid; the top prong 1 … 4 is longer. Passage −6 … 6.
    expect(o.steps.cwMm).toBeCloseTo(-6 - 0, 9); // −6
    expect(o.steps.ccwMm).toBeCloseTo(0.5 - 6, 9); // −5.5
    // Radial line (the x axis, along the middle prong's bottom edge, read as just above it): back and middle
    // prong, x = 31 … 36.5; the passage x = 30 … 40.
    expect(o.steps.innerMm).toBeCloseTo(30 - 31, 9); // −1
    expect(o.steps.outerMm).toBeCloseTo(36.5 - 40, 9); // −3.5
  });

  it("a centroid on the port's edge where a stretch ends: the section line takes that stretch, not a longer one", () => {
    // The same port mirrored across the x axis: the square line meets it at −4 … −1, −0.5 … 0 and 4 … 5.
    const mirrored = edgePort.map(([x, y]) => [x, -y] as [number, number]).reverse();
    const o = portSteps(poly(mirrored), box, 1e-9);
    expect(o.centroidMm[0]).toBeCloseTo(111449 / 3376, 12);
    expect(o.centroidMm[1]).toBe(0);
    // Square line: the stretch −0.5 … 0 ends at the centroid; the prong −4 … −1 is longer.
    expect(o.steps.cwMm).toBeCloseTo(-6 - -0.5, 9); // −5.5
    expect(o.steps.ccwMm).toBeCloseTo(0 - 6, 9); // −6
    // Radial line: now along the middle prong's top edge, read as just above it, so only the back, x = 31 … 32.
    expect(o.steps.innerMm).toBeCloseTo(30 - 31, 9); // −1
    expect(o.steps.outerMm).toBeCloseTo(32 - 40, 9); // −8
  });

  it("of two passages holding the port's centroid the first listed is taken, a tie on distance keeps the first too", () => {
    const w = { label: "port", outline: centred };
    const pocket = (label: string, c: [number, number], d: number) => ({ label, outline: circle(c, d), startDepthMm: 0 });
    // "edge" (radius 3 about (3.5, 0)) runs 0.5 mm short of the centroid: it holds it within a 0.5 mm tolerance,
    // just; "deep" (radius 4 about the origin) holds it by 4 mm.
    const edge = pocket("edge", [3.5, 0], 6);
    const deep = pocket("deep", [0, 0], 8);
    expect(passageUnderPort(w, [edge, deep], 0.5)?.label).toBe("edge");
    expect(passageUnderPort(w, [edge, deep], 0.4)?.label).toBe("deep");
    // Radius 2 about (±6, 0): both 4 mm from the centroid, both overlap the port on the x axis.
    expect(passageUnderPort(w, [pocket("right", [6, 0], 4), pocket("left", [-6, 0], 4)], 1e-9)?.label).toBe("right");
    expect(passageUnderPort(w, [pocket("left", [-6, 0], 4), pocket("right", [6, 0], 4)], 1e-9)?.label).toBe("left");
  });

  it("the reach to a passage opened to the port is the nearer of the two", () => {
    // From the origin: port edge 50 − 5 = 45 mm; passage centred (0, 20) radius 5: 15 mm; centred (0, 60): 55 mm.
    expect(matchedPassageReachMm([0, 0], null, port, 1e-9)).toBeCloseTo(45, 12);
    expect(matchedPassageReachMm([0, 0], circle([0, 20], 10), port, 1e-9)).toBeCloseTo(15, 12);
    expect(matchedPassageReachMm([0, 0], circle([0, 60], 10), port, 1e-9)).toBeCloseTo(45, 12);
  });
});
