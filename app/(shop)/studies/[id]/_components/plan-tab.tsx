"use client";

import type { Money } from "@/model/money";
import { memo } from "react";
import { useFormContext } from "react-hook-form";
import type { KitResult } from "@/geometry";
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

// The studio and each column are memoised on their props: the form renders its host again as soon as it has
// mounted (a layout effect of the form library) and on every change of its state, and the studio need not follow
// when nothing it shows has changed; the panels that read the form still follow its context.

const StudioPart = memo(StudioSlot);

const InputsColumn = memo(function InputsColumn({ kitNames, units, kit, studs }: { kitNames: Record<string, string>; units: LengthUnits; kit: KitResult | null; studs: string[] }) {
  return (
    <div className={`flex min-w-0 flex-col gap-4 ${OFF_SCREEN_FIRST}`}>
      <SelectionPanel kitNames={kitNames} />
      <CutPanel units={units} kit={kit} />
      <ReadingsPanel units={units} studs={studs} />
    </div>
  );
});

const LimitsColumn = memo(function LimitsColumn({ studyId, units, shopLimits }: { studyId: string; units: LengthUnits; shopLimits: Record<string, unknown> }) {
  return (
    <div className={`flex min-w-0 flex-col gap-4 ${OFF_SCREEN_FIRST}`}>
      <LimitsPanel units={units} shopLimits={shopLimits} />
      <NotesPanel />
      <HistoryPanel id={studyId} />
    </div>
  );
});

function NotesPanel() {
  const form = useFormContext<StudyFormValues>();
  return (
    <section className="card p-4" aria-label="Notes">
      <label htmlFor="study-notes" className="font-semibold">
        Notes
      </label>
      <textarea id="study-notes" rows={3} className="field-input" defaultValue={form.getValues("notes")} {...form.register("notes")} />
    </section>
  );
}

/**
 * The plan: the fit studio across the page (the view, the results beside it, the cut and what it gives at the
 * bench), then the inputs that drive it. Each result is shown once, in the studio.
 */
export function PlanTab({ studyId, shown, values, units, kitNames, studs, shopLimits, loading, prices }: Props) {
  const shownKit = shown?.result.kits.find((k) => k.kitId === (values.chosenKitId || values.kitIds[0])) ?? null;
  return (
    <>
      {shown ? (
        <StudioPart study={shown.study} result={shown.result} kitId={values.chosenKitId || null} units={units} prices={prices} />
      ) : (
        <p className="text-ink-2">{loading ? "Loading the case and kits…" : "Results appear once the inputs are complete."}</p>
      )}
      <div className="grid items-start gap-5 lg:grid-cols-2">
        <InputsColumn kitNames={kitNames} units={units} kit={shownKit} studs={studs} />
        <LimitsColumn studyId={studyId} units={units} shopLimits={shopLimits} />
      </div>
    </>
  );
}
