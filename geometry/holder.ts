import { type PlaneFit, tiltDeg, tiltDirectionDeg, tryFitPlane } from "./alignment";
import type { StudyResult, Warning } from "./result-schema";
import type { Study } from "./schema";
import { messages, warning } from "./warnings";

/** The holder's plane from the height readings at the case studs, its alignment figures, and the warnings about it. */
export function holderAlignment(
  study: Study,
  maxRockMm: number,
  toleranceMm: number,
): { plane: PlaneFit | null; alignment: StudyResult["alignment"]; warnings: Warning[] } {
  const warnings: Warning[] = [];
  const readings = study.readings?.holderHeights ?? [];
  if (readings.length === 0) return { plane: null, alignment: null, warnings };
  const byLabel = new Map(study.case.studs.map((s) => [s.label, s.positionMm] as const));
  const points = readings.flatMap((r) => {
    const at = byLabel.get(r.stud);
    return at ? [{ stud: r.stud, atMm: at, heightMm: r.heightMm + r.straightedgeMm }] : [];
  });
  const plane = tryFitPlane(points);
  if (!plane) {
    warnings.push(warning("readings-insufficient", messages.readingsInsufficient()));
    return { plane: null, alignment: null, warnings };
  }
  if (plane.rockMm > maxRockMm + toleranceMm) warnings.push(warning("holder-rocks", messages.holderRocks(plane.rockMm, maxRockMm)));
  const alignment = {
    a: plane.a,
    b: plane.b,
    cMm: plane.cMm,
    tiltDeg: tiltDeg(plane),
    directionDeg: tiltDirectionDeg(plane),
    rockMm: plane.rockMm,
    residuals: points.map((p, i) => ({ stud: p.stud, residualMm: plane.residualsMm[i] })),
  };
  return { plane, alignment, warnings };
}
