// The crank-chamber and port checks of one kit, on hand-built contexts: each figure against the shop's minimum,
// the warning only when it fails, and a tilted cut judged where it comes nearest. That a skirt must clear the crank
// webs and a matched passage keep its wall: common practice, no published source.
import { describe, expect, it } from "vitest";
import { crankClearance } from "../../geometry/crank";
import { crankCheck, portChecks } from "../../geometry/kit-checks";
import type { PlannedCut } from "../../geometry/kit-cut";
import type { Warning } from "../../geometry/result-schema";
import type { CylinderKit } from "../../geometry/schema";
import type { StudyContext } from "../../geometry/study-context";

const crank = { deckToAxisMm: 45.7, webRadiusMm: 21, webSpanMm: 40 };
const ctxWith = (over: { crank?: typeof crank; minCrankClearanceMm?: number; tol?: number; plane?: StudyContext["plane"] }) =>
  ({
    study: { case: { crank: over.crank, pockets: [] } },
    limits: { minCrankClearanceMm: over.minCrankClearanceMm ?? 1, minWallMm: 2 },
    tol: over.tol ?? 0,
    bearing: [0, 0],
    plane: over.plane ?? null,
  }) as unknown as StudyContext;

describe("the crank check", () => {
  it("with no crank chamber given, a skirt that enters the case is warned as not checked; one that does not enter is not", () => {
    const warnings: Warning[] = [];
    const r = crankCheck(27, 24.7, true, ctxWith({}), warnings);
    expect(r).toEqual({ checked: false, clearanceMm: null, requiredMm: 1, ok: null, atMm: null, edgeDepthMm: null });
    expect(warnings.map((w) => w.code)).toEqual(["crank-chamber-not-checked"]);
    const none: Warning[] = [];
    crankCheck(27, 0, false, ctxWith({}), none);
    expect(none).toEqual([]);
  });

  it("a clearance exactly at the minimum, or short of it by less than the tolerance, passes without a warning", () => {
    const c = crankClearance(27, 24.7, crank).clearanceMm;
    const warnings: Warning[] = [];
    expect(crankCheck(27, 24.7, true, ctxWith({ crank, minCrankClearanceMm: c }), warnings)).toMatchObject({ checked: true, ok: true, clearanceMm: c, edgeDepthMm: 24.7 });
    expect(crankCheck(27, 24.7, true, ctxWith({ crank, minCrankClearanceMm: c + 0.0005, tol: 0.001 }), warnings).ok).toBe(true);
    expect(warnings).toEqual([]);
  });

  it("a clearance below the minimum fails and is warned", () => {
    const c = crankClearance(27, 24.7, crank).clearanceMm;
    const warnings: Warning[] = [];
    expect(crankCheck(27, 24.7, true, ctxWith({ crank, minCrankClearanceMm: c + 0.5 }), warnings).ok).toBe(false);
    expect(warnings.map((w) => w.code)).toEqual(["crank-clearance-below-minimum"]);
  });
});

describe("the port checks", () => {
  // A port window 30…34 mm out along +x, 8 mm wide, with no passage under it: opened to match, the cut's wall is
  // to the port's inner edge at x = 30.
  const port = { kind: "polygon" as const, pointsMm: [[30, -4], [34, -4], [34, 4], [30, 4]] as [number, number][] };
  const kit = { baseGasket: { ports: [{ label: "boost", outline: port }] } } as unknown as CylinderKit;
  const planned = (diameterMm: number) => ({ cut: { diameterMm, depthMm: 25 } }) as unknown as PlannedCut;

  it("a wall of exactly the minimum passes, without a warning", () => {
    const warnings: Warning[] = [];
    const [p] = portChecks(kit, planned(56), ctxWith({}), warnings);
    expect(p).toMatchObject({ portLabel: "boost", pocketLabel: null, matchedWallMm: 2, requiredMm: 2, ok: true });
    expect(warnings).toEqual([]);
  });

  it("with the holder tilted toward +x the wall counts at the cut's bottom, where the axis has moved 0.45 mm: 30 − 0.45 − 27.5", () => {
    // h = 0.01·x + 20: the axis is at x = 0.01·20 = 0.2 at the deck and 0.01·(20 + 25) = 0.45 at the bottom.
    const plane = { a: 0.01, b: 0, cMm: 20, residualsMm: [], rockMm: 0 };
    const warnings: Warning[] = [];
    const [p] = portChecks(kit, planned(55), ctxWith({ plane }), warnings);
    expect(p.matchedWallMm).toBeCloseTo(30 - 0.45 - 27.5, 9);
    expect(p.ok).toBe(true);
  });

  it("a wall below the minimum fails, warned with 'a passage' when there is none under the port", () => {
    const warnings: Warning[] = [];
    const [p] = portChecks(kit, planned(57), ctxWith({}), warnings);
    expect(p).toMatchObject({ matchedWallMm: 1.5, ok: false });
    expect(warnings).toEqual([
      { code: "matched-passage-wall-below-minimum", message: "If a passage were opened to match port boost, only 1.50 mm of wall would remain to the cut (minimum 2.00 mm)." },
    ]);
  });

  it("with no cut planned there is no wall to judge", () => {
    const [p] = portChecks(kit, null, ctxWith({}), []);
    expect(p).toMatchObject({ matchedWallMm: null, ok: null });
  });
});
