"use client";

import { useFormContext } from "react-hook-form";
import type { LengthUnits } from "@/model/units";
import { CutPanel } from "./cut-panel";
import { HistoryPanel } from "./history-panel";
import { LimitsPanel } from "./limits-panel";
import { ReadingsPanel } from "./readings-panel";
import { ResultsView } from "./results-view";
import { SelectionPanel } from "./selection-panel";
import { StudioSlot } from "./studio-slot";
import type { StudyFormValues } from "./study-values";
import type { GoodEvaluation } from "./use-study-evaluation";

type Props = {
  studyId: string;
  shown: GoodEvaluation | null;
  values: StudyFormValues;
  units: LengthUnits;
  kitNames: Record<string, string>;
  studs: string[];
  shopLimits: Record<string, unknown>;
  loading: boolean;
};

/** The plan: the fit studio across the page, then the inputs beside everything the core says about the kit. */
export function PlanTab({ studyId, shown, values, units, kitNames, studs, shopLimits, loading }: Props) {
  const form = useFormContext<StudyFormValues>();
  const shownKit = shown?.result.kits.find((k) => k.kitId === (values.chosenKitId || values.kitIds[0])) ?? null;
  return (
    <>
      {shown ? <StudioSlot study={shown.study} result={shown.result} kitId={values.chosenKitId || null} units={units} /> : null}
      <div className="grid gap-5 lg:grid-cols-[minmax(0,24rem)_minmax(0,1fr)]">
        <div className="flex min-w-0 flex-col gap-4">
          <SelectionPanel kitNames={kitNames} />
          <CutPanel units={units} kit={shownKit} />
          <ReadingsPanel units={units} studs={studs} />
          <LimitsPanel units={units} shopLimits={shopLimits} />
          <section className="card p-4" aria-label="Notes">
            <label htmlFor="study-notes" className="font-semibold">
              Notes
            </label>
            <textarea id="study-notes" rows={3} className="field-input" {...form.register("notes")} />
          </section>
          <HistoryPanel id={studyId} />
        </div>
        <ResultsView shown={shown} units={units} chosen={values.chosenKitId} loading={loading} />
      </div>
    </>
  );
}
