import { displacementCc } from "./displacement";
import { evaluateKit } from "./evaluate-kit";
import { holderAlignment } from "./holder";
import { DEFAULT_CASE_DENSITY_G_PER_CM3 } from "./limits";
import { resolveLimits } from "./resolve-limits";
import type { StudyResult, Warning } from "./result-schema";
import type { Study } from "./schema";
import type { StudyContext } from "./study-context";
import { threadsMatch } from "./threads";
import { DEFAULT_TOLERANCE_MM } from "./tolerance";
import { ORIGIN, add, centroid } from "./vec";
import { featureReaches, maxCutDiameterMm } from "./wall";
import { messages, warning } from "./warnings";

export { resolveLimits, type ResolvedLimits } from "./resolve-limits";
export { proposeCutDiameterMm } from "./kit-cut";

/** Options of evaluateStudy. */
export interface EvaluateOptions {
  /** Length tolerance for every comparison on computed values (default DEFAULT_TOLERANCE_MM). */
  readonly toleranceMm?: number;
}

/**
 * Evaluates a parsed study: one result per kit (verdict, clearances, least and planned cut, walls, rig set-up,
 * alignment, crank chamber, ports, displacement, material removed, warnings) and the case-wide figures. Pure,
 * synchronous, deterministic.
 */
export function evaluateStudy(study: Study, options: EvaluateOptions = {}): StudyResult {
  const tol = options.toleranceMm ?? DEFAULT_TOLERANCE_MM;
  const limits = resolveLimits(study.limits);
  const L = limits.values;
  const cs = study.case;
  const studPatternCenterMm = centroid(cs.studs.map((s) => s.positionMm));
  const bearing = add(studPatternCenterMm, study.cut?.centerOffsetMm ?? ORIGIN);
  const holder = holderAlignment(study, L.maxRockMm, tol);
  const warnings: Warning[] = [...holder.warnings];

  let rigThread: StudyResult["case"]["rigThread"] = null;
  if (cs.studThread && study.rig?.studThread) {
    const m = threadsMatch(cs.studThread, study.rig.studThread, tol);
    rigThread = { case: m.a, rig: m.b, ok: m.ok };
    if (!m.ok) warnings.push(warning("thread-mismatch", messages.threadMismatch(m.a, m.b)));
  }

  const caseMaxCutDiameterMm = maxCutDiameterMm(featureReaches(bearing, cs, cs.mouth.depthMm, L, tol));
  const ctx: StudyContext = {
    study,
    tol,
    limits: L,
    bearing,
    plane: holder.plane,
    densityGPerCm3: cs.densityGPerCm3 ?? DEFAULT_CASE_DENSITY_G_PER_CM3,
    densityDefaulted: cs.densityGPerCm3 === undefined,
    stockCc: displacementCc(cs.stockBoreMm, cs.strokeMm, cs.cylinders),
    caseMaxCutDiameterMm,
  };

  return {
    kits: study.kits.map((k) => evaluateKit(k, ctx)),
    case: { studPatternCenterMm, mouthDepthMm: cs.mouth.depthMm, maxCutDiameterMm: caseMaxCutDiameterMm, stockDisplacementCc: ctx.stockCc, rigThread, crankChecked: cs.crank !== undefined },
    alignment: holder.alignment,
    limits: { values: L, defaulted: limits.defaulted },
    toleranceMm: tol,
    warnings,
  };
}
