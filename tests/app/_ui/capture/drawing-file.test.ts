import Drawing from "dxf-writer";
import { describe, expect, it } from "vitest";
import { DrawingFileError, pickShapes, readDrawing, type DrawingRead, type DrawingShape } from "@/app/_ui/capture/drawing-file";

// Drawings written by a general-purpose DXF writer (dxf-writer, npm) or as SVG text, holding shapes whose true
// curves are known in closed form. An imported outline must lie within the chord tolerance of the true curve both
// ways: every vertex on the curve, every point of the curve within the tolerance of the outline.

type P = [number, number];
const TOL = 0.02;

function segDist(p: P, a: P, b: P): number {
  const dx = b[0] - a[0], dy = b[1] - a[1];
  const l2 = dx * dx + dy * dy;
  const t = l2 === 0 ? 0 : Math.max(0, Math.min(1, ((p[0] - a[0]) * dx + (p[1] - a[1]) * dy) / l2));
  return Math.hypot(p[0] - a[0] - t * dx, p[1] - a[1] - t * dy);
}
const ringDist = (p: P, ring: P[]) => Math.min(...ring.map((a, i) => segDist(p, a, ring[(i + 1) % ring.length])));
const pathDist = (p: P, path: P[]) => {
  let best = Infinity;
  for (let i = 0; i + 1 < path.length; i++) best = Math.min(best, segDist(p, path[i], path[i + 1]));
  return best;
};

/** The true closed curve sampled densely (≤ 0.01 mm apart, so its own chord error is under 1e-6 mm for these radii). */
function roundedRect(hx: number, hy: number, r: number): P[] {
  const pts: P[] = [];
  const corners: [number, number, number][] = [[hx - r, -(hy - r), -Math.PI / 2], [hx - r, hy - r, 0], [-(hx - r), hy - r, Math.PI / 2], [-(hx - r), -(hy - r), Math.PI]];
  for (const [cx, cy, a0] of corners) for (let i = 0; i <= 2000; i++) pts.push([cx + r * Math.cos(a0 + (i / 2000) * (Math.PI / 2)), cy + r * Math.sin(a0 + (i / 2000) * (Math.PI / 2))]);
  return pts;
}
function arcSlot(rIn: number, rOut: number, a0: number, a1: number): P[] {
  const pts: P[] = [];
  for (let i = 0; i <= 4000; i++) { const a = a0 + ((a1 - a0) * i) / 4000; pts.push([rOut * Math.cos(a), rOut * Math.sin(a)]); }
  for (let i = 0; i <= 4000; i++) { const a = a1 - ((a1 - a0) * i) / 4000; pts.push([rIn * Math.cos(a), rIn * Math.sin(a)]); }
  return pts;
}
function closeDense(path: P[]): P[] {
  const out: P[] = [];
  for (let i = 0; i < path.length; i++) {
    const a = path[i], b = path[(i + 1) % path.length];
    const n = Math.max(1, Math.ceil(Math.hypot(b[0] - a[0], b[1] - a[1]) / 0.01));
    for (let k = 0; k < n; k++) out.push([a[0] + ((b[0] - a[0]) * k) / n, a[1] + ((b[1] - a[1]) * k) / n]);
  }
  return out;
}

function expectWithinTolerance(points: readonly (readonly [number, number])[], truthRing: P[], tol: number) {
  const ring = points.map((p) => [p[0], p[1]] as P);
  const truth = closeDense(truthRing);
  const truthClosed = [...truth, truth[0]];
  let worstVertex = 0;
  for (const v of ring) worstVertex = Math.max(worstVertex, pathDist(v, truthClosed));
  let worstCurve = 0;
  for (let i = 0; i < truth.length; i += 7) worstCurve = Math.max(worstCurve, ringDist(truth[i], ring));
  expect(worstVertex).toBeLessThan(1e-4);
  expect(worstCurve).toBeLessThanOrEqual(tol + 1e-4);
  return { worstVertex, worstCurve };
}

function byRole(read: DrawingRead, test: (s: DrawingShape) => boolean): DrawingShape {
  const found = read.shapes.find(test);
  if (!found) throw new Error(`no such shape among ${read.shapes.map((s) => s.source).join("; ")}`);
  return found;
}
const polygonOf = (s: DrawingShape) => (s.shape.kind === "polygon" ? s.shape.points : []);

