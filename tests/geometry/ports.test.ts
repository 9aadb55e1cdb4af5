import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { type StudyInput, evaluateStudy, lineSpans, portSteps } from "../../geometry/index";
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
