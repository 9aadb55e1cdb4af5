// The verdict and its reasons, from hand-built inputs. That a sound cut keeps every clearance and wall at or above
// its minimum, and that no cut helps a skirt that strikes the crank webs: common practice, no published source.
import { describe, expect, it } from "vitest";
import { type VerdictInput, cutReasons, decideVerdict } from "../../geometry/verdict";
import type { Wall } from "../../geometry/wall";
import { reportedWall } from "./fixtures";

const TOL = 1e-9;
const wall = (kind: Wall["kind"], minWallMm: number, ok: boolean): Wall => reportedWall(kind, minWallMm, ok);
const soundCut = { effectiveRadialClearanceMm: 0.6, depthClearanceMm: 0.6, walls: [wall("stud", 3, true)], diameterMm: 56, maxCutDiameterMm: 60 };
const input = (over: Partial<VerdictInput>): VerdictInput => ({
  studsOk: true,
  entersCase: true,
  clearsMouth: false,
  crankOk: true,
  cut: soundCut,
  minRadialClearanceMm: 0.5,
  minDepthClearanceMm: 0.5,
  ...over,
});

describe("the problems of a planned cut", () => {
  it("a sound cut has none, and figures exactly at their minimums are sound", () => {
    expect(cutReasons(soundCut, 0.5, 0.5, TOL)).toEqual([]);
    expect(cutReasons({ ...soundCut, effectiveRadialClearanceMm: 0.5, depthClearanceMm: 0.5, diameterMm: 60 }, 0.5, 0.5, 0)).toEqual([]);
    expect(cutReasons({ ...soundCut, effectiveRadialClearanceMm: 0, depthClearanceMm: null }, 0, 0.5, 0)).toEqual([]);
  });

  it("a skirt closer than the minimum, or into the cut, is one reason or the other, not both", () => {
    expect(cutReasons({ ...soundCut, effectiveRadialClearanceMm: 0.3 }, 0.5, 0.5, TOL)).toEqual(["radial-clearance-below-minimum"]);
    expect(cutReasons({ ...soundCut, effectiveRadialClearanceMm: -0.1 }, 0.5, 0.5, TOL)).toEqual(["skirt-interferes-with-cut"]);
  });

  it("a shallow cut is a reason; a cut with no step (depth clearance null) is not judged on depth", () => {
    expect(cutReasons({ ...soundCut, depthClearanceMm: 0.2 }, 0.5, 0.5, TOL)).toEqual(["depth-clearance-below-minimum"]);
    expect(cutReasons({ ...soundCut, depthClearanceMm: null }, 0.5, 0.5, TOL)).toEqual([]);
  });

  it("each failing wall names its kind once: thin land or wall, or a break into a stud hole, a pocket or through the deck", () => {
    const walls = [
      wall("stud", 1, false),
      wall("stud", 1.5, false),
      wall("pocket", 1, false),
      wall("outline", 3, true),
      wall("stud", -0.5, false),
      wall("pocket", -0.5, false),
      wall("outline", -0.5, false),
    ];
    expect(cutReasons({ ...soundCut, walls }, 0.5, 0.5, TOL)).toEqual([
      "sealing-land-below-minimum",
      "wall-below-minimum",
      "cut-breaks-into-stud-hole",
      "cut-breaks-into-pocket",
      "cut-breaks-through-deck",
    ]);
    // A wall of exactly zero is thin, not broken through.
    expect(cutReasons({ ...soundCut, walls: [wall("outline", 0, false)] }, 0.5, 0.5, 0)).toEqual(["wall-below-minimum"]);
  });

  it("a figure past its limit by less than the computing tolerance is not a problem", () => {
    const tol = 0.001;
    expect(cutReasons({ ...soundCut, effectiveRadialClearanceMm: 0.4995, depthClearanceMm: 0.4995, diameterMm: 60.0005 }, 0.5, 0.5, tol)).toEqual([]);
    // A skirt 0.0005 mm into the cut is at zero, within the tolerance: too close, not interfering.
    expect(cutReasons({ ...soundCut, effectiveRadialClearanceMm: -0.0005 }, 0.5, 0.5, tol)).toEqual(["radial-clearance-below-minimum"]);
    expect(cutReasons({ ...soundCut, walls: [wall("pocket", -0.0005, false)] }, 0.5, 0.5, tol)).toEqual(["wall-below-minimum"]);
  });

  it("a cut wider than the case allows is a reason", () => {
    expect(cutReasons({ ...soundCut, diameterMm: 60.5 }, 0.5, 0.5, TOL)).toEqual(["cut-larger-than-case-allows"]);
  });
});

describe("the verdict", () => {
  it("a skirt that clears the mouth fits as is; one that does not enter the case says so", () => {
    expect(decideVerdict(input({ clearsMouth: true }), TOL)).toEqual({ verdict: "fits-as-is", reasons: ["clears-existing-mouth"] });
    expect(decideVerdict(input({ clearsMouth: true, entersCase: false }), TOL)).toEqual({ verdict: "fits-as-is", reasons: ["skirt-does-not-enter"] });
  });

  it("clearing the mouth does not make a kit with the wrong studs, or one that strikes the crank, fit", () => {
    expect(decideVerdict(input({ clearsMouth: true, studsOk: false }), TOL)).toEqual({ verdict: "cannot-fit", reasons: ["stud-pattern-mismatch", "clears-existing-mouth"] });
    expect(decideVerdict(input({ clearsMouth: true, crankOk: false }), TOL)).toEqual({ verdict: "cannot-fit", reasons: ["crank-clearance-below-minimum", "clears-existing-mouth"] });
  });

  it("a sound cut fits after the cut, the crank checked or not", () => {
    expect(decideVerdict(input({}), TOL)).toEqual({ verdict: "fits-after-cut", reasons: ["needs-cut"] });
    expect(decideVerdict(input({ crankOk: null }), TOL)).toEqual({ verdict: "fits-after-cut", reasons: ["needs-cut"] });
  });

  it("no cut planned, a cut with a problem, the wrong studs or the crank struck: cannot fit", () => {
    expect(decideVerdict(input({ cut: null }), TOL)).toEqual({ verdict: "cannot-fit", reasons: ["needs-cut"] });
    expect(decideVerdict(input({ cut: { ...soundCut, depthClearanceMm: 0.1 } }), TOL)).toEqual({ verdict: "cannot-fit", reasons: ["needs-cut", "depth-clearance-below-minimum"] });
    expect(decideVerdict(input({ studsOk: false }), TOL)).toEqual({ verdict: "cannot-fit", reasons: ["stud-pattern-mismatch", "needs-cut"] });
    expect(decideVerdict(input({ crankOk: false }), TOL)).toEqual({ verdict: "cannot-fit", reasons: ["crank-clearance-below-minimum", "needs-cut"] });
  });

  it("judges the cut against the study's own minimums", () => {
    const strict = input({ minRadialClearanceMm: 0.8, minDepthClearanceMm: 0.7 });
    expect(decideVerdict(strict, TOL).reasons).toEqual(["needs-cut", "radial-clearance-below-minimum", "depth-clearance-below-minimum"]);
  });
});
