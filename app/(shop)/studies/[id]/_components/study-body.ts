import type { StudyInputs } from "./study-values";

/** What the study saves, as one JSON string, so that "unchanged" is a plain comparison. */
export function studyBody(
  inputs: StudyInputs | null,
  sel: { caseId: string; kitIds: string[]; rigId: string; chosenKitId: string },
): string | null {
  if (!inputs) return null;
  return JSON.stringify({
    name: inputs.name,
    notes: inputs.notes,
    caseId: sel.caseId,
    kitIds: sel.kitIds,
    rigId: sel.rigId || null,
    cut: inputs.cut ?? null,
    readings: inputs.readings ?? null,
    limits: inputs.limits ?? null,
    chosenKitId: sel.kitIds.includes(sel.chosenKitId) ? sel.chosenKitId : null,
  });
}
