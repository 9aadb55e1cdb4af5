import { evaluateStudy, type Study, type StudyInput, type StudyResult } from "@/geometry";
import { assembleStudy, checkStudy, type CaseRowPart, type KitRowPart, type RigRowPart } from "@/model/study-assembly";
import type { StudyInputs } from "./study-values";

export { caseFromRow } from "@/model/study-assembly";

export type Evaluation =
  | { ok: true; study: Study; result: StudyResult; needed: StudyResult }
  | { ok: false; issues: { path: string; message: string }[] };

/**
 * The study as the core takes it (assembled as the server assembles it), and the core's results: once as
 * planned, and once with the cut left for the core to propose per kit (the least cut each kit needs) for
 * the lineup and the window chart.
 */
export function evaluateInBrowser(parts: {
  name: string;
  caseRow: CaseRowPart;
  kitRows: readonly KitRowPart[];
  rigRow: RigRowPart | null;
  inputs: StudyInputs;
  /** The limits the shop set itself (not the defaults). */
  shopLimits: StudyInput["limits"] | null;
}): Evaluation {
  const assembled = assembleStudy(
    { name: parts.name, case: parts.caseRow, kits: parts.kitRows, rig: parts.rigRow, cut: parts.inputs.cut, readings: parts.inputs.readings, limits: parts.inputs.limits },
    parts.shopLimits,
  );
  const checked = checkStudy(assembled);
  if (!checked.ok) return { ok: false, issues: checked.error.issues.map((i) => ({ path: i.path.join("."), message: i.message })) };
  const study = checked.study;
  try {
    const result = evaluateStudy(study);
    const offset = study.cut?.centerOffsetMm;
    const needed = study.cut?.diameterMm !== undefined || study.cut?.depthMm !== undefined ? evaluateStudy({ ...study, cut: offset ? { centerOffsetMm: offset } : undefined }) : result;
    return { ok: true, study, result, needed };
  } catch (error) {
    return { ok: false, issues: [{ path: "", message: error instanceof Error ? error.message : "the study could not be evaluated" }] };
  }
}
