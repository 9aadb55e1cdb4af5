import { crankClearance } from "./crank";
import type { PlannedCut } from "./kit-cut";
import { matchedPassageReachMm, passageUnderPort, portSteps } from "./ports";
import type { KitResult, Warning } from "./result-schema";
import type { CylinderKit } from "./schema";
import { type StudyContext, axisAt } from "./study-context";
import { messages, warning } from "./warnings";

/** The skirt's clearance to the swept crank webs against the shop's minimum, or "not checked" when the case gives no crank chamber. */
export function crankCheck(skirtRadiusMm: number, protrusionMm: number, entersCase: boolean, ctx: StudyContext, warnings: Warning[]): KitResult["crank"] {
  const crank = ctx.study.case.crank;
  const requiredMm = ctx.limits.minCrankClearanceMm;
  if (!crank) {
    if (entersCase) warnings.push(warning("crank-chamber-not-checked", messages.crankNotChecked()));
    return { checked: false, clearanceMm: null, requiredMm, ok: null, atMm: null, edgeDepthMm: null };
  }
  const c = crankClearance(skirtRadiusMm, protrusionMm, crank);
  const ok = c.clearanceMm >= requiredMm - ctx.tol;
  if (!ok) warnings.push(warning("crank-clearance-below-minimum", messages.crankBelowMin(c.clearanceMm, requiredMm)));
  return { checked: true, clearanceMm: c.clearanceMm, requiredMm, ok, atMm: c.atMm, edgeDepthMm: protrusionMm };
}

/**
 * For each port window of the kit's base gasket: the passage under it, the steps at its edges, and the wall
 * the cut would leave if that passage were opened to match the port (at the deck and, when tilted, at the
 * cut's bottom: the thinner counts). The wall is null when no cut is planned.
 */
export function portChecks(kit: CylinderKit, planned: PlannedCut | null, ctx: StudyContext, warnings: Warning[]): KitResult["ports"] {
  const ports = kit.baseGasket?.ports ?? [];
  const requiredMm = ctx.limits.minWallMm;
  return ports.map((port) => {
    const pocket = passageUnderPort(port, ctx.study.case.pockets, ctx.tol);
    const overlay = pocket ? portSteps(port.outline, pocket.outline, ctx.tol) : portSteps(port.outline, port.outline, ctx.tol);
    const steps = pocket ? overlay.steps : { innerMm: null, outerMm: null, ccwMm: null, cwMm: null };
    let matchedWallMm: number | null = null;
    if (planned) {
      const R = planned.cut.diameterMm / 2;
      const centres = ctx.plane ? [axisAt(ctx, 0), axisAt(ctx, planned.cut.depthMm)] : [axisAt(ctx, 0)];
      matchedWallMm = Math.min(...centres.map((c) => matchedPassageReachMm(c, pocket?.outline ?? null, port.outline, ctx.tol) - R));
    }
    const ok = matchedWallMm === null ? null : matchedWallMm >= requiredMm - ctx.tol;
    if (ok === false && matchedWallMm !== null) warnings.push(warning("matched-passage-wall-below-minimum", messages.matchedWallBelowMin(port.label, pocket?.label ?? null, matchedWallMm, requiredMm)));
    return { portLabel: port.label, pocketLabel: pocket?.label ?? null, centroidMm: overlay.centroidMm, directionDeg: overlay.directionDeg, steps, matchedWallMm, requiredMm, ok };
  });
}
