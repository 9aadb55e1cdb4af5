import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { crankClearance, evaluateStudy } from "../../geometry/index";
import { parse, roundStudyInput } from "./fixtures";
import { propertyRuns } from "./runs";

// Plain solid geometry, worked by hand here (no published source): the skirt's lower edge (radius r, depth p)
// lies on a sphere of radius L = √(r² + h²) about the crank centre, h = d − p; the webs' rim corner lies at
// K = √(R² + (S/2)²) from it. Examples use 3-4-5 and 20-21-29 triangles so the roots come out whole.
const crank = { deckToAxisMm: 45.7, webRadiusMm: 21, webSpanMm: 40 };

/** Signed distance in 3D from a point to the swept webs {y² + (z − d)² ≤ R², |x| ≤ S/2}, written out directly. */
function toWebs(x: number, y: number, z: number, c: typeof crank): number {
  const axial = Math.abs(x) - c.webSpanMm / 2;
  const radial = Math.hypot(y, z - c.deckToAxisMm) - c.webRadiusMm;
  return axial > 0 || radial > 0 ? Math.hypot(Math.max(axial, 0), Math.max(radial, 0)) : Math.max(axial, radial);
}

describe("clearance between the skirt's lower edge and the swept crank webs", { timeout: 60_000 }, () => {
  it("a skirt wider than the web span meets the rim corner: L − K", () => {
    // r = 28, p = 24.7, d = 45.7 → h = 21, L = √(28² + 21²) = 35; K = √(21² + 20²) = 29; 35 − 29 = 6 mm.
    // The nearest edge point is on the ray to the corner: a = L·(S/2)/K = 35·20/29 = 24.1379… ≤ r.
    const c = crankClearance(28, 24.7, crank);
    expect(c.clearanceMm).toBeCloseTo(6, 9);
    expect(c.atMm[0]).toBeCloseTo((35 * 20) / 29, 9);
    expect(Math.hypot(c.atMm[0], c.atMm[1])).toBeCloseTo(28, 9);
  });

  it("a skirt narrower than the web span meets the webs' rim from straight above: h − R", () => {
    // r = 12, h = 35 → L = 37 ≥ K = 29, but a = 37·20/29 = 25.5 > r: the point over the axis (12, 35) is nearest,
    // under the rim's flat top (12 < 20), so the clearance is h − R = 35 − 21 = 14 mm.
    const c = crankClearance(12, 10.7, crank);
    expect(c.clearanceMm).toBeCloseTo(14, 9);
    expect(c.atMm[0]).toBeCloseTo(12, 9);
    expect(c.atMm[1]).toBeCloseTo(0, 9);
  });

  it("a skirt reaching into the webs' path gives a negative clearance, the depth of the deepest edge point", () => {
    // r = 28, h = 5 → L² = 809 < K² = 841. Deepest where S/2 − a = R − ρ = t on a² + ρ² = L²:
    // (20 − t)² + (21 − t)² = 809 → 2t² − 82t + 32 = 0 → t = (82 − √(82² − 256))/4 = (82 − √6468)/4 = 0.39405… mm.
    const t = (82 - Math.sqrt(6468)) / 4;
    const c = crankClearance(28, 40.7, crank);
    expect(c.clearanceMm).toBeCloseTo(-t, 9);
    expect(c.atMm[0]).toBeCloseTo(20 - t, 6);
  });

  it("is the least distance over the whole lower edge, as a dense walk round it finds", () => {
    const f = (min: number, max: number) => fc.double({ min, max, noNaN: true });
    fc.assert(
      fc.property(f(10, 40), f(5, 40), f(20, 90), f(15, 50), f(10, 70), (r, p, d, R, S) => {
        const c = { deckToAxisMm: d, webRadiusMm: R, webSpanMm: S };
        const got = crankClearance(r, p, c);
        let least = Infinity;
        for (let i = 0; i <= 20_000; i++) {
          const phi = (Math.PI / 2) * (i / 20_000);
          least = Math.min(least, toWebs(r * Math.cos(phi), r * Math.sin(phi), p, c));
        }
        // No point of the edge is nearer than the result, and the walk comes within its step of it.
        expect(got.clearanceMm).toBeLessThanOrEqual(least + 1e-9);
        expect(least - got.clearanceMm).toBeLessThan(1e-3);
        expect(toWebs(got.atMm[0], got.atMm[1], p, c)).toBeCloseTo(got.clearanceMm, 6);
      }),
      { numRuns: propertyRuns(200) },
    );
  });

  it("a study with the crank chamber reports the clearance, and below the minimum the kit cannot fit", () => {
    const input = roundStudyInput(); // skirt 54 mm, length 24.7 mm
    // r = 27, h = 45.7 − 24.7 = 21: L = √(27² + 21²) = √1170 = 34.2053 mm, K = 29 → 5.2053 mm.
    input.case.crank = crank;
    const ok = evaluateStudy(parse(input)).kits[0];
    expect(ok.crank.checked).toBe(true);
    expect(ok.crank.clearanceMm).toBeCloseTo(Math.sqrt(1170) - 29, 9);
    expect(ok.crank.ok).toBe(true);
    expect(ok.verdict).toBe("fits-after-cut");
    // Webs of radius 26: K = √(26² + 20²) = √1076 = 32.8024 → 1.4029 mm, below a 2 mm shop minimum.
    input.case.crank = { ...crank, webRadiusMm: 26 };
    input.limits = { minCrankClearanceMm: 2 };
    const tight = evaluateStudy(parse(input)).kits[0];
    expect(tight.crank.clearanceMm).toBeCloseTo(Math.sqrt(1170) - Math.sqrt(1076), 9);
    expect(tight.crank.ok).toBe(false);
    expect(tight.verdict).toBe("cannot-fit");
    expect(tight.reasons).toContain("crank-clearance-below-minimum");
    expect(tight.warnings.map((w) => w.code)).toContain("crank-clearance-below-minimum");
  });

  it("without crank values the result says the crank chamber was not checked", () => {
    const r = evaluateStudy(parse(roundStudyInput()));
    expect(r.case.crankChecked).toBe(false);
    expect(r.kits[0].crank).toMatchObject({ checked: false, clearanceMm: null, ok: null });
    expect(r.kits[0].warnings.map((w) => w.code)).toContain("crank-chamber-not-checked");
    expect(r.kits[0].verdict).toBe("fits-after-cut");
  });
});