function deckDrawing(k = 1): string {
  // k scales every length: 1 for a drawing in mm, 1/25.4 for the same drawing in inches.
  const d = new Drawing();
  d.setUnits(k === 1 ? "Millimeters" : "Inches");
  d.addLayer("DECK", Drawing.ACI.WHITE, "CONTINUOUS").setActiveLayer("DECK");
  // A 100 × 90 deck with 8 mm round corners: each corner a bulge of tan(90°/4) = 0.41421356 (the DXF bulge).
  d.drawRect(-50 * k, -45 * k, 50 * k, 45 * k, 8 * k, Math.tan(Math.PI / 8));
  d.addLayer("MOUTH", Drawing.ACI.RED, "CONTINUOUS").setActiveLayer("MOUTH");
  d.drawCircle(0, 0, 30 * k);
  d.addLayer("PASSAGE", Drawing.ACI.GREEN, "CONTINUOUS").setActiveLayer("PASSAGE");
  // An arc slot from 30° to 60°, radii 34 and 44, drawn as two arcs and two lines.
  const c30 = Math.cos(Math.PI / 6), s30 = Math.sin(Math.PI / 6);
  d.drawArc(0, 0, 44 * k, 30, 60);
  d.drawArc(0, 0, 34 * k, 30, 60);
  d.drawLine(34 * k * c30, 34 * k * s30, 44 * k * c30, 44 * k * s30);
  d.drawLine(34 * k * s30, 34 * k * c30, 44 * k * s30, 44 * k * c30);
  d.addLayer("STUDS", Drawing.ACI.BLUE, "CONTINUOUS").setActiveLayer("STUDS");
  for (const [x, y] of [[38, 34], [-38, 34], [-38, -34], [38, -34]]) d.drawCircle(x * k, y * k, 4.25 * k);
  d.setActiveLayer("0");
  d.drawText(0, -40 * k, 3 * k, 0, "front");
  d.drawPolyline([[60 * k, 0], [70 * k, 0], [70 * k, 10 * k]], false);
  return d.toDxfString();
}

