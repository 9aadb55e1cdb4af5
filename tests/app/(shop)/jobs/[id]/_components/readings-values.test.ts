import { describe, expect, it } from "vitest";
import { readingsRequest, readingsText } from "@/app/(shop)/jobs/[id]/_components/readings-values";

// The after-cut readings form's text to its request: what is refused before anything is sent, and why.

const STUDS = ["A", "B"];

describe("after-cut readings as typed", () => {
  it("become the request: readings split on spaces, a land per stud that has one, the gasket as a number", () => {
    const t = { ...readingsText(null, STUDS), diam: "55.10 55.12", depth: "25.25", lands: { A: "3.1", B: "" }, gasket: "0.2", chips: true };
    const { body, errors } = readingsRequest(t, STUDS);
    expect(errors).toEqual({});
    expect(body).toMatchObject({ cutDiameterMm: [55.1, 55.12], cutDepthMm: [25.25], sealingLandMm: [{ stud: "A", valueMm: 3.1 }], gasketStackMm: 0.2, chipsCleaned: true, trialFit: "not-tried" });
  });

  it("refuse a comma decimal, a land that is not a number and a missing gasket stack, each next to its field", () => {
    const t = { ...readingsText(null, STUDS), diam: "55,10", depth: "25.25", lands: { A: "three", B: "" }, gasket: "" };
    const { errors } = readingsRequest(t, STUDS);
    expect(errors.cutDiameterMm).toMatch(/point for decimals/);
    expect(errors["land-A"]).toBe("A number in mm, with a point for decimals.");
    expect(errors.gasketStackMm).toBe("Give the gasket stack used (0 for none).");
  });

  it("start from the last readings saved", () => {
    const t = readingsText({ cutDiameterMm: [55.1, 55.2], cutDepthMm: [25], sealingLandMm: [{ stud: "B", valueMm: 2.5 }], gasketStackMm: 0, chipsCleaned: true, trialFit: "goes-home" }, STUDS);
    expect(t).toMatchObject({ diam: "55.1 55.2", depth: "25", lands: { A: "", B: "2.5" }, gasket: "0", chips: true, trial: "goes-home" });
  });
});
