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

/**
 * Depth stop: travel = groove travel (measured with the bit on the deck) − Σ shims under the ring; picks the
 * combination with travel at or just above the wanted depth, fewest shims on a tie. Common practice, no published source.
 */
export function chooseDepthStop(wantedMm: number, rig: Pick<BoringRig, "grooves" | "shims">, toleranceMm: number): DepthStop {
  const stacks = shimStacks(rig.shims, Math.max(...rig.grooves.map((g) => g.travelMm)) - wantedMm + toleranceMm, toleranceMm);
  let best: DepthStop | null = null;
  for (const groove of rig.grooves) {
    for (const stack of stacks) {
      const travelMm = groove.travelMm - stack.stackMm;
      const overshootMm = travelMm - wantedMm;
      if (overshootMm < -toleranceMm) continue;
      if (best !== null) {
        const closer = overshootMm < best.overshootMm - toleranceMm;
        const tie = Math.abs(overshootMm - best.overshootMm) <= toleranceMm;
        if (!closer && !(tie && stack.shimCount < best.shimCount)) continue;
      }
      best = { wantedMm, groove: groove.label, shims: stack.shims, shimStackMm: stack.stackMm, travelMm, overshootMm, shimCount: stack.shimCount, reached: true };
    }
  }
  if (best !== null) return best;
  const deepest = rig.grooves.reduce((a, g) => (g.travelMm > a.travelMm ? g : a), rig.grooves[0]);
  return { wantedMm, groove: deepest.label, shims: [], shimStackMm: 0, travelMm: deepest.travelMm, overshootMm: deepest.travelMm - wantedMm, shimCount: 0, reached: false };
}

interface ShimStack {
  readonly stackMm: number;
  readonly shimCount: number;
  readonly shims: ShimUse[];
}

/** Every distinct shim-stack thickness up to maxStackMm from the stock, each with its fewest-shim composition (dynamic programming over sizes). */
function shimStacks(stock: BoringRig["shims"], maxStackMm: number, toleranceMm: number): ShimStack[] {
  const key = (mm: number) => Math.round(mm / Math.max(toleranceMm, 1e-9));
  let states = new Map<number, ShimStack>([[0, { stackMm: 0, shimCount: 0, shims: [] }]]);
  for (const size of stock) {
    const next = new Map<number, ShimStack>();
    for (const st of states.values()) {
      for (let n = 0; n <= size.count; n++) {
        const stackMm = st.stackMm + n * size.thicknessMm;
        if (stackMm > maxStackMm) break;
        const k = key(stackMm);
        const prev = next.get(k);
        if (prev && prev.shimCount <= st.shimCount + n) continue;
        next.set(k, {
          stackMm,
          shimCount: st.shimCount + n,
          shims: n > 0 ? [...st.shims, { thicknessMm: size.thicknessMm, count: n }] : st.shims,
        });
      }
    }
    states = next;
  }
  return [...states.values()];
}