describe("reading a DXF", () => {
  it("finds the deck, mouth, passage and studs of a drawing in mm, curves within the chord tolerance", () => {
    const read = readDrawing("deck.dxf", deckDrawing(), { unit: "mm" });
    expect(read.format).toBe("dxf");
    expect(read.declaredUnit).toBe("mm");
    const deck = byRole(read, (s) => s.layer === "DECK");
    expect(deck.source).toBe("closed polyline on layer DECK (8 corners, 4 arcs)");
    const { worstCurve } = expectWithinTolerance(polygonOf(deck), roundedRect(50, 45, 8), TOL);
    expect(worstCurve).toBeGreaterThan(TOL / 4); // the flattening is not needlessly fine either
    const mouth = byRole(read, (s) => s.layer === "MOUTH");
    expect(mouth.shape).toEqual({ kind: "circle", center: [0, 0], radius: 30 });
    const slot = byRole(read, (s) => /closed loop/.test(s.source));
    expect(slot.source).toBe("closed loop of 2 ARC and 2 LINE on layer PASSAGE");
    expect(slot.layer).toBe("PASSAGE");
    expectWithinTolerance(polygonOf(slot), arcSlot(34, 44, Math.PI / 6, Math.PI / 3), TOL);
    expect(read.shapes.filter((s) => s.layer === "STUDS")).toHaveLength(4);
    expect(read.notUsed).toEqual(expect.arrayContaining(["1 TEXT", "1 open polyline"]));
  });

  it("honours a tighter chord tolerance", () => {
    const read = readDrawing("deck.dxf", deckDrawing(), { unit: "mm", chordToleranceMm: 0.002 });
    expectWithinTolerance(polygonOf(byRole(read, (s) => s.layer === "DECK")), roundedRect(50, 45, 8), 0.002);
  });

  it("reads a drawing in inches into mm", () => {
    const read = readDrawing("deck.dxf", deckDrawing(1 / 25.4), { unit: "in" });
    expect(read.declaredUnit).toBe("in");
    const roles = Object.fromEntries(read.shapes.map((s) => [s.id, s.layer === "DECK" ? "deck" : s.layer === "MOUTH" ? "mouth" : s.layer === "STUDS" ? "stud" : "passage"] as const));
    const { shapes, problems } = pickShapes(read, roles, { unit: "in", origin: "drawing" });
    expect(problems).toEqual([]);
    if (shapes.deck?.kind !== "polygon") throw new Error("deck should be a polygon");
    expectWithinTolerance(shapes.deck.pointsMm, roundedRect(50, 45, 8), TOL);
    expect(shapes.mouth).toEqual({ kind: "circle", diameterMm: expect.closeTo(60, 9), centerMm: [0, 0] });
    expect(shapes.studs?.map((s) => s.positionMm.map((v) => Number(v.toFixed(9))))).toEqual(
      expect.arrayContaining([[38, 34], [-38, 34], [-38, -34], [38, -34]]),
    );
    const passage = shapes.pockets?.[0]?.outline;
    if (passage?.kind !== "polygon") throw new Error("passage should be a polygon");
    expectWithinTolerance(passage.pointsMm, arcSlot(34, 44, Math.PI / 6, Math.PI / 3), TOL);
  });

  it("flattens a spline: a clamped quadratic B-spline on three points is the quadratic Bézier on them", () => {
    // Piegl and Tiller, The NURBS Book, 2nd ed., §2.2: with knots {0,0,0,1,1,1} the B-spline basis is the Bernstein basis.
    const d = new Drawing();
    d.setUnits("Millimeters");
    // dxf-writer's type declarations leave out drawSpline, which its source has (src/Drawing.js).
    (d as unknown as { drawSpline(points: number[][], degree: number, knots: number[]): void }).drawSpline([[-20, 0], [0, 30], [20, 0]], 2, [0, 0, 0, 1, 1, 1]);
    d.drawLine(20, 0, -20, 0);
    const read = readDrawing("lobe.dxf", d.toDxfString(), { unit: "mm" });
    const lobe = byRole(read, () => true);
    expect(lobe.source).toBe("closed loop of 1 open SPLINE and 1 LINE");
    const truth: P[] = [];
    for (let i = 0; i <= 20000; i++) {
      const t = i / 20000;
      truth.push([-20 * (1 - t) ** 2 + 20 * t * t, 2 * t * (1 - t) * 30]);
    }
    expectWithinTolerance(polygonOf(lobe), truth, TOL);
  });

  it("says what it found when there is no closed outline", () => {
    const d = new Drawing();
    d.drawPolyline([[0, 0], [10, 0], [10, 10]], false);
    d.drawText(0, 0, 3, 0, "note");
    d.drawLine(50, 50, 60, 60);
    const err = (() => { try { readDrawing("open.dxf", d.toDxfString(), { unit: "mm" }); } catch (e) { return e as DrawingFileError; } })();
    expect(err).toBeInstanceOf(DrawingFileError);
    expect(err?.problem).toBe("no-closed-outline");
    expect(err?.message).toBe("No closed outline in this DXF drawing. Found: 1 TEXT, 1 open polyline, 1 LINE not joined into a closed loop. Draw the deck as a closed polyline or a closed path.");
  });

  it("refuses empty, malformed, huge and crowded files before reading them", () => {
    const problem = (name: string, text: string) => {
      try { readDrawing(name, text, { unit: "mm" }); } catch (e) { return (e as DrawingFileError).problem; }
      return "read";
    };
    expect(problem("a.dxf", "  \n")).toBe("empty");
    expect(problem("a.txt", "hello")).toBe("unknown-format");
    expect(problem("a.dxf", "0\nSECTION\n2\nENTITIES\n0\nLWPOLYLINE\n90\n")).toMatch(/malformed|no-closed-outline/);
    // 10⁶ lines: refused by size before any parsing.
    const line = "0\nLINE\n8\n0\n10\n0\n20\n0\n11\n1\n21\n1\n";
    const million = `0\nSECTION\n2\nENTITIES\n${line.repeat(1_000_000)}0\nENDSEC\n0\nEOF\n`;
    expect(problem("big.dxf", million)).toBe("too-large");
    // 10 001 lines fit the size limit but not the entity limit.
    const crowded = `0\nSECTION\n2\nENTITIES\n${line.repeat(10_001)}0\nENDSEC\n0\nEOF\n`;
    expect(problem("crowded.dxf", crowded)).toBe("too-many-entities");
    expect(problem("ok.dxf", `0\nSECTION\n2\nENTITIES\n${line.repeat(10_000)}0\nENDSEC\n0\nEOF\n`)).toBe("no-closed-outline");
    // Building a 30 MB text and reading 10 000 entities twice takes about a second here, and several on a loaded machine.
  }, 60_000);
});

