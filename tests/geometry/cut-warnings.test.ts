// The warnings a planned cut raises, from hand-built cuts: each clearance and wall against its minimum, a tilt
// that eats a clearance that was sound on paper, a cut into the crank chamber, a cut not needed. Which of these a
// builder must be told: common practice, no published source.
import { describe, expect, it } from "vitest";
import type { PlaneFit } from "../../geometry/alignment";
import { cutWarnings } from "../../geometry/cut-warnings";
import type { PlannedCut } from "../../geometry/kit-cut";
import { resolveLimits } from "../../geometry/resolve-limits";
import type { Wall } from "../../geometry/wall";
import { reportedWall } from "./fixtures";

const TOL = 1e-9;
const L = resolveLimits({ minRadialClearanceMm: 0.5, minDepthClearanceMm: 0.5 }).values;
const wall = (kind: Wall["kind"], label: string, minWallMm: number, ok: boolean): Wall => reportedWall(kind, minWallMm, ok, label);
const planned = (over: { vsCutMm?: number; effectiveMm?: number; depthClearanceMm?: number | null; walls?: Wall[]; throughMouth?: boolean }) =>
  ({
    vsCutMm: over.vsCutMm ?? 0.6,
    effectiveMm: over.effectiveMm ?? 0.6,
    depthClearanceMm: over.depthClearanceMm === undefined ? 0.6 : over.depthClearanceMm,
    walls: over.walls ?? [],
    depth: { throughMouth: over.throughMouth ?? false, depthClearanceMm: null, shallowestDepthMm: 0 },
  }) as unknown as PlannedCut;
const level: { entersCase: boolean; clearsMouth: boolean; plane: PlaneFit | null } = { entersCase: true, clearsMouth: false, plane: null };
const tilted: PlaneFit = { a: 0.002, b: 0, cMm: 0, residualsMm: [], rockMm: 0 };
const codes = (p: PlannedCut, at = level) => cutWarnings(p, at, L, TOL).map((w) => w.code);

describe("the warnings of a planned cut", () => {
  it("a sound cut raises none, and figures exactly at their minimums are sound", () => {
    expect(codes(planned({}))).toEqual([]);
    expect(cutWarnings(planned({ effectiveMm: 0.5, depthClearanceMm: 0.5 }), level, L, 0)).toEqual([]);
  });

  it("a radial clearance below the minimum is warned with its figures", () => {
    const w = cutWarnings(planned({ vsCutMm: 0.3, effectiveMm: 0.3 }), level, L, TOL);
    expect(w).toEqual([{ code: "radial-clearance-below-minimum", message: "Radial clearance of 0.30 mm is below the minimum of 0.50 mm." }]);
  });

  it("a skirt that does not enter the case is not judged on radial clearance", () => {
    expect(codes(planned({ vsCutMm: 0.3, effectiveMm: 0.3 }), { ...level, entersCase: false })).toEqual([]);
  });

  it("a tilted holder that takes a sound 0.6 mm on paper to 0.3 mm says the tilt ate it; unsound on paper too, it is just below the minimum", () => {
    const at = { ...level, plane: tilted };
    const w = cutWarnings(planned({ vsCutMm: 0.6, effectiveMm: 0.3 }), at, L, TOL);
    expect(w.map((x) => x.code)).toEqual(["tilt-eats-clearance"]);
    expect(w[0].message).toContain("the clearance of 0.60 mm on paper becomes 0.30 mm");
    // Exactly the minimum on paper still counts as sound on paper.
    expect(cutWarnings(planned({ vsCutMm: 0.5, effectiveMm: 0.3 }), at, L, 0).map((x) => x.code)).toEqual(["tilt-eats-clearance"]);
    expect(codes(planned({ vsCutMm: 0.4, effectiveMm: 0.3 }), at)).toEqual(["radial-clearance-below-minimum"]);
  });

  it("a depth clearance below the minimum is warned; a cut with no step is not", () => {
    const w = cutWarnings(planned({ depthClearanceMm: 0.2 }), level, L, TOL);
    expect(w).toEqual([{ code: "depth-clearance-below-minimum", message: "Depth clearance of 0.20 mm is below the minimum of 0.50 mm." }]);
    expect(codes(planned({ depthClearanceMm: null }))).toEqual([]);
  });

  it("each failing wall is warned by its kind; a sound wall is not", () => {
    const walls = [
      wall("stud", "a", 3, true),
      wall("stud", "b", 1.5, false),
      wall("pocket", "left", 1.5, false),
      wall("outline", "deck", 1.5, false),
      wall("stud", "c", -0.3, false),
      wall("pocket", "right", -0.3, false),
      wall("outline", "deck", -0.3, false),
    ];
    const w = cutWarnings(planned({ walls }), level, L, TOL);
    expect(w.map((x) => x.code)).toEqual([
      "sealing-land-below-minimum",
      "wall-below-minimum",
      "wall-below-minimum",
      "cut-breaks-into-stud-hole",
      "cut-breaks-into-pocket",
      "cut-breaks-through-deck",
    ]);
    expect(w[0].message).toContain("at stud b");
    expect(w[1].message).toContain("to left");
    expect(w[3].message).toBe("The cut breaks 0.30 mm into the hole of stud c.");
    expect(w[4].message).toBe("The cut breaks 0.30 mm into right.");
    expect(w[5].message).toBe("The cut breaks 0.30 mm through the outside of the case.");
    // A wall of exactly zero is thin, not broken.
    expect(cutWarnings(planned({ walls: [wall("pocket", "left", 0, false)] }), level, L, 0).map((x) => x.code)).toEqual(["wall-below-minimum"]);
  });

  it("a cut through the mouth's depth, and a cut not needed, are warned", () => {
    expect(codes(planned({ throughMouth: true }))).toEqual(["cut-through-mouth"]);
    expect(codes(planned({}), { ...level, clearsMouth: true })).toEqual(["cut-not-needed"]);
  });

  it("a figure short of its minimum by less than the computing tolerance is sound, and a wall that short of zero is thin, not broken", () => {
    const tol = 0.001;
    expect(cutWarnings(planned({ vsCutMm: 0.4995, effectiveMm: 0.4995, depthClearanceMm: 0.4995 }), level, L, tol)).toEqual([]);
    expect(cutWarnings(planned({ vsCutMm: 0.4995, effectiveMm: 0.3 }), { ...level, plane: tilted }, L, tol).map((x) => x.code)).toEqual(["tilt-eats-clearance"]);
    expect(cutWarnings(planned({ walls: [wall("pocket", "left", -0.0005, false)] }), level, L, tol).map((x) => x.code)).toEqual(["wall-below-minimum"]);
  });
});
