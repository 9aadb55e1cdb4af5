"use client";

import type { LengthUnits } from "@/geometry";
import { useCallback, useMemo, useState } from "react";
import { FormProvider } from "react-hook-form";
import type { StudyDetail } from "../../../../_ui/query/types";
import { LineupView } from "./lineup-view";
import { PlanTab } from "./plan-tab";
import { StudyHeader } from "./study-header";
import { StudyNotices } from "./study-notices";
import { StudyTabs, type StudyTab } from "./study-tabs";
import { useStudyEvaluation } from "./use-study-evaluation";
import { useStudyForm } from "./use-study-form";

const NO_LIMITS: Record<string, unknown> = {};

/** The study page's data side: inputs, live results from the core, background saving, lineup and history. */
export function StudyWorkspace({ detail, initialUnits, onReloaded }: { detail: StudyDetail; initialUnits: LengthUnits; onReloaded: () => void }) {
  const units = initialUnits;
  const [tab, setTab] = useState<StudyTab>("plan");
  const { form, values, inputs, save } = useStudyForm(detail, units);
  const { rows, shopLimits, evaluation, shown, shownInputs, stale } = useStudyEvaluation(values, inputs);
  const choose = useCallback((kitId: string) => form.setValue("chosenKitId", kitId, { shouldDirty: true }), [form]);

  // Kept while their rows are the same, so a render of the form passes the plan's parts the same props (see PlanTab).
  const kitNames = useMemo(() => Object.fromEntries([...rows.kitRows.map((k) => [k.id, k.name]), ...(rows.caseRow ? [[rows.caseRow.id, rows.caseRow.name]] : [])]), [rows.kitRows, rows.caseRow]);
  // The library's prices (money with their currency), for the lineup and the kit switcher (display only).
  const prices = useMemo(() => Object.fromEntries(rows.kitRows.map((k) => [k.id, k.data.price])), [rows.kitRows]);
  const studs = useMemo(() => rows.caseRow?.data.studs.map((s) => s.label) ?? [], [rows.caseRow]);

  return (
    <FormProvider {...form}>
      <form onSubmit={(e) => e.preventDefault()} noValidate className="flex flex-col gap-5" aria-label="Study">
        <StudyHeader studyId={detail.item.id} caseName={rows.caseRow?.name ?? null} archived={Boolean(detail.item.archivedAt)} save={save} />
        <StudyNotices save={save} onReloaded={onReloaded} failed={rows.failed} evaluation={evaluation} stale={stale} basis={shownInputs} values={values} units={units} />
        <StudyTabs tab={tab} onTab={setTab} />
        {tab === "plan" ? (
          <PlanTab prices={prices} studyId={detail.item.id} shown={shown} values={values} units={units} kitNames={kitNames} studs={studs} shopLimits={shopLimits ?? NO_LIMITS} loading={rows.loading} />
        ) : (
          <LineupView shown={shown} units={units} prices={prices} chosen={values.chosenKitId} onChoose={choose} mouthRow={rows.caseRow} />
        )}
      </form>
    </FormProvider>
  );
}
