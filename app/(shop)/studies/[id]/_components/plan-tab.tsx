"use client";

import type { Money } from "@/model/money";
import { Suspense } from "react";
import { useFormContext } from "react-hook-form";
import type { LengthUnits } from "@/model/units";
import { CutPanel } from "./cut-panel";
import { HistoryPanel } from "./history-panel";
import { LimitsPanel } from "./limits-panel";
import { ReadingsPanel } from "./readings-panel";
import { SelectionPanel } from "./selection-panel";
import { StudioSlot } from "./studio-slot";
import type { StudyFormValues } from "./study-values";
import type { GoodEvaluation } from "./use-study-evaluation";

/**
 * The inputs' columns, below the studio: the browser lays them out only once they come near the screen (room
 * kept at their last size, 60rem until first drawn); the clip margin keeps focus rings whole.
 */
const OFF_SCREEN_FIRST = "[content-visibility:auto] [contain-intrinsic-size:auto_60rem] [overflow-clip-margin:0.5rem]";

type Props = {
  studyId: string;
  shown: GoodEvaluation | null;
  values: StudyFormValues;
  units: LengthUnits;
  kitNames: Record<string, string>;
  /** The library's kit prices, shown beside each kit in the studio's switcher. */
  prices?: Readonly<Record<string, Money | undefined>>;
  studs: string[];
  shopLimits: Record<string, unknown>;
  loading: boolean;
};

/**
 * The plan: the fit studio across the page (the view, the results beside it, the cut and what it gives at the
 * bench), then the inputs that drive it. Each result is shown once, in the studio.
 * The studio and each column are their own boundaries, so React brings them to life one after the other in
 * short steps (the code is all in the page's bundle; nothing waits on the network), and a click on a part not
 * yet alive is replayed once that part is.
 */
export function PlanTab({ studyId, shown, values, units, kitNames, studs, shopLimits, loading, prices }: Props) {
  const form = useFormContext<StudyFormValues>();
  const shownKit = shown?.result.kits.find((k) => k.kitId === (values.chosenKitId || values.kitIds[0])) ?? null;
  return (
    <>
      {shown ? (
        <Suspense>
          <StudioSlot study={shown.study} result={shown.result} kitId={values.chosenKitId || null} units={units} prices={prices} />
        </Suspense>
      ) : (
        <p className="text-ink-2">{loading ? "Loading the case and kits…" : "Results appear once the inputs are complete."}</p>
      )}
      <div className="grid items-start gap-5 lg:grid-cols-2">
        <div className={`flex min-w-0 flex-col gap-4 ${OFF_SCREEN_FIRST}`}>
          <Suspense>
            <SelectionPanel kitNames={kitNames} />
            <CutPanel units={units} kit={shownKit} />
            <ReadingsPanel units={units} studs={studs} />
          </Suspense>
        </div>
        <div className={`flex min-w-0 flex-col gap-4 ${OFF_SCREEN_FIRST}`}>
          <Suspense>
            <LimitsPanel units={units} shopLimits={shopLimits} />
            <section className="card p-4" aria-label="Notes">
              <label htmlFor="study-notes" className="font-semibold">
                Notes
              </label>
              <textarea id="study-notes" rows={3} className="field-input" defaultValue={form.getValues("notes")} {...form.register("notes")} />
            </section>
            <HistoryPanel id={studyId} />
          </Suspense>
        </div>
      </div>
    </>
  );
}
