"use client";

import { useMemo, useState } from "react";
import { shopOwnLimits } from "@/model/study-assembly";
import { useShopSettings } from "../../../../_ui/query/settings/use-shop-settings";
import { evaluateInBrowser, type Evaluation } from "./assemble";
import type { StudyFormValues, StudyInputs } from "./study-values";
import { useStudyRows } from "./use-study-rows";

export type GoodEvaluation = Extract<Evaluation, { ok: true }>;

/**
 * The core's results for the study as typed, in the browser. While a field is wrong the last evaluation that
 * worked stays on screen (`shown`), with the inputs it was made from (`shownInputs`) so the page can name them.
 */
export function useStudyEvaluation(values: StudyFormValues, inputs: StudyInputs | null) {
  const rows = useStudyRows(values.caseId, values.kitIds, values.rigId);
  const settings = useShopSettings();
  const shopLimits = useMemo(() => (settings.data ? shopOwnLimits(settings.data.settings) : null), [settings.data]);

  const [lastGood, setLastGood] = useState<{ evaluation: GoodEvaluation; inputs: StudyInputs } | null>(null);
  const evaluation = useMemo<Evaluation | null>(() => {
    if (!inputs || !rows.caseRow || rows.loading || rows.kitRows.length !== values.kitIds.length) return null;
    return evaluateInBrowser({ name: inputs.name, caseRow: rows.caseRow, kitRows: rows.kitRows, rigRow: rows.rigRow, inputs, shopLimits });
  }, [inputs, rows.caseRow, rows.kitRows, rows.rigRow, rows.loading, values.kitIds.length, shopLimits]);
  if (evaluation?.ok && inputs && evaluation !== lastGood?.evaluation) setLastGood({ evaluation, inputs });
  const shown = evaluation?.ok ? evaluation : (lastGood?.evaluation ?? null);
  const shownInputs = evaluation?.ok ? inputs : (lastGood?.inputs ?? null);
  // Results on screen that are not those of the fields as they read now.
  const stale = !evaluation?.ok && Boolean(lastGood);
  return { rows, shopLimits, evaluation, shown, shownInputs, stale };
}
