"use client";

import type { LengthUnits } from "@/geometry";
import { useMemo, type RefObject } from "react";
import { useFormContext, useWatch } from "react-hook-form";
import { parseLengthText } from "@/model/units";
import type { StudText } from "@/app/_ui/form/text-values";
import { studsText } from "@/app/_ui/form/read-shapes";
import { CaptureSources } from "./capture-sources";
import { HistoryBar } from "./history-bar";
import { MEASURES } from "./measure-panel";
import { PlanEditor, type ShapeWords } from "./plan-editor";
import type { ShapeStore } from "./shape-store";
import { StorePocketsField } from "./store-lists";
import { StoreOutlineField } from "./store-outline-field";

const WORDS: ShapeWords = { deck: "gasket", mouth: "bore", pocket: "port" };
const FIXED = ["mouth"];

/**
 * The kit's base gasket at the deck, in the case's frame (origin on the cylinder axis): its outline,
 * optional, and its transfer-port windows, entered, drawn and edited as a case's passages are. The
 * bore and the kit's studs are drawn from their own fields.
 */
export function GasketSection({ store, units, scope, onCommit }: { store: ShapeStore; units: LengthUnits; scope: RefObject<HTMLElement | null>; onCommit: () => void }) {
  const { control, setValue } = useFormContext();
  const bore = useWatch({ control, name: "boreMm" }) as string | undefined;
  const studs = useWatch({ control, name: "studs" }) as StudText[] | undefined;
  const key = `${bore ?? ""}#${JSON.stringify(studs ?? [])}#${units}`;
  const extras = useMemo(() => {
    const r = parseLengthText(bore, units);
    return { mouthDiameterMm: r.ok && r.value ? r.value : null, studHoleDiameterMm: null, studs: studs ?? [] };
    // The texts, not the arrays' identities, decide when the drawing's inputs change.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [key]);
  return (
    <section className="card p-5" aria-label="Base gasket outline and port windows">
      <h2 className="mb-1 text-base font-semibold text-ink">Base gasket outline and port windows</h2>
      <p className="mb-4 text-sm text-ink-2">Trace or enter the gasket that comes with the kit, placed as it sits on the case (origin on the cylinder axis, x right, y to the front). A study then lays its port windows over the case&apos;s transfer passages.</p>
      <div className="grid gap-6 xl:grid-cols-2">
        <div className="flex min-w-0 flex-col gap-4">
          <StoreOutlineField store={store} shapeKey="deck" path="baseGasket.outline" label="Gasket outline (optional)" what="gasket outline" measures={MEASURES.deck} mirror="flip" />
          <StorePocketsField store={store} word="port" withDepth={false} pathBase="baseGasket.ports" />
        </div>
        <div className="flex min-w-0 flex-col gap-3">
          <div className="flex flex-wrap items-center justify-between gap-2">
            <h3 className="text-sm font-semibold">Gasket at the deck</h3>
            <HistoryBar store={store} scope={scope} onChange={onCommit} />
          </div>
          <PlanEditor store={store} extras={extras} words={WORDS} title="Base gasket at the deck, as entered" fixedCircles={FIXED} fixedStuds onCommit={onCommit} />
          <CaptureSources
            units={units}
            kit
            onApply={(s) => {
              store.getState().act.apply({ deck: s.deck, ports: s.ports ?? s.pockets }, "port");
              // The kit's studs are its own field: a traced or imported stud pattern fills it.
              if (s.studs?.length) setValue("studs", studsText(s.studs, units), { shouldDirty: true, shouldValidate: true });
            }}
          />
        </div>
      </div>
    </section>
  );
}
