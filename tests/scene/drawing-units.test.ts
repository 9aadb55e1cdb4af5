import { describe, expect, it } from "vitest";
import { evaluateStudy } from "@/geometry";
import { planDrawing } from "@/scene/drawing/plan";
import { sectionDrawing } from "@/scene/drawing/section";
import { drawnKey } from "@/scene/three/drawn-key";
import type { ViewState } from "@/scene/three/view";
import { roundStudy } from "./fixtures";

// The drawings write every figure with the units module: decimal inches to 0.001 for an inch user (what an
// inch caliper reads), never a fraction, and a true minus for a negative figure.

describe("the drawings in inches", () => {
  const study = roundStudy({ diameterMm: 55.1, depthMm: 25.25 });
  const result = evaluateStudy(study);

  it("label the cut in decimal inches, not in fractions", () => {
    const svg = planDrawing(study, result, 0, "in").svg;
    // 55.10 mm / 25.4 = 2.169 in (exact inch, NBS Circular 572 Addendum)
    expect(svg).toContain("cut Ø 2.169 in");
    expect(svg).not.toMatch(/\d+\/\d+"/);
  });

  it("write the section's depths in decimal inches", () => {
    const svg = sectionDrawing(study, result, 0, "in").svg;
    // 25.25 mm / 25.4 = 0.994 in (exact inch)
    expect(svg).toContain("cut depth 0.994 in");
    expect(svg).not.toMatch(/\d+\/\d+"/);
  });
});

describe("the key of what a frame shows", () => {
  const view: ViewState = { section: true, sectionAngleDeg: 45, camera: "plan", cameraNonce: 2, exaggeration: 1, overlay: false, customer: false, units: "mm" };

  it("changes with the view, the kit and the cut, and only with them", () => {
    const key = drawnKey(view, 0, { diameterMm: 55.1 });
    expect(drawnKey({ ...view }, 0, { diameterMm: 55.1 })).toBe(key);
    expect(drawnKey({ ...view, section: false }, 0, { diameterMm: 55.1 })).not.toBe(key);
    expect(drawnKey({ ...view, sectionAngleDeg: 50 }, 0, { diameterMm: 55.1 })).not.toBe(key);
    expect(drawnKey({ ...view, overlay: true }, 0, { diameterMm: 55.1 })).not.toBe(key);
    expect(drawnKey(view, 1, { diameterMm: 55.1 })).not.toBe(key);
    expect(drawnKey(view, 0, { diameterMm: 55.15 })).not.toBe(key);
    expect(drawnKey(view, 0, undefined)).not.toBe(key);
  });
});
