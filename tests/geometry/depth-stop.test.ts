import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { type DepthStop, chooseDepthStop, depthStopWorkBound, searchDepthStop } from "../../geometry/depth-stop";
import { evaluateStudy } from "../../geometry/evaluate";
import { BoringRigSchema, MAX_GROOVES, MAX_SHIMS_PER_SIZE, MAX_SHIM_SIZES, StudySchema } from "../../geometry/schema";
import { roundStudyInput, testRig } from "./fixtures";
import { propertyRuns } from "./runs";

const TOL = 1e-9;

type Rig = { grooves: { label: string; travelMm: number }[]; shims: { thicknessMm: number; count: number }[] };

/**
 * Every groove with every stack, one by one: the reference the search must equal. The rule, as the product
 * states it: travel at or above the wanted depth and nearest to it; within the tolerance of that, fewest
 * shims; then the groove listed first; then the fewest of the shim sizes listed first.
 */
function bruteForce(wantedMm: number, rig: Rig, tol = TOL): Pick<DepthStop, "groove" | "shims" | "travelMm" | "shimCount" | "reached"> {
  const stacks: number[][] = [[]];
  for (const s of rig.shims) {
    const next: number[][] = [];
    for (const st of stacks) for (let n = 0; n <= s.count; n++) next.push([...st, n]);
    stacks.splice(0, stacks.length, ...next);
  }
  const all = rig.grooves.flatMap((g, gi) =>
    stacks.map((counts) => {
      const stackMm = counts.reduce((sum, n, i) => sum + n * rig.shims[i].thicknessMm, 0);
      return { gi, counts, travelMm: g.travelMm - stackMm, overshoot: g.travelMm - stackMm - wantedMm, count: counts.reduce((a, b) => a + b, 0) };
    }),
  );
  const feasible = all.filter((c) => c.overshoot >= -tol);
  if (feasible.length === 0) {
    const deepest = rig.grooves.reduce((a, g) => (g.travelMm > a.travelMm ? g : a));
    return { groove: deepest.label, shims: [], travelMm: deepest.travelMm, shimCount: 0, reached: false };
  }
  const least = Math.min(...feasible.map((c) => c.overshoot));
  const lex = (a: number[], b: number[]) => {
    for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return a[i] - b[i];
    return 0;
  };
  const best = feasible
    .filter((c) => c.overshoot <= least + tol)
    .sort((a, b) => a.count - b.count || a.gi - b.gi || lex(a.counts, b.counts))[0];
  return {
    groove: rig.grooves[best.gi].label,
    shims: best.counts.flatMap((n, i) => (n > 0 ? [{ thicknessMm: rig.shims[i].thicknessMm, count: n }] : [])),
    travelMm: best.travelMm,
    shimCount: best.count,
    reached: true,
  };
}

// Thicknesses on a 0.05 mm grid (many stacks of equal height, so the tie-breaks decide) and odd ones to the µm.
const thicknessArb = fc.oneof(fc.constantFrom(0.05, 0.1, 0.2, 0.25, 0.3, 0.5, 1), fc.integer({ min: 1, max: 1500 }).map((n) => n / 1000));
const smallRigArb = fc.record({
  grooves: fc.array(fc.integer({ min: 1000, max: 1500 }), { minLength: 1, maxLength: 3 }).map((ts) => ts.map((t, i) => ({ label: `g${i}`, travelMm: t / 100 }))),
  shims: fc.array(fc.record({ thicknessMm: thicknessArb, count: fc.integer({ min: 1, max: 4 }) }), { maxLength: 3 }),
});

/** A rig at the schema's limits, with thicknesses chosen so that almost no two stacks have the same height. */
function worstRig(sizes = MAX_SHIM_SIZES): Rig {
  const odd = [0.0137, 0.0291, 0.0433, 0.0577, 0.0711, 0.0853, 0.0997, 0.1131];
  return {
    grooves: Array.from({ length: MAX_GROOVES }, (_, i) => ({ label: `groove ${i + 1}`, travelMm: 20 + i * 1.37 })),
    shims: odd.slice(0, sizes).map((thicknessMm) => ({ thicknessMm, count: MAX_SHIMS_PER_SIZE })),
  };
}

