import { DegenerateGeometryError } from "./errors";
import type { BoringRig } from "./schema";

/** One shim size used in a stack. */
export interface ShimUse {
  readonly thicknessMm: number;
  readonly count: number;
}

/** The depth-stop set-up: which groove, which shims, and the travel they give. */
export interface DepthStop {
  readonly wantedMm: number;
  /** Groove label; the deepest groove, with no shims, when no combination reaches the wanted depth. */
  readonly groove: string;
  readonly shims: ShimUse[];
  readonly shimStackMm: number;
  /** Travel with the ring in the groove over the shims: groove travel − shim stack. */
  readonly travelMm: number;
  /** Travel − wanted depth (≥ 0 when reached). */
  readonly overshootMm: number;
  readonly shimCount: number;
  readonly reached: boolean;
}

/** A depth stop and the number of stack states the search looked at (bounded by depthStopWorkBound). */
export interface DepthStopSearch {
  readonly stop: DepthStop;
  readonly statesVisited: number;
}

type Rig = Pick<BoringRig, "grooves" | "shims">;
type Stock = Rig["shims"];

/**
 * Depth stop: travel = groove travel (measured with the bit on the deck) − Σ shims under the ring; picks the
 * combination with travel at or just above the wanted depth, fewest shims on a tie (within the tolerance), then
 * the groove listed first, then the stack with the fewest of the sizes listed first. Common practice, no published source.
 */
export function chooseDepthStop(wantedMm: number, rig: Rig, toleranceMm: number): DepthStop {
  return searchDepthStop(wantedMm, rig, toleranceMm).stop;
}

/**
 * Most stack states searchDepthStop can visit for a rig, whatever the thicknesses: P_A + P_B + G·(3·P_A + 2·P_B),
 * with P_A, P_B = Π(countᵢ + 1) over each half of the shim sizes and G the number of grooves.
 */
export function depthStopWorkBound(rig: Rig): number {
  const [a, b] = splitStock(rig.shims);
  const pa = combinations(a);
  const pb = combinations(b);
  return pa + pb + rig.grooves.length * (3 * pa + 2 * pb);
}

/**
 * The depth stop chooseDepthStop returns, found by meet in the middle (Horowitz and Sahni, J. ACM 21(2), 1974, the
 * subset-sum split): the shim sizes are split in two halves, each half's stacks are listed once and sorted, and
 * for every groove one two-pointer sweep finds the tallest stack that still reaches the depth. Exact for any
 * thicknesses; the work is bounded by depthStopWorkBound, never by the number of distinct stack heights.
 */
export function searchDepthStop(wantedMm: number, rig: Rig, toleranceMm: number): DepthStopSearch {
  const { stockA, stockB, A, B, radixB, enumerated } = stockHalves(rig, toleranceMm);
  let visited = enumerated;
  const overshoot = (travelMm: number, i: number, j: number) => travelMm - (A.heightMm[i] + B.heightMm[j]) - wantedMm;

  // Pass 1: the least overshoot at or above the wanted depth over every groove.
  let bestOvershoot = Infinity;
  for (const g of rig.grooves) {
    let j = B.length - 1;
    for (let i = 0; i < A.length && j >= 0; i++) {
      while (j >= 0 && overshoot(g.travelMm, i, j) < -toleranceMm) {
        j--;
        visited++;
      }
      visited++;
      if (j >= 0) bestOvershoot = Math.min(bestOvershoot, overshoot(g.travelMm, i, j));
    }
  }
  if (!Number.isFinite(bestOvershoot)) {
    const deepest = rig.grooves.reduce((a, g) => (g.travelMm > a.travelMm ? g : a), rig.grooves[0]);
    const stop = { wantedMm, groove: deepest.label, shims: [], shimStackMm: 0, travelMm: deepest.travelMm, overshootMm: deepest.travelMm - wantedMm, shimCount: 0, reached: false };
    return { stop, statesVisited: visited };
  }

  // Pass 2: among the stacks within the tolerance of that overshoot, the fewest shims, then the first groove,
  // then the smallest composition code (fewest of the sizes listed first).
  let chosen: { groove: number; i: number; j: number; count: number; code: number } | null = null;
  for (let gi = 0; gi < rig.grooves.length; gi++) {
    const travelMm = rig.grooves[gi].travelMm;
    let j = B.length - 1;
    for (let i = 0; i < A.length && j >= 0; i++) {
      while (j >= 0 && overshoot(travelMm, i, j) < -toleranceMm) {
        j--;
        visited++;
      }
      for (let k = j; k >= 0 && overshoot(travelMm, i, k) <= bestOvershoot + toleranceMm; k--) {
        visited++;
        const count = A.count[i] + B.count[k];
        const code = A.code[i] * radixB + B.code[k];
        if (chosen === null || count < chosen.count || (chosen.groove === gi && count === chosen.count && code < chosen.code)) chosen = { groove: gi, i, j: k, count, code };
      }
    }
  }
  if (chosen === null) throw new DegenerateGeometryError("the depth-stop search lost the stack it had found");
  const groove = rig.grooves[chosen.groove];
  const shimStackMm = A.heightMm[chosen.i] + B.heightMm[chosen.j];
  const travelMm = groove.travelMm - shimStackMm;
  const stop: DepthStop = {
    wantedMm,
    groove: groove.label,
    shims: [...decode(stockA, A.code[chosen.i]), ...decode(stockB, B.code[chosen.j])],
    shimStackMm,
    travelMm,
    overshootMm: travelMm - wantedMm,
    shimCount: chosen.count,
    reached: true,
  };
  return { stop, statesVisited: visited };
}