describe("reading an SVG", () => {
  // SVG's y runs down; the import turns it up. A group moves everything by (10, 5) user units.
  const svg = `<?xml version="1.0"?>
<svg xmlns="http://www.w3.org/2000/svg" width="120mm" height="100mm" viewBox="0 0 120 100">
  <g transform="translate(10 5)">
    <rect id="deck" x="-50" y="-45" width="100" height="90" rx="8" ry="8" fill="none" stroke="black"/>
    <circle id="mouth" cx="0" cy="0" r="30"/>
    <path id="passage" d="M ${44 * Math.cos(Math.PI / 6)} ${-44 * Math.sin(Math.PI / 6)} A 44 44 0 0 0 ${44 * Math.cos(Math.PI / 3)} ${-44 * Math.sin(Math.PI / 3)} L ${34 * Math.cos(Math.PI / 3)} ${-34 * Math.sin(Math.PI / 3)} A 34 34 0 0 1 ${34 * Math.cos(Math.PI / 6)} ${-34 * Math.sin(Math.PI / 6)} Z"/>
    <circle cx="38" cy="-34" r="4.25"/><circle cx="-38" cy="-34" r="4.25"/><circle cx="-38" cy="34" r="4.25"/><circle cx="38" cy="34" r="4.25"/>
    <path d="M 60 0 L 70 0"/>
    <text x="0" y="40">front</text>
  </g>
</svg>`;

  it("finds the shapes with curves within the chord tolerance, y up, origin at the mouth's centre", () => {
    const read = readDrawing("deck.svg", svg, { unit: "mm" });
    expect(read.declaredUnit).toBe("mm");
    expect(read.notUsed).toEqual(["1 open path", "1 text"]);
    const role = (s: DrawingShape) => (s.layer === "deck" ? "deck" : s.layer === "mouth" ? "mouth" : s.layer === "passage" ? "passage" : "stud");
    const { shapes, problems } = pickShapes(read, Object.fromEntries(read.shapes.map((s) => [s.id, role(s)])), { unit: "mm", origin: "mouth" });
    expect(problems).toEqual([]);
    expect(shapes.mouth).toEqual({ kind: "circle", diameterMm: 60, centerMm: [0, 0] });
    if (shapes.deck?.kind !== "polygon") throw new Error("deck should be a polygon");
    expectWithinTolerance(shapes.deck.pointsMm, roundedRect(50, 45, 8), TOL);
    const passage = shapes.pockets?.[0]?.outline;
    if (passage?.kind !== "polygon") throw new Error("passage should be a polygon");
    expectWithinTolerance(passage.pointsMm, arcSlot(34, 44, Math.PI / 6, Math.PI / 3), TOL);
    expect(shapes.studs?.map((s) => s.positionMm.map((v) => Number(v.toFixed(9))))).toEqual([[38, 34], [-38, 34], [-38, -34], [38, -34]]);
  });

  it("refuses malformed XML and shapes that cross themselves", () => {
    expect(() => readDrawing("bad.svg", `<svg xmlns="http://www.w3.org/2000/svg"><path d="M0 0"></svg`, { unit: "mm" })).toThrow(/cannot be read/);
    const bow = `<svg xmlns="http://www.w3.org/2000/svg"><polygon points="0,0 10,10 10,0 0,10"/></svg>`;
    const read = readDrawing("bow.svg", bow, { unit: "mm" });
    const { problems, shapes } = pickShapes(read, { [read.shapes[0].id]: "deck" }, { unit: "mm", origin: "drawing" });
    expect(shapes.deck).toBeUndefined();
    expect(problems[0]).toMatch(/^The deck \(closed polygon, 4 points\): polygon edges \d and \d cross/);
    expect(() => readDrawing("none.svg", `<svg xmlns="http://www.w3.org/2000/svg"><text>hi</text></svg>`, { unit: "mm" })).toThrow("No closed outline in this SVG drawing. Found: 1 text.");
  });
});

describe("the demo case's drawing", () => {
  it("imports to the same deck, mouth and studs as the demo photo shows", async () => {
    const { DEMO_CASE, demoCaseDxf } = await import("@/scripts/render-demo-case-photo");
    const read = readDrawing("eight-sided-case-deck.dxf", demoCaseDxf(), { unit: "mm" });
    const roles = Object.fromEntries(read.shapes.map((s) => [s.id, s.layer === "DECK" ? "deck" : s.layer === "MOUTH" ? "mouth" : s.layer === "STUDS" ? "stud" : "passage"] as const));
    const { shapes, problems } = pickShapes(read, roles, { unit: "mm", origin: "mouth" });
    expect(problems).toEqual([]);
    expect(shapes.deck).toEqual({ kind: "polygon", pointsMm: DEMO_CASE.deck });
    expect(shapes.mouth).toEqual({ kind: "circle", diameterMm: 62, centerMm: [0, 0] });
    expect(shapes.studs?.map((s) => s.positionMm)).toEqual(DEMO_CASE.studs.map((s) => s.at));
    expect(shapes.pockets).toHaveLength(2);
    // Each passage is the arc slot between radii 31 and 38 over ±22° about the x axis (0° and 180°).
    for (const [i, centre] of [0, Math.PI].entries()) {
      const outline = shapes.pockets?.[i]?.outline;
      if (outline?.kind !== "polygon") throw new Error("passage should be a polygon");
      const span = (22 * Math.PI) / 180;
      expectWithinTolerance(outline.pointsMm, arcSlot(31, 38, centre - span, centre + span), TOL);
    }
  });
});