/** The answer is a real set-up: its shims are in the stock and add up to its stack, and it reaches the depth. */
function expectConsistent(stop: DepthStop, wantedMm: number, rig: Rig) {
  const stack = stop.shims.reduce((s, u) => s + u.count * u.thicknessMm, 0);
  const total = (list: readonly { thicknessMm: number; count: number }[], t: number) => list.filter((s) => s.thicknessMm === t).reduce((a, s) => a + s.count, 0);
  for (const u of stop.shims) expect(total(stop.shims, u.thicknessMm)).toBeLessThanOrEqual(total(rig.shims, u.thicknessMm));
  expect(stop.shimStackMm).toBeCloseTo(stack, 9);
  expect(stop.shimCount).toBe(stop.shims.reduce((s, u) => s + u.count, 0));
  const groove = rig.grooves.find((g) => g.label === stop.groove);
  expect(stop.travelMm).toBeCloseTo((groove?.travelMm ?? NaN) - stack, 9);
  expect(stop.overshootMm).toBeCloseTo(stop.travelMm - wantedMm, 9);
  expect(stop.overshootMm).toBeGreaterThanOrEqual(-TOL);
}

describe("depth stop search", { timeout: 60_000 }, () => {
  it("equals the one-by-one search on small rigs (≤ 3 sizes of ≤ 4 shims, ≤ 3 grooves)", () => {
    // On failure fast-check prints the seed and path that reproduce the case.
    fc.assert(
      fc.property(smallRigArb, fc.integer({ min: 800, max: 1600 }), (rig, w) => {
        const wantedMm = w / 100;
        const got = chooseDepthStop(wantedMm, rig, TOL);
        const want = bruteForce(wantedMm, rig);
        expect(got.reached).toBe(want.reached);
        expect(got.groove).toBe(want.groove);
        expect(got.shims).toEqual(want.shims);
        expect(got.shimCount).toBe(want.shimCount);
        expect(got.travelMm).toBeCloseTo(want.travelMm, 9);
        if (got.reached) expectConsistent(got, wantedMm, rig);
      }),
      { numRuns: propertyRuns(400) },
    );
  });

  it("equals the one-by-one search on rigs built for ties: equal grooves, shims that add up to another size, every wanted depth on a 0.05 mm step", () => {
    // Hand-made rigs where many stacks give the same travel, so each tie-break of the rule above decides.
    const rigs: Rig[] = [
      { grooves: [{ label: "a", travelMm: 22 }, { label: "b", travelMm: 22 }], shims: [{ thicknessMm: 0.1, count: 4 }, { thicknessMm: 0.2, count: 2 }] },
      { grooves: [{ label: "a", travelMm: 22.3 }, { label: "b", travelMm: 22.1 }, { label: "c", travelMm: 22.3 }], shims: [{ thicknessMm: 0.2, count: 3 }, { thicknessMm: 0.1, count: 3 }, { thicknessMm: 0.3, count: 1 }] },
      { grooves: [{ label: "a", travelMm: 21 }, { label: "b", travelMm: 23 }], shims: [{ thicknessMm: 0.25, count: 4 }, { thicknessMm: 0.5, count: 2 }, { thicknessMm: 1, count: 1 }] },
      { grooves: [{ label: "only", travelMm: 22 }], shims: [] },
    ];
    for (const rig of rigs) {
      for (let w = 2000; w <= 2320; w += 5) {
        const wantedMm = w / 100;
        const got = chooseDepthStop(wantedMm, rig, TOL);
        const want = bruteForce(wantedMm, rig);
        const where = `${JSON.stringify(rig)} at ${wantedMm}`;
        expect([got.reached, got.groove, got.shimCount], where).toEqual([want.reached, want.groove, want.shimCount]);
        expect(got.shims, where).toEqual(want.shims);
        expect(got.travelMm, where).toBeCloseTo(want.travelMm, 9);
        if (got.reached) expectConsistent(got, wantedMm, rig);
        else expect(got.overshootMm, where).toBeCloseTo(want.travelMm - wantedMm, 9);
      }
    }
  });

  describe("at the tolerance's edges: thicknesses, travels and depths on the tolerance's own 1/16 mm grid", () => {
    // Every figure is a multiple of 1/16 mm (exact in binary) and the tolerance is 1/16 mm, so many stacks land
    // exactly at −tolerance below the wanted depth, or exactly one tolerance above the least overshoot, where
    // "at or above" and "within the tolerance" must include them. Each rig is also built for one tie-break.
    const TOL16 = 1 / 16;
    const X = { thicknessMm: 1, count: 1 };
    const W = { thicknessMm: 2, count: 1 };
    const gridRigs: Record<string, Rig> = {
      // Halves [X, W] and [Y, Z]: one Y against two Z in groove a, and one Z in groove b.
      "count, then groove": { grooves: [{ label: "a", travelMm: 10 }, { label: "b", travelMm: 9.8125 }], shims: [X, W, { thicknessMm: 0.3125, count: 1 }, { thicknessMm: 0.125, count: 2 }] },
      // One Y against one Z in the same groove: the stack with fewer of the size listed first.
      "sizes listed first": { grooves: [{ label: "a", travelMm: 10 }], shims: [X, W, { thicknessMm: 0.1875, count: 1 }, { thicknessMm: 0.125, count: 2 }] },
      // Two sizes of the same thickness in the same half.
      "equal thicknesses": { grooves: [{ label: "a", travelMm: 10 }], shims: [{ thicknessMm: 0.25, count: 1 }, { thicknessMm: 0.25, count: 1 }, X, W] },
      // A stack taller than the shallower groove's whole travel, which only the deeper groove can take.
      "taller than a groove": { grooves: [{ label: "a", travelMm: 5 }, { label: "b", travelMm: 20 }], shims: [{ thicknessMm: 10, count: 1 }, { thicknessMm: 0.25, count: 2 }] },
      // A stack as tall as the groove's travel, reached for a depth as small as the tolerance.
      "as tall as the groove": { grooves: [{ label: "a", travelMm: 1 }], shims: [{ thicknessMm: 1, count: 1 }] },
      // Halves of four sizes each: 1/16 + 4/16 and 2/16 + 3/16 mm, two stacks of two shims, of one height, in one half.
      "two pairs of one height": { grooves: [{ label: "a", travelMm: 10 }], shims: [1 / 16, 4 / 16, 2 / 16, 3 / 16, 1, 2, 3, 4].map((thicknessMm) => ({ thicknessMm, count: 1 })) },
    };
    const depths = (rig: Rig) => {
      const deepest = Math.max(...rig.grooves.map((g) => g.travelMm));
      return Array.from({ length: Math.round((deepest + TOL16) * 32) }, (_, k) => (k + 2) / 32);
    };

    it.each(Object.entries(gridRigs))("equals the one-by-one search at every depth on a 1/32 mm step: %s", (_, rig) => {
      for (const wantedMm of depths(rig)) {
        const got = chooseDepthStop(wantedMm, rig, TOL16);
        const want = bruteForce(wantedMm, rig, TOL16);
        const where = `at ${wantedMm}`;
        expect([got.reached, got.groove, got.shimCount], where).toEqual([want.reached, want.groove, want.shimCount]);
        expect(got.shims, where).toEqual(want.shims);
        expect(got.travelMm, where).toBe(want.travelMm);
      }
    });

    it("keeps one shim over two that come within the tolerance of it, and the groove listed first over a later one", () => {
      // 9.6875 mm: in groove a one 0.3125 mm shim gives 0 mm over, two 0.125 mm shims 1/16 mm over (the edge of
      // the tolerance); groove b over one 0.125 mm shim gives 0 mm over with a stack of fewer of the sizes listed first.
      expect(chooseDepthStop(9.6875, gridRigs["count, then groove"], TOL16)).toMatchObject({ groove: "a", shims: [{ thicknessMm: 0.3125, count: 1 }], overshootMm: 0 });
    });

    it("counts a stack exactly one tolerance short as reaching the depth, and takes the stack with fewer of the size listed first", () => {
      // 9.875 mm: one 0.1875 mm shim leaves the travel 1/16 mm short (−tolerance, still reached and the least
      // overshoot); one 0.125 mm shim is exactly a tolerance above it. Both one shim: the one without the first-listed size.
      const s = chooseDepthStop(9.875, gridRigs["sizes listed first"], TOL16);
      expect(s).toMatchObject({ groove: "a", shims: [{ thicknessMm: 0.125, count: 1 }], overshootMm: 0, reached: true });
      // 9.9375 mm: one 0.125 mm shim leaves it exactly a tolerance short, the bare groove is two tolerances above that.
      expect(chooseDepthStop(9.9375, gridRigs["sizes listed first"], TOL16)).toMatchObject({ shims: [{ thicknessMm: 0.125, count: 1 }], overshootMm: -TOL16, reached: true });
      // Two sizes of one thickness: the one listed second.
      expect(chooseDepthStop(9.75, gridRigs["equal thicknesses"], TOL16).shims).toEqual([{ thicknessMm: 0.25, count: 1 }]);
      expect(chooseDepthStop(9.75, gridRigs["equal thicknesses"], TOL16).shimCount).toBe(1);
    });

    it("uses a stack taller than the shallower groove under the deeper one, and a stack as tall as the travel for a depth of one tolerance", () => {
      expect(chooseDepthStop(9.75, gridRigs["taller than a groove"], TOL16)).toMatchObject({ groove: "b", shims: [{ thicknessMm: 10, count: 1 }, { thicknessMm: 0.25, count: 1 }], overshootMm: 0 });
      expect(chooseDepthStop(TOL16, gridRigs["as tall as the groove"], TOL16)).toMatchObject({ shims: [{ thicknessMm: 1, count: 1 }], travelMm: 0, reached: true });
    });

    it("with a tolerance of 0 takes only exact or deeper travel, as the one-by-one search does", () => {
      // 9.6875 mm: 1/16 + 4/16 or 2/16 + 3/16 mm, two shims each; the pair without the size listed first.
      expect(chooseDepthStop(9.6875, gridRigs["two pairs of one height"], 0).shims).toEqual([{ thicknessMm: 2 / 16, count: 1 }, { thicknessMm: 3 / 16, count: 1 }]);
      for (const rig of [gridRigs["count, then groove"], gridRigs["sizes listed first"], gridRigs["two pairs of one height"]]) {
        for (const wantedMm of depths(rig)) {
          const got = chooseDepthStop(wantedMm, rig, 0);
          const want = bruteForce(wantedMm, rig, 0);
          expect([got.reached, got.groove, got.shims, got.travelMm], `at ${wantedMm}`).toEqual([want.reached, want.groove, want.shims, want.travelMm]);
        }
      }
    });
  });

  it("answers the same for a shim stock whatever was asked of it before, with other grooves or another tolerance", () => {
    // The stacks of each half are kept per shim stock: they must be listed again when the tallest useful stack
    // or the tolerance they were grouped by changes.
    // Two stocks alike, each searched first one way and then for the same 9.984375 mm under a 20 mm groove.
    const stock = () => [{ thicknessMm: 10, count: 1 }, { thicknessMm: 1 / 64, count: 3 }];
    const wantedMm = 20 - 10 - 1 / 64;
    const deep = (shims: Rig["shims"]) => ({ grooves: [{ label: "deep", travelMm: 20 }], shims });
    const exact = chooseDepthStop(wantedMm, deep(stock()), 0);
    expect(exact).toMatchObject({ shims: [{ thicknessMm: 10, count: 1 }, { thicknessMm: 1 / 64, count: 1 }], overshootMm: 0 });
    // A shallow groove first, which the 10 mm shim is no use to: its stacks are listed only up to 5 mm.
    const first = stock();
    chooseDepthStop(4.5, { grooves: [{ label: "shallow", travelMm: 5 }], shims: first }, 0);
    expect(chooseDepthStop(wantedMm, deep(first), 0)).toEqual(exact);
    // A coarse tolerance of 1/16 mm first, on a groove 1/16 mm shallower: the same tallest useful stack (20 mm),
    // but the 1/64 mm shims fall within one tolerance of the bare groove and are grouped with it.
    const second = stock();
    chooseDepthStop(9, { grooves: [{ label: "coarse", travelMm: 20 - 1 / 16 }], shims: second }, 1 / 16);
    expect(chooseDepthStop(wantedMm, deep(second), 0)).toEqual(exact);
  });

  it("lists a rig's stacks once: the next search of the same rig looks at fewer states by the stacks of both halves", () => {
    // Halves [0.5 × 1] and [0.25 × 2]: 2 and 3 stacks.
    const rig: Rig = { grooves: [{ label: "a", travelMm: 20 }], shims: [{ thicknessMm: 0.5, count: 1 }, { thicknessMm: 0.25, count: 2 }] };
    const first = searchDepthStop(19.25, rig, TOL);
    const again = searchDepthStop(19.25, rig, TOL);
    expect(again.stop).toEqual(first.stop);
    expect(first.statesVisited - again.statesVisited).toBe(2 + 3);
  });

  it("adds no work for a shim thicker than the deepest groove's travel", () => {
    const grooves = [{ label: "a", travelMm: 25 }];
    const bare = searchDepthStop(24, { grooves, shims: [] }, TOL);
    const withSpacers = searchDepthStop(24, { grooves, shims: [{ thicknessMm: 100, count: 20 }] }, TOL);
    expect(withSpacers.stop).toEqual(bare.stop);
    expect(withSpacers.statesVisited).toBe(bare.statesVisited);
  });

  it("splits the sizes where the halves' numbers of stacks are closest: one single shim and twenty of another give halves of 2 and 21 stacks", () => {
    const rig: Rig = { grooves: [{ label: "a", travelMm: 20 }, { label: "b", travelMm: 22 }], shims: [{ thicknessMm: 0.5, count: 1 }, { thicknessMm: 0.05, count: 20 }] };
    expect(depthStopWorkBound(rig)).toBe(2 + 21 + 2 * (3 * 2 + 2 * 21));
  });

  it("among equally close stacks takes the fewest shims, then the groove listed first", () => {
    const rig: Rig = { grooves: [{ label: "upper", travelMm: 25 }, { label: "lower", travelMm: 26 }], shims: [{ thicknessMm: 0.5, count: 2 }, { thicknessMm: 1, count: 1 }] };
    // 25 mm: groove "upper" bare, or "lower" over the 1 mm shim, or over two 0.5 mm shims.
    const s = chooseDepthStop(25, rig, TOL);
    expect(s.groove).toBe("upper");
    expect(s.shimCount).toBe(0);
    // 24.5 mm: one 0.5 under "upper" beats 1 + 0.5 under "lower".
    const t = chooseDepthStop(24.5, rig, TOL);
    expect(t).toMatchObject({ groove: "upper", shims: [{ thicknessMm: 0.5, count: 1 }], shimCount: 1 });
  });

  it("answers the largest rig the schema allows, within a work bound set by the counts and not the thicknesses", () => {
    const rig = worstRig();
    expect(BoringRigSchema.shape.shims.safeParse(rig.shims).success).toBe(true);
    expect(BoringRigSchema.shape.grooves.safeParse(rig.grooves).success).toBe(true);
    const bound = depthStopWorkBound(rig);
    // Two halves of three sizes, 21³ stacks each, and five sweeps of them per groove.
    expect(bound).toBe(2 * 21 ** 3 + MAX_GROOVES * 5 * 21 ** 3);
    for (const wantedMm of [20.3, 27.77, 35.01]) {
      const { stop, statesVisited } = searchDepthStop(wantedMm, rig, TOL);
      expect(stop.reached).toBe(true);
      expect(statesVisited).toBeLessThanOrEqual(bound);
      expectConsistent(stop, wantedMm, rig);
      // The thinnest shim is 0.0137 mm, and stacks of it and the next come far closer than that.
      expect(stop.overshootMm).toBeLessThan(0.0137);
    }
  });

  it("bounds the work of a rig with more sizes than the schema allows too (the search never lists every height)", () => {
    const rig = worstRig(8);
    const { stop, statesVisited } = searchDepthStop(23.456, rig, TOL);
    expect(stop.reached).toBe(true);
    expectConsistent(stop, 23.456, rig);
    // 21⁴ per half instead of the 21⁸ ≈ 3.8·10¹⁰ stacks of a full listing.
    expect(statesVisited).toBeLessThanOrEqual(depthStopWorkBound(rig));
    expect(depthStopWorkBound(rig)).toBeLessThan(21 ** 4 * (2 + 5 * MAX_GROOVES) + 1);
  });

  it("evaluates a whole study whose rig has five sizes of twenty shims of odd thicknesses", () => {
    const input = roundStudyInput();
    const odd = [0.0137, 0.0291, 0.0433, 0.0577, 0.0711];
    const study = StudySchema.parse({
      ...input,
      rig: { ...testRig, shims: odd.map((thicknessMm) => ({ thicknessMm, count: 20 })) },
    });
    const stop = evaluateStudy(study).kits[0].rig?.depthStop;
    expect(stop?.reached).toBe(true);
    expect(stop?.overshootMm).toBeGreaterThanOrEqual(-TOL);
    expect(stop?.overshootMm).toBeLessThan(0.0137);
  });

  it("refuses a stock beyond what a shop has, in words", () => {
    const tooMany = BoringRigSchema.shape.shims.safeParse(worstRig(MAX_SHIM_SIZES + 1).shims);
    expect(tooMany.success).toBe(false);
    expect(tooMany.error?.issues[0].message).toBe(`at most ${MAX_SHIM_SIZES} shim sizes`);
    const tooDeep = BoringRigSchema.shape.shims.safeParse([{ thicknessMm: 0.1, count: MAX_SHIMS_PER_SIZE + 1 }]);
    expect(tooDeep.error?.issues[0].message).toBe(`at most ${MAX_SHIMS_PER_SIZE} shims of one size`);
  });
});
