import { type PlaneFit, tiltDeg } from "./alignment";
import type { PlannedCut } from "./kit-cut";
import type { ResolvedLimits } from "./resolve-limits";
import type { Warning } from "./result-schema";
import { messages, warning } from "./warnings";

/** The warnings a planned cut raises: clearance below the minimum (or eaten by tilt), depth, each wall, a cut through the mouth, a cut not needed. */
export function cutWarnings(
  planned: PlannedCut,
  at: { entersCase: boolean; clearsMouth: boolean; plane: PlaneFit | null },
  L: ResolvedLimits["values"],
  tol: number,
): Warning[] {
  const out: Warning[] = [];
  const { effectiveMm, vsCutMm, depthClearanceMm } = planned;
  if (at.entersCase && effectiveMm < L.minRadialClearanceMm - tol) {
    if (at.plane && vsCutMm >= L.minRadialClearanceMm - tol) out.push(warning("tilt-eats-clearance", messages.tiltEats(vsCutMm, effectiveMm, tiltDeg(at.plane))));
    else out.push(warning("radial-clearance-below-minimum", messages.radialBelowMin(effectiveMm, L.minRadialClearanceMm)));
  }
  if (depthClearanceMm !== null && depthClearanceMm < L.minDepthClearanceMm - tol) {
    out.push(warning("depth-clearance-below-minimum", messages.depthBelowMin(depthClearanceMm, L.minDepthClearanceMm)));
  }
  for (const w of planned.walls) {
    if (w.ok) continue;
    if (w.minWallMm < -tol) {
      if (w.kind === "stud") out.push(warning("cut-breaks-into-stud-hole", messages.breaksStud(w.label, -w.minWallMm)));
      else if (w.kind === "pocket") out.push(warning("cut-breaks-into-pocket", messages.breaksPocket(w.label, -w.minWallMm)));
      else out.push(warning("cut-breaks-through-deck", messages.breaksDeck(-w.minWallMm)));
    } else if (w.kind === "stud") {
      out.push(warning("sealing-land-below-minimum", messages.landBelowMin(w.label, w.minWallMm, w.requiredMm)));
    } else {
      out.push(warning("wall-below-minimum", messages.wallBelowMin(w.label, w.minWallMm, w.requiredMm)));
    }
  }
  if (planned.depth.throughMouth) out.push(warning("cut-through-mouth", messages.throughMouth()));
  if (at.clearsMouth) out.push(warning("cut-not-needed", messages.cutNotNeeded()));
  return out;
}