interface Halves {
  readonly stockA: Stock;
  readonly stockB: Stock;
  readonly A: HalfStacks;
  readonly B: HalfStacks;
  readonly radixB: number;
  readonly maxStackMm: number;
  readonly q: number;
  /** Stacks listed to build the halves: 0 when they came from the cache. */
  readonly enumerated: number;
}

// The halves depend on the stock, the tallest groove and the tolerance only, not on the depth wanted: a study
// asks the same rig once per kit, so they are kept per stock array (a WeakMap on the readonly input).
const halvesCache = new WeakMap<Stock, Halves>();

function stockHalves(rig: Rig, toleranceMm: number): Halves {
  const maxStackMm = Math.max(...rig.grooves.map((g) => g.travelMm)) + toleranceMm;
  const q = Math.max(toleranceMm, 1e-9);
  const cached = halvesCache.get(rig.shims);
  if (cached && cached.maxStackMm === maxStackMm && cached.q === q) return { ...cached, enumerated: 0 };
  const [stockA, stockB] = splitStock(rig.shims);
  const A = halfStacks(stockA, maxStackMm, q);
  const B = halfStacks(stockB, maxStackMm, q);
  const halves = { stockA, stockB, A, B, radixB: combinations(stockB), maxStackMm, q, enumerated: A.enumerated + B.enumerated };
  halvesCache.set(rig.shims, halves);
  return halves;
}

/** Number of stacks a stock allows (each size used 0…count times): Π(countᵢ + 1). */
function combinations(stock: Stock): number {
  return stock.reduce((p, s) => p * (s.count + 1), 1);
}

/** Splits the sizes, in their listed order, where the two halves' numbers of stacks are closest. */
function splitStock(stock: Stock): [Stock, Stock] {
  const total = combinations(stock);
  let bestAt = 0;
  let bestCost = Infinity;
  let prefix = 1;
  for (let m = 0; m <= stock.length; m++) {
    const cost = Math.max(prefix, total / prefix);
    if (cost < bestCost) {
      bestCost = cost;
      bestAt = m;
    }
    if (m < stock.length) prefix *= stock[m].count + 1;
  }
  return [stock.slice(0, bestAt), stock.slice(bestAt)];
}

/** One half's stacks, sorted by height, one per height (to the resolution q) with its fewest shims and smallest code. */
interface HalfStacks {
  readonly length: number;
  readonly heightMm: Float64Array;
  readonly count: Uint16Array;
  /** Mixed-radix composition: the count of the first size is the most significant digit. */
  readonly code: Float64Array;
  readonly enumerated: number;
}

function halfStacks(stock: Stock, maxStackMm: number, q: number): HalfStacks {
  // Every stack of the half (pruned above the tallest useful one), in mixed-radix order.
  let h = new Float64Array([0]);
  let c = new Uint16Array([0]);
  let k = new Float64Array([0]);
  for (const size of stock) {
    const cap = h.length * (size.count + 1);
    const nh = new Float64Array(cap);
    const nc = new Uint16Array(cap);
    const nk = new Float64Array(cap);
    const radix = size.count + 1;
    let m = 0;
    for (let s = 0; s < h.length; s++) {
      for (let n = 0; n <= size.count; n++) {
        const height = h[s] + n * size.thicknessMm;
        if (height > maxStackMm) break;
        nh[m] = height;
        nc[m] = c[s] + n;
        nk[m] = k[s] * radix + n;
        m++;
      }
    }
    h = nh.subarray(0, m);
    c = nc.subarray(0, m);
    k = nk.subarray(0, m);
  }
  const enumerated = h.length;
  // The distinct heights (to q), sorted: a native numeric sort, then one entry per key.
  const sorted = Float64Array.from(h).sort();
  const keys = new Float64Array(enumerated);
  let length = 0;
  for (let i = 0; i < enumerated; i++) {
    const key = Math.round(sorted[i] / q);
    if (length === 0 || keys[length - 1] !== key) keys[length++] = key;
  }
  // Each stack goes to its key's entry, which keeps the fewest shims, then the smallest code: the stacks were
  // listed in increasing code (mixed-radix order, pruning only drops some), so the first of the fewest is kept.
  const heightMm = new Float64Array(length);
  const count = new Uint16Array(length).fill(0xffff);
  const code = new Float64Array(length);
  for (let i = 0; i < enumerated; i++) {
    const key = Math.round(h[i] / q);
    let lo = 0;
    let hi = length - 1;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (keys[mid] < key) lo = mid + 1;
      else hi = mid;
    }
    if (c[i] < count[lo]) {
      heightMm[lo] = h[i];
      count[lo] = c[i];
      code[lo] = k[i];
    }
  }
  return { length, heightMm, count, code, enumerated };
}

/** The shims a composition code stands for, in the stock's order, sizes not used left out. */
function decode(stock: Stock, code: number): ShimUse[] {
  const counts: number[] = [];
  let rest = code;
  for (let s = stock.length - 1; s >= 0; s--) {
    const radix = stock[s].count + 1;
    counts.unshift(rest % radix);
    rest = Math.floor(rest / radix);
  }
  return stock.flatMap((s, i) => (counts[i] > 0 ? [{ thicknessMm: s.thicknessMm, count: counts[i] }] : []));
}
