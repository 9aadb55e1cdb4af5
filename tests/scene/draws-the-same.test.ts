import { describe, expect, it } from "vitest";
import { evaluateStudy } from "@/geometry";
import type { FitSnapshot } from "@/scene/store";
import { drawsTheSame } from "@/scene/three/fit-objects";
import type { ViewState } from "@/scene/three/view";
import { polygonStudy } from "./fixtures";

// A slider step draws the kit on show at once; the other kits' results follow after that frame. Without
// the overlay those kits' skirts are hidden, so their arrival needs no frame of its own.

const view: ViewState = { section: true, sectionAngleDeg: 0, camera: "three-quarter", cameraNonce: 0, exaggeration: 1, overlay: false, customer: false, units: "mm" };

function stepped(): { before: FitSnapshot; after: FitSnapshot } {
  const study = polygonStudy({ diameterMm: 57, depthMm: 20 });
  const result = evaluateStudy(study);
  const before: FitSnapshot = { study, result, kitIndex: 0, inputAt: 0 };
  // The full evaluation's other kits beside the kit on show's own result object.
  const full = evaluateStudy(study);
  const after: FitSnapshot = { ...before, result: { ...full, kits: full.kits.map((k, i) => (i === 0 ? result.kits[0] : k)) } };
  return { before, after };
}

describe("whether the other kits' results need a frame", () => {
  it("draws the same picture when only the hidden kits' results arrived", () => {
    const { before, after } = stepped();
    expect(after.result).not.toBe(before.result);
    expect(drawsTheSame(before, after, view)).toBe(true);
  });

  it("draws anew with the overlay on, where every kit's skirt is seen", () => {
    const { before, after } = stepped();
    expect(drawsTheSame(before, after, { ...view, overlay: true })).toBe(false);
  });

  it("draws anew when the kit on show or its result changed", () => {
    const { before, after } = stepped();
    expect(drawsTheSame(before, { ...after, kitIndex: 1 }, view)).toBe(false);
    const kits = after.result.kits.map((k, i) => (i === 0 ? { ...k } : k));
    expect(drawsTheSame(before, { ...after, result: { ...after.result, kits } }, view)).toBe(false);
  });

  it("draws anew when the shop's minimum clearance, which colours the skirt, changed", () => {
    const { before, after } = stepped();
    const limits = { ...after.result.limits, values: { ...after.result.limits.values, minRadialClearanceMm: after.result.limits.values.minRadialClearanceMm + 0.05 } };
    expect(drawsTheSame(before, { ...after, result: { ...after.result, limits } }, view)).toBe(false);
  });
});
