"use client";

import type { LengthUnits } from "@/geometry";
import { useCallback, useMemo, useState } from "react";
import { FormProvider, useForm, useWatch } from "react-hook-form";
import { FormNotice } from "../../../../_ui/field";
import { errorText } from "../../../../_ui/query/fetch";
import { exportStudyUrl } from "../../../../_ui/query/studies/fetchers";
import { useShopSettings } from "../../../../_ui/query/settings/use-shop-settings";
import type { StudyDetail } from "../../../../_ui/query/types";
import { coreResolver, type FormContext } from "@/app/_ui/form/core-resolver";
import { errorAt } from "@/app/_ui/form/field-error";
import { UnitToggle } from "@/app/_ui/form/unit-toggle";
import { convertLengthTexts, type UnitSwitchMemory } from "@/app/_ui/form/units-text";
import { evaluateInBrowser, type Evaluation } from "./assemble";
import { ConflictBanner } from "./conflict-banner";
import { CutPanel } from "./cut-panel";
import { HistoryPanel } from "./history-panel";
import { LimitsPanel } from "./limits-panel";
import { LineupView } from "./lineup-view";
import { ReadingsPanel } from "./readings-panel";
import { ResultsView } from "./results-view";
import { SaveStatusBadge } from "./save-status";
import { SelectionPanel } from "./selection-panel";
import { studyBody } from "./study-body";
import { StudioSlot } from "./studio-slot";
import { StudyInputsSchema, studyDefaults, studyToCore, type StudyFormValues, type StudyInputs } from "./study-values";
import { useAutosave } from "./use-autosave";
import { readStudyInputs, useStudyInputs } from "./use-study-inputs";
import { useStudyRows } from "./use-study-rows";
import { shopOwnLimits } from "@/model/study-assembly";

type Tab = "plan" | "lineup";

/** The study's inputs read from its texts turned into mm (the unit switches' memory gives back what was typed in mm). */
function inputsInMm(values: StudyFormValues, units: LengthUnits, memory: UnitSwitchMemory): StudyInputs | null {
  return readStudyInputs(units === "mm" ? values : convertLengthTexts(values, units, "mm", new Map(memory)), "mm");
}

