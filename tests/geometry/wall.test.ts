import { describe, expect, it } from "vitest";
import { featureReaches, maxCutDiameterMm, thinnestWall, wallsForCut } from "../../geometry/wall";
import { parse, polygonStudyInput, roundStudyInput } from "./fixtures";

const TOL = 1e-9;
// The 2 mm sealing land and 2 mm wall are the shop's defaults (common practice, no published source); the
// expected walls are plane geometry worked by hand from the fixtures. Unequal minimums: fit-cases.test.ts.
const req = { minSealingLandMm: 2, minWallMm: 2 };

describe("remaining wall", () => {
  it("the sealing land at a stud is its distance minus the hole radius minus the cut radius", () => {
    const cs = parse(roundStudyInput()).case;
    const walls = wallsForCut([0, 0], 27.5, featureReaches([0, 0], cs, 25, req, TOL), TOL);
    const stud = walls.find((w) => w.kind === "stud" && w.label === "a");
    expect(stud?.minWallMm).toBeCloseTo(Math.hypot(28, 28) - 3.75 - 27.5, 9);
  });

  it("the wall to the round deck outline is the deck radius minus the cut radius", () => {
    const cs = parse(roundStudyInput()).case;
    const walls = wallsForCut([0, 0], 27.5, featureReaches([0, 0], cs, 25, req, TOL), TOL);
    expect(walls.find((w) => w.kind === "outline")?.minWallMm).toBeCloseTo(55 - 27.5, 9);
  });

  it("a cut past a pocket's inner face breaks into it by the overlap and is not ok", () => {
    const cs = parse(polygonStudyInput()).case;
    const walls = wallsForCut([0, 0], 32, featureReaches([0, 0], cs, 25, req, TOL), TOL);
    const left = walls.find((w) => w.label === "left");
    expect(left?.minWallMm).toBeCloseTo(-1, 9);
    expect(left?.ok).toBe(false);
    expect(thinnestWall(walls)?.minWallMm).toBeCloseTo(-1, 9);
  });

  it("a pocket that starts below the cut's depth cannot be broken into", () => {
    const input = polygonStudyInput();
    const cs = parse({ ...input, case: { ...input.case, pockets: [{ label: "deep", startDepthMm: 20, outline: { kind: "circle", diameterMm: 4, centerMm: [30, 0] } }] } }).case;
    const shallow = wallsForCut([0, 0], 29.5, featureReaches([0, 0], cs, 10, req, TOL), TOL).find((w) => w.label === "deep");
    const deep = wallsForCut([0, 0], 29.5, featureReaches([0, 0], cs, 25, req, TOL), TOL).find((w) => w.label === "deep");
    expect(shallow?.reached).toBe(false);
    expect(shallow?.ok).toBe(true);
    expect(deep?.ok).toBe(false);
  });

  it("the largest cut leaves exactly the minimum wall at the limiting feature", () => {
    const cs = parse(polygonStudyInput()).case;
    const reaches = featureReaches([0, 0], cs, 25, req, TOL);
    const dMax = maxCutDiameterMm(reaches);
    // The pockets' inner faces are 31 mm from the centre: 2·(31 − 2).
    expect(dMax).toBeCloseTo(58, 9);
    const walls = wallsForCut([0, 0], dMax / 2, reaches, TOL);
    expect(Math.min(...walls.map((w) => w.minWallMm - w.requiredMm))).toBeCloseTo(0, 9);
    expect(walls.every((w) => w.ok)).toBe(true);
  });
});

describe("wall edges", () => {
  const cs = parse(roundStudyInput()).case;
  const pocket = (startDepthMm: number) => ({ ...cs, pockets: [{ label: "p", startDepthMm, outline: { kind: "polygon" as const, pointsMm: [[31, -4], [36, -4], [36, 4], [31, 4]] as [number, number][] } }] });

  it("a pocket starting at the cut's depth, within the tolerance, is not reached", () => {
    expect(featureReaches([0, 0], pocket(19.995), 20, req, 0.01).find((f) => f.kind === "pocket")?.reached).toBe(false);
    expect(featureReaches([0, 0], pocket(19.98), 20, req, 0.01).find((f) => f.kind === "pocket")?.reached).toBe(true);
  });

  it("a wall exactly at its minimum is kept, and the thinnest wall is the first of equals", () => {
    const walls = wallsForCut([0, 0], 29, featureReaches([0, 0], pocket(0), 20, req, 0), 0);
    expect(walls.find((w) => w.kind === "pocket")?.minWallMm).toBe(2);
    expect(walls.find((w) => w.kind === "pocket")?.ok).toBe(true);
    const twin = wallsForCut([0, 0], 29, featureReaches([0, 0], cs, 20, req, 0), 0).filter((w) => w.kind === "stud");
    expect(thinnestWall(twin)?.label).toBe("a");
  });

  it("the deck outline counts as a wall the cut reaches: it can be the thinnest", () => {
    const small = { ...cs, deck: { kind: "circle" as const, diameterMm: 64 } };
    const walls = wallsForCut([0, 0], 28, featureReaches([0, 0], small, 20, req, TOL), TOL);
    expect(thinnestWall(walls)?.kind).toBe("outline");
    expect(maxCutDiameterMm(featureReaches([0, 0], small, 20, req, TOL))).toBeCloseTo(2 * (32 - 2), 9);
  });
});

describe("a pocket starting exactly at the cut's depth", () => {
  it("is not reached, even with no tolerance", () => {
    const cs = parse(polygonStudyInput()).case;
    const pockets = cs.pockets.map((p) => ({ ...p, startDepthMm: 25 }));
    const reaches = featureReaches([0, 0], { ...cs, pockets }, 25, req, 0);
    expect(reaches.filter((f) => f.kind === "pocket").map((f) => f.reached)).toEqual([false, false, false, false]);
    expect(featureReaches([0, 0], { ...cs, pockets }, 25.5, req, 0).filter((f) => f.kind === "pocket").every((f) => f.reached)).toBe(true);
  });
});
