import { StudySchema, evaluateStudy, type Study, type StudyInput, type StudyResult } from "@/geometry";
import type { CaseRow, KitRow, RigRow } from "../../../../_ui/query/types";
import type { StudyInputs } from "./study-values";

/** A case row as the core reads it: for a round mouth with readings, the smallest reading is the diameter (as the server assembles it). */
export function caseFromRow(row: CaseRow): StudyInput["case"] {
  const data = { ...row.data, name: row.name };
  const readings = row.mouthReadingsMm ?? [];
  if (data.mouth.outline.kind === "circle" && readings.length > 0) {
    const smallest = Math.min(...readings.map((r) => r.valueMm));
    return { ...data, mouth: { ...data.mouth, outline: { ...data.mouth.outline, diameterMm: smallest } } };
  }
  return data;
}

export const kitFromRow = (row: KitRow): StudyInput["kits"][number] => ({ ...row.data, id: row.id, name: row.name });
export const rigFromRow = (row: RigRow): NonNullable<StudyInput["rig"]> => ({ ...row.data, name: row.name });

export type Evaluation =
  | { ok: true; study: Study; result: StudyResult; needed: StudyResult }
  | { ok: false; issues: { path: string; message: string }[] };

/**
 * The study as the core takes it, and the core's results: once as planned, and once with the cut left for
 * the core to propose per kit (the least cut each kit needs) for the lineup and the window chart.
 */
export function evaluateInBrowser(parts: {
  name: string;
  caseRow: CaseRow;
  kitRows: KitRow[];
  rigRow: RigRow | null;
  inputs: StudyInputs;
  shopLimits: Record<string, unknown> | null;
}): Evaluation {
  const candidate: StudyInput = {
    name: parts.name,
    case: caseFromRow(parts.caseRow),
    kits: parts.kitRows.map(kitFromRow),
    ...(parts.rigRow ? { rig: rigFromRow(parts.rigRow) } : {}),
    ...(parts.inputs.cut ? { cut: parts.inputs.cut } : {}),
    ...(parts.inputs.readings ? { readings: parts.inputs.readings } : {}),
    limits: { ...(parts.shopLimits ?? {}), ...(parts.inputs.limits ?? {}) },
  };
  const parsed = StudySchema.safeParse(candidate);
  if (!parsed.success) return { ok: false, issues: parsed.error.issues.map((i) => ({ path: i.path.join("."), message: i.message })) };
  const study = parsed.data;
  try {
    const result = evaluateStudy(study);
    const offset = study.cut?.centerOffsetMm;
    const needed = study.cut?.diameterMm !== undefined || study.cut?.depthMm !== undefined ? evaluateStudy({ ...study, cut: offset ? { centerOffsetMm: offset } : undefined }) : result;
    return { ok: true, study, result, needed };
  } catch (error) {
    return { ok: false, issues: [{ path: "", message: error instanceof Error ? error.message : "the study could not be evaluated" }] };
  }
}