/** The study page's data side: inputs, live results from the core, background saving, lineup and history. */
export function StudyWorkspace({ detail, initialUnits, onReloaded }: { detail: StudyDetail; initialUnits: LengthUnits; onReloaded: () => void }) {
  const item = detail.item;
  const [units, setUnitsState] = useState<LengthUnits>(initialUnits);
  const [tab, setTab] = useState<Tab>("plan");
  const [resolver] = useState(() => coreResolver<StudyFormValues, typeof StudyInputsSchema>(StudyInputsSchema, studyToCore));
  // Remembers the texts each unit switch replaced, so that switching back restores them as typed.
  const [unitMemory] = useState<UnitSwitchMemory>(() => new Map());
  const [defaults] = useState(() => convertLengthTexts(studyDefaults(item, "mm"), "mm", initialUnits, unitMemory));
  const form = useForm<StudyFormValues, FormContext, StudyInputs>({ mode: "onChange", defaultValues: defaults, resolver, context: { units } });
  const values = useWatch({ control: form.control }) as StudyFormValues;
  const inputs = useStudyInputs(values, units);

  const rows = useStudyRows(values.caseId, values.kitIds, values.rigId);
  const settings = useShopSettings();
  const shopLimits = useMemo(() => (settings.data ? shopOwnLimits(settings.data.settings) : null), [settings.data]);

  // The last evaluation that worked stays on screen while a field is being fixed.
  const [lastGood, setLastGood] = useState<Extract<Evaluation, { ok: true }> | null>(null);
  const evaluation = useMemo<Evaluation | null>(() => {
    if (!inputs || !rows.caseRow || rows.loading || rows.kitRows.length !== values.kitIds.length) return null;
    return evaluateInBrowser({ name: inputs.name, caseRow: rows.caseRow, kitRows: rows.kitRows, rigRow: rows.rigRow, inputs, shopLimits });
  }, [inputs, rows.caseRow, rows.kitRows, rows.rigRow, rows.loading, values.kitIds.length, shopLimits]);
  if (evaluation?.ok && evaluation !== lastGood) setLastGood(evaluation);
  const shown = evaluation?.ok ? evaluation : lastGood;
  const stale = !evaluation?.ok && Boolean(lastGood);

  const sel = { caseId: values.caseId, kitIds: values.kitIds, rigId: values.rigId, chosenKitId: values.chosenKitId };
  // What is saved is read from the texts as millimetres, so a switch of units alone saves nothing.
  const savedInputs = inputsInMm(values, units, unitMemory);
  const body = studyBody(savedInputs, sel);
  const [initialBody] = useState(() => studyBody(inputsInMm(defaults, initialUnits, unitMemory), defaults) ?? "");
  const save = useAutosave(item.id, item.version, initialBody, body);

  const setUnits = (next: LengthUnits) => {
    const v = form.getValues();
    setUnitsState(next);
    form.reset(convertLengthTexts(v, units, next, unitMemory), { keepDefaultValues: true, keepDirty: true });
    setTimeout(() => void form.trigger(), 0);
  };
  const choose = useCallback((kitId: string) => form.setValue("chosenKitId", kitId, { shouldDirty: true }), [form]);

  const kitNames = Object.fromEntries([...rows.kitRows.map((k) => [k.id, k.name]), ...(rows.caseRow ? [[rows.caseRow.id, rows.caseRow.name]] : [])]);
  const prices = Object.fromEntries(rows.kitRows.map((k) => [k.id, k.data.price]));
  const studs = rows.caseRow?.data.studs.map((s) => s.label) ?? [];

  return (
    <FormProvider {...form}>
      <form onSubmit={(e) => e.preventDefault()} noValidate className="flex flex-col gap-5" aria-label="Study">
        <header className="flex flex-wrap items-start justify-between gap-3">
          <div className="min-w-72 flex-1">
            <label htmlFor="study-name" className="sr-only">
              Study name
            </label>
            <input id="study-name" className="w-full rounded-md border border-transparent bg-transparent px-1 text-2xl font-semibold hover:border-rule focus:border-accent" {...form.register("name")} />
            {errorAt(form.formState.errors, "name") ? <p className="field-error">{errorAt(form.formState.errors, "name")}</p> : null}
            <p className="px-1 text-sm text-ink-2">
              {rows.caseRow ? rows.caseRow.name : "…"} · {values.kitIds.length} kit{values.kitIds.length === 1 ? "" : "s"}
              {item.archivedAt ? " · archived" : ""}
            </p>
          </div>
          <div className="flex flex-wrap items-center gap-3">
            <SaveStatusBadge status={save.status} savedAt={save.savedAt} />
            {save.status === "error" ? (
              <button type="button" className="btn-quiet" onClick={save.saveNow}>
                Save now
              </button>
            ) : null}
            <UnitToggle units={units} onChange={setUnits} />
            <a className="btn-quiet no-underline" href={exportStudyUrl(item.id)} download>
              Export study file
            </a>
          </div>
        </header>
        {save.status === "conflict" ? (
          <ConflictBanner
            message={save.message ?? ""}
            onOverwrite={save.overwrite}
            onReload={async () => {
              await save.reloadTheirs();
              onReloaded();
            }}
          />
        ) : null}
        {save.status === "error" && save.message ? <FormNotice tone="error">{save.message}</FormNotice> : null}
        {rows.failed ? <FormNotice tone="error">Part of the study could not be loaded: {errorText(rows.failed)}</FormNotice> : null}

        <div role="tablist" aria-label="Study views" className="flex gap-1 border-b border-rule">
          {(
            [
              ["plan", "Plan and results"],
              ["lineup", "Lineup"],
            ] as const
          ).map(([t, label]) => (
            <button
              key={t}
              type="button"
              role="tab"
              aria-selected={tab === t}
              onClick={() => setTab(t)}
              className={`-mb-px rounded-t-md border px-4 py-2 text-sm ${tab === t ? "border-rule border-b-paper bg-paper font-semibold" : "border-transparent text-ink-2 hover:text-ink"}`}
            >
              {label}
            </button>
          ))}
        </div>

        {evaluation && !evaluation.ok ? (
          <FormNotice tone="error">
            The study cannot be evaluated as it stands:{" "}
            {evaluation.issues
              .slice(0, 4)
              .map((i) => `${i.path ? `${i.path}: ` : ""}${i.message}`)
              .join("; ")}
            . Fix it in the library or here; nothing is lost.
          </FormNotice>
        ) : null}
        {stale && !evaluation ? (
          <p className="text-sm text-tight" role="status">
            Results below are for the last valid inputs; fix the marked fields to update them.
          </p>
        ) : null}

        {tab === "plan" && shown ? (
          <StudioSlot study={shown.study} result={shown.result} kitId={values.chosenKitId || null} units={units} />
        ) : null}
        {tab === "plan" ? (
          <div className="grid gap-5 lg:grid-cols-[minmax(0,24rem)_minmax(0,1fr)]">
            <div className="flex flex-col gap-4">
              <SelectionPanel kitNames={kitNames} />
              <CutPanel units={units} cut={shown?.result.kits.find((k) => k.kitId === (values.chosenKitId || values.kitIds[0]))?.cut ?? null} />
              <ReadingsPanel units={units} studs={studs} />
              <LimitsPanel units={units} shopLimits={shopLimits ?? {}} />
              <section className="card p-4" aria-label="Notes">
                <label htmlFor="study-notes" className="font-semibold">
                  Notes
                </label>
                <textarea id="study-notes" rows={3} className="field-input" {...form.register("notes")} />
              </section>
              <HistoryPanel id={item.id} />
            </div>
            <ResultsView shown={shown} units={units} chosen={values.chosenKitId} loading={rows.loading} />
          </div>
        ) : (
          <LineupView shown={shown} units={units} prices={prices} chosen={values.chosenKitId} onChoose={choose} mouthRow={rows.caseRow} />
        )}
      </form>
    </FormProvider>
  );
}
