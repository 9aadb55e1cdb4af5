import { describe, expect, it } from "vitest";
import polygonClipping from "polygon-clipping";
import { skirtClearance, worstSkirtDiameterMm } from "../../geometry/clearance";
import { lensArea } from "../../geometry/lens";
import type { Outline } from "../../geometry/index";
import type { Vec2 } from "../../geometry/vec";

const TOL = 1e-9;

/** A circle as a fine polygon ring, for the independent polygon library. */
function ring(c: Vec2, r: number, n = 4096): [number, number][] {
  const pts: [number, number][] = [];
  for (let i = 0; i < n; i++) {
    const t = (2 * Math.PI * i) / n;
    pts.push([c[0] + r * Math.cos(t), c[1] + r * Math.sin(t)]);
  }
  return pts;
}

/** Area of the skirt outside the opening, from polygon-clipping (used only in tests). */
function clippedInterference(c: Vec2, r: number, opening: Outline): number {
  const skirt: [number, number][][] = [ring(c, r)];
  const hole: [number, number][][] =
    opening.kind === "circle" ? [ring(opening.centerMm ?? [0, 0], opening.diameterMm / 2)] : [opening.pointsMm.map((p) => [p[0], p[1]] as [number, number])];
  const diff = polygonClipping.difference(skirt, hole);
  let area = 0;
  for (const poly of diff) {
    poly.forEach((rg, i) => {
      let s = 0;
      for (let k = 0; k < rg.length - 1; k++) s += rg[k][0] * rg[k + 1][1] - rg[k + 1][0] * rg[k][1];
      area += (i === 0 ? 1 : -1) * Math.abs(s / 2);
    });
  }
  return area;
}

/** Relative error of a 4096-gon against its circle is about (2π/4096)²/6 ≈ 4e-7, so allow 1e-5 of the skirt area. */
const areaTol = (r: number) => 1e-5 * Math.PI * r * r + 1e-6;

describe("radial clearance against a round mouth", { timeout: 60_000 }, () => {
  it("a skirt 0.2 mm wider than the mouth interferes by 0.1 mm radially", () => {
    const res = skirtClearance([0, 0], 23.1, { kind: "circle", diameterMm: 46 }, TOL);
    expect(res.clearanceMm).toBeCloseTo(-0.1, 9);
    expect(res.interference?.deepestMm).toBeCloseTo(0.1, 9);
  });

  it("a concentric skirt 1 mm narrower than the mouth clears by 0.5 mm and has no interference", () => {
    const res = skirtClearance([0, 0], 22.5, { kind: "circle", diameterMm: 46 }, TOL);
    expect(res.clearanceMm).toBeCloseTo(0.5, 9);
    expect(res.interference).toBeNull();
  });

  it("an offset skirt loses its offset from the clearance and penetrates on the side it is offset to", () => {
    const res = skirtClearance([0.8, 0], 22.5, { kind: "circle", diameterMm: 46 }, TOL);
    expect(res.clearanceMm).toBeCloseTo(-0.3, 9);
    expect(res.interference?.angleDeg).toBeCloseTo(0, 6);
    expect(res.interference?.atMm[0]).toBeCloseTo(23.3, 9);
  });

  it("the interference area of an offset skirt is its area minus the lens, and polygon-clipping agrees", () => {
    const c: Vec2 = [1.5, -0.7];
    const r = 24;
    const mouth: Outline = { kind: "circle", diameterMm: 46, centerMm: [0.2, 0.1] };
    const res = skirtClearance(c, r, mouth, TOL);
    const d = Math.hypot(1.5 - 0.2, -0.7 - 0.1);
    expect(res.interference?.areaMm2).toBeCloseTo(Math.PI * r * r - lensArea(r, 23, d), 9);
    expect(Math.abs((res.interference?.areaMm2 ?? 0) - clippedInterference(c, r, mouth))).toBeLessThan(areaTol(r));
  });
});

