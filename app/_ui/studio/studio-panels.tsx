"use client";

import { useDeferredValue } from "react";
import type { Money } from "@/model/money";
import type { LengthUnits } from "@/model/units";
import type { FitStore } from "@/scene/store";
import { BenchDetails } from "./bench-details";
import { CutCard } from "./cut-card";
import { Drawings } from "./drawings";
import { Legend } from "./legend";
import { KitSwitcher } from "./lineup";
import { ResultsPanel } from "./results-panel";
import { useFit } from "./use-fit";
import { type CutDraft, useSettled } from "./use-live-fit";

// The studio's panels, each reading its own slice of the live fit. The cut card follows every step at
// once; the figures beside the view may lag a drag by a render (deferred); the drawings wait until it settles.

/** The results of the kit on show, the kit switcher and the colour key. */
export function LivePanels(props: {
  store: FitStore;
  mouthDiameterMm: number | null;
  large: boolean;
  multipleKits: boolean;
  chosenKitId?: string;
  units: LengthUnits;
  onPick: (kitIndex: number) => void;
  prices?: Readonly<Record<string, Money | undefined>>;
}) {
  const { store, mouthDiameterMm, large, multipleKits, chosenKitId, units, onPick, prices } = props;
  // The kit pickers follow the store itself, or a clicked radio would spring back until the deferred render lands.
  const kitIndex = useFit(store, (s) => s.kitIndex);
  const live = useDeferredValue(useFit(store, (s) => ({ study: s.study, result: s.result, kitIndex: s.kitIndex })));
  const key = useFit(store, (s) => ({
    minClearanceMm: s.result.limits.values.minRadialClearanceMm,
    minWallMm: s.result.limits.values.minWallMm,
    ports: s.result.kits.some((k) => k.ports.length > 0),
  }));
  return (
    <>
      <ResultsPanel result={live.result} kitIndex={live.kitIndex} mouthDiameterMm={mouthDiameterMm} units={units} large={large} />
      {multipleKits && <KitSwitcher study={live.study} result={live.result} kitIndex={kitIndex} chosenKitId={chosenKitId} units={units} onPick={onPick} prices={prices} />}
      <Legend {...key} units={units} large={large} />
    </>
  );
}

/** The cut sliders, at the cut on show. */
export function LiveCutCard({ store, units, onChange }: { store: FitStore; units: LengthUnits; onChange: (patch: CutDraft, final: boolean, at?: number) => void }) {
  const { study, result, kitIndex } = useFit(store, (s) => ({ study: s.study, result: s.result, kitIndex: s.kitIndex }));
  const following = study.cut?.diameterMm === undefined && study.cut?.depthMm === undefined;
  return <CutCard study={study} result={result} kit={result.kits[kitIndex]} units={units} following={following} onChange={onChange} />;
}

/** The walls, the rig set-up and the alignment of the kit on show. */
export function LiveBenchDetails({ store, units }: { store: FitStore; units: LengthUnits }) {
  const live = useDeferredValue(useFit(store, (s) => ({ result: s.result, kitIndex: s.kitIndex })));
  return <BenchDetails kit={live.result.kits[live.kitIndex]} result={live.result} units={units} />;
}

/** The plan and the section of the kit on show, once the cut has settled. */
export function SettledDrawings({ store, units }: { store: FitStore; units: LengthUnits }) {
  const settled = useSettled(useDeferredValue(useFit(store, (s) => ({ study: s.study, result: s.result, kitIndex: s.kitIndex }))));
  return <Drawings study={settled.study} result={settled.result} kitIndex={settled.kitIndex} units={units} />;
}
