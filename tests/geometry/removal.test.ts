// Material a counterbore removes: the ring between the cut and the mouth times the depth, capped at the mouth's
// depth (below it is the crank chamber); mass at ρ g/cm³ with 1 cm³ = 1000 mm³. Areas worked by hand.
import { describe, expect, it } from "vitest";
import { removal } from "../../geometry/removal";

const mouth = { kind: "circle", diameterMm: 46 } as const;

describe("material removed", () => {
  it("a Ø56 cut 25 mm deep round a Ø46 mouth removes π(28² − 23²)·25 mm³, 2.67 g/cm³ of it", () => {
    const r = removal([0, 0], 28, 25, mouth, 26, 2.67, 1e-9);
    const area = Math.PI * (28 * 28 - 23 * 23);
    expect(r.areaMm2).toBeCloseTo(area, 9);
    expect(r.volumeMm3).toBeCloseTo(area * 25, 6);
    expect(r.massG).toBeCloseTo(((area * 25) / 1000) * 2.67, 6);
  });

  it("a cut 30 mm deep into a 26 mm mouth removes metal only down to 26 mm", () => {
    const r = removal([0, 0], 28, 30, mouth, 26, 2.7, 1e-9);
    expect(r.volumeMm3).toBeCloseTo(Math.PI * (28 * 28 - 23 * 23) * 26, 6);
  });

  it("a cut inside the mouth removes nothing", () => {
    const r = removal([0, 0], 20, 25, mouth, 26, 2.67, 1e-9);
    expect(r.areaMm2).toBe(0);
    expect(r.volumeMm3).toBe(0);
    expect(r.massG).toBe(0);
  });
});
