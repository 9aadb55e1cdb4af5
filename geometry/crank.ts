import type { CrankChamber } from "./schema";
import type { Vec2 } from "./vec";

// The crank chamber check. Frame: the crank axis runs along x, at depth d below the deck, square under the
// cylinder axis; the webs sweep the solid cylinder {y² + (z − d)² ≤ R², |x| ≤ S/2}. The skirt's lower edge is
// the circle of the skirt radius r about the cylinder axis at depth p (its protrusion below the deck).
//
// Every point of that edge, (r·cosφ, r·sinφ, p), lies at L = √(r² + h²) from the crank centre (0, 0, d), with
// h = d − p. The swept webs are a solid of revolution about x, so the distance from a point to them is the
// distance in its meridian half-plane, with coordinates a = |x| along the axis and ρ = √(y² + (z − d)²) from
// it: there the webs are the rectangle [0, S/2] × [0, R], and the edge is the arc a² + ρ² = L², 0 ≤ a ≤ r.

/** How close the skirt's lower edge comes to the swept crank webs. */
export interface CrankClearance {
  /** Least distance from the skirt's lower edge to the swept webs; negative when the webs reach into the skirt. */
  readonly clearanceMm: number;
  /** The point of the skirt's lower edge nearest the webs, in the deck plane (x ≥ 0, y ≥ 0; its mirror images about both axes are as near). */
  readonly atMm: Vec2;
}

/** Signed distance from (a, ρ) in the meridian half-plane to the webs' rectangle [0, S/2] × [0, R] (the box distance; negative inside). */
function websDistanceMm(a: number, rho: number, halfSpanMm: number, radiusMm: number): number {
  const qa = a - halfSpanMm;
  const qr = rho - radiusMm;
  return Math.hypot(Math.max(qa, 0), Math.max(qr, 0)) + Math.min(Math.max(qa, qr), 0);
}

/** Golden-section steps: the bracket shrinks by 0.618 each, so 120 steps take any bracket below 1e-24 of its width. */
const GOLDEN_STEPS = 120;

/** Where on [lo, hi] the unimodal f is least, by golden-section search. */
function argminUnimodal(f: (x: number) => number, lo: number, hi: number): number {
  const g = (Math.sqrt(5) - 1) / 2;
  let a = lo;
  let b = hi;
  let c = b - g * (b - a);
  let d = a + g * (b - a);
  let fc = f(c);
  let fd = f(d);
  for (let i = 0; i < GOLDEN_STEPS && b - a > 0; i++) {
    if (fc <= fd) {
      b = d;
      d = c;
      fd = fc;
      c = b - g * (b - a);
      fc = f(c);
    } else {
      a = c;
      c = d;
      fc = fd;
      d = a + g * (b - a);
      fd = f(d);
    }
  }
  const best = [lo, hi, (a + b) / 2].map((x) => [x, f(x)] as const).sort((p, q) => p[1] - q[1]);
  return best[0][0];
}

/**
 * Clearance between the skirt's lower edge (radius r, at depth p) and the swept crank webs (radius R, span S,
 * axis at depth d): with h = d − p, L = √(r² + h²) and K = √(R² + (S/2)²), when L ≥ K it is L − K where the
 * ray to the webs' rim corner meets the edge (a = L·(S/2)/K ≤ r), else the edge point right over the axis,
 * box distance of (r, |h|) — for a skirt narrower than the span that is h − R. When L < K the edge enters the
 * sphere round the rim and the least signed distance along the arc is found by golden-section search (the
 * distance falls, then rises, along the arc). Plain solid geometry, worked here; no published source.
 */
export function crankClearance(skirtRadiusMm: number, edgeDepthMm: number, crank: CrankChamber): CrankClearance {
  const r = skirtRadiusMm;
  const h = crank.deckToAxisMm - edgeDepthMm;
  const halfSpan = crank.webSpanMm / 2;
  const R = crank.webRadiusMm;
  const L = Math.hypot(r, h);
  const K = Math.hypot(R, halfSpan);
  const at = (a: number): CrankClearance["atMm"] => [a, Math.sqrt(Math.max(0, r * r - a * a))];
  const alongArc = (a: number) => websDistanceMm(a, Math.sqrt(Math.max(0, L * L - a * a)), halfSpan, R);
  if (L >= K) {
    const aCorner = (L * halfSpan) / K;
    if (aCorner <= r) return { clearanceMm: L - K, atMm: at(aCorner) };
    return { clearanceMm: websDistanceMm(r, Math.abs(h), halfSpan, R), atMm: at(r) };
  }
  const a = argminUnimodal(alongArc, 0, r);
  return { clearanceMm: alongArc(a), atMm: at(a) };
}
