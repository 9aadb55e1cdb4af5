"use client";

import type { LengthUnits } from "@/geometry";
import { useMemo, useState, type RefObject } from "react";
import { useFormContext, useWatch } from "react-hook-form";
import { parseLengthText } from "@/model/units";
import { CaptureSources } from "./capture-sources";
import { CaseTrial } from "./case-trial";
import { HistoryBar } from "./history-bar";
import { PlanEditor, type ShapeWords } from "./plan-editor";
import type { ShapeStore } from "./shape-store";

const WORDS: ShapeWords = { deck: "deck", mouth: "mouth", pocket: "passage" };
const FIXED = ["mouth"];

const mm = (t: string | undefined, units: LengthUnits) => {
  const r = parseLengthText(t, units);
  return r.ok && r.value !== undefined && r.value > 0 ? r.value : null;
};

/** The case's plan at the deck beside its fields, with undo and redo; the mouth's diameter is the smallest reading. */
export function CasePlan({ store, units, scope, onCommit, caseId }: { store: ShapeStore; units: LengthUnits; scope: RefObject<HTMLElement | null>; onCommit: () => void; caseId: string | null }) {
  const { control } = useFormContext();
  const readings = useWatch({ control, name: "mouthReadingsMm" }) as string[] | undefined;
  const hole = useWatch({ control, name: "studHoleDiameterMm" }) as string | undefined;
  const [shown, setShown] = useState(true);
  const key = `${(readings ?? []).join("|")}#${hole ?? ""}#${units}`;
  const extras = useMemo(() => {
    const values = (readings ?? []).map((t) => mm(t, units)).filter((v): v is number => v !== null);
    return { mouthDiameterMm: values.length ? Math.min(...values) : null, studHoleDiameterMm: mm(hole, units) };
    // The texts, not the arrays' identities, decide when the drawing's inputs change.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [key]);
  return (
    <div className="sticky top-4 flex flex-col gap-4">
      <section className="card flex flex-col gap-3 p-4" aria-label="Plan at the deck">
        <div className="flex flex-wrap items-center justify-between gap-2">
          <h2 className="text-base font-semibold">Plan at the deck</h2>
          <div className="flex items-center gap-2">
            <HistoryBar store={store} scope={scope} onChange={onCommit} />
            <button type="button" className="btn-quiet" aria-pressed={!shown} onClick={() => setShown(!shown)}>
              {shown ? "Hide the plan" : "Show the plan"}
            </button>
          </div>
        </div>
        {shown ? <PlanEditor store={store} extras={extras} words={WORDS} title="Plan at the deck, as entered" fixedCircles={FIXED} onCommit={onCommit} /> : null}
      </section>
      <CaseTrial store={store} />
      <CaptureSources units={units} caseId={caseId} onApply={(s) => store.getState().act.apply(s, "passage")} />
    </div>
  );
}