describe("radial clearance against a polygon mouth", { timeout: 60_000 }, () => {
  const mouth: Outline = { kind: "polygon", pointsMm: [[-23, -20], [23, -20], [25, 0], [23, 20], [-23, 20], [-25, 0]] };

  it("the clearance is the distance to the nearest edge minus the skirt radius", () => {
    const res = skirtClearance([0, 0], 19.5, mouth, TOL);
    expect(res.clearanceMm).toBeCloseTo(0.5, 9);
    expect(res.interference).toBeNull();
  });

  it("a skirt crossing the flat sides penetrates by its overreach and points at the nearest edge", () => {
    const res = skirtClearance([0, 1], 21, mouth, TOL);
    // Nearest edge is the top flat (y = 20), 19 mm away.
    expect(res.clearanceMm).toBeCloseTo(-2, 9);
    expect(res.interference?.deepestMm).toBeCloseTo(2, 9);
    expect(res.interference?.angleDeg).toBeCloseTo(90, 6);
    expect(res.interference?.atMm[1]).toBeCloseTo(22, 9);
  });

  it.each([
    [[0, 0], 21],
    [[0, 1], 21],
    [[2, -1.5], 22.7],
    [[0, 0], 30],
  ] as [Vec2, number][])("the interference area at centre %j, radius %d agrees with polygon-clipping", (c, r) => {
    const res = skirtClearance(c, r, mouth, TOL);
    expect(res.interference).not.toBeNull();
    expect(Math.abs((res.interference?.areaMm2 ?? 0) - clippedInterference(c, r, mouth))).toBeLessThan(areaTol(r));
  });
});

describe("lens area", () => {
  it("is zero for disjoint circles and the smaller circle's area when one contains the other", () => {
    expect(lensArea(1, 1, 2.5)).toBe(0);
    expect(lensArea(1, 3, 0.5)).toBeCloseTo(Math.PI, 12);
  });
  it("is symmetric in the two radii", () => {
    expect(lensArea(2, 3, 2.2)).toBeCloseTo(lensArea(3, 2, 2.2), 12);
  });
});

describe("polygon orientation", () => {
  it("a clockwise mouth polygon gives the same interference area as the counter-clockwise one", () => {
    const ccw: Outline = { kind: "polygon", pointsMm: [[-23, -20], [23, -20], [25, 0], [23, 20], [-23, 20], [-25, 0]] };
    const cw: Outline = { kind: "polygon", pointsMm: [...ccw.pointsMm].reverse() };
    const a = skirtClearance([0, 1], 21, ccw, TOL).interference?.areaMm2 ?? NaN;
    const b = skirtClearance([0, 1], 21, cw, TOL).interference?.areaMm2 ?? NaN;
    expect(b).toBeCloseTo(a, 9);
    expect(Math.abs(a - clippedInterference([0, 1], 21, ccw))).toBeLessThan(areaTol(21));
  });
});

describe("a skirt touching the opening, and one outside it", () => {
  // Plain circle geometry, worked by hand: clearance = R − r − |c − C|.
  const mouth: Outline = { kind: "circle", diameterMm: 46 };

  it("a Ø46 skirt in a Ø46 opening touches it: clearance 0 and no interference, with or without a tolerance", () => {
    expect(skirtClearance([0, 0], 23, mouth, 0)).toEqual({ clearanceMm: 0, interference: null });
    expect(skirtClearance([0, 0], 23, mouth, TOL)).toEqual({ clearanceMm: 0, interference: null });
  });

  it("a skirt centred outside the opening reaches deepest on its far side", () => {
    // Centre (30, 0), 7 mm outside the Ø46 edge: clearance −7 − 10 = −17; the deepest point is the skirt's edge
    // away from the opening, (40, 0), at 0°.
    const c = skirtClearance([30, 0], 10, mouth, TOL);
    expect(c.clearanceMm).toBeCloseTo(-17, 12);
    expect(c.interference?.deepestMm).toBeCloseTo(17, 12);
    expect(c.interference?.atMm[0]).toBeCloseTo(40, 12);
    expect(c.interference?.atMm[1]).toBeCloseTo(0, 12);
    expect(c.interference?.angleDeg).toBeCloseTo(0, 12);
  });
});

describe("the skirt's worst diameter", () => {
  it("is the largest of its readings: a skirt measured 53.9, 54.0 and 53.95 mm is taken as Ø54.0 (common practice, no published source)", () => {
    expect(worstSkirtDiameterMm([53.9, 54, 53.95])).toBe(54);
  });
});
