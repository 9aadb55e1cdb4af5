"use client";

import type { Money } from "@/model/money";
import { useCallback, useDeferredValue, useMemo, useRef, useState } from "react";
import type { Study, StudyResult } from "@/geometry";
import type { FitCanvasApi } from "@/scene/three/fit-canvas";
import { drawnKey } from "@/scene/three/drawn-key";
import type { ViewState } from "@/scene/three/view";
import { BenchDetails } from "./bench-details";
import { Cautions } from "./cautions";
import { CutCard } from "./cut-card";
import { Drawings } from "./drawings";
import { download, slug } from "./download";
import { FitView } from "./fit-view";
import { Legend } from "./legend";
import { KitSwitcher, SmallMultiples } from "./lineup";
import { ResultsPanel } from "./results-panel";
import { type CompareMode, Toolbar } from "./toolbar";
import { type CutDraft, useLiveFit, useSettled } from "./use-live-fit";

export interface StudioProps {
  readonly study: Study;
  readonly result: StudyResult;
  readonly units: "mm" | "in";
  /** Called while a cut slider moves (final = false) and once when the drag ends or a value is typed (final = true). */
  readonly onCutChange?: (cut: CutDraft, final: boolean) => void;
  /** Large type and no editing controls, for showing the fit to a customer. */
  readonly customerMode?: boolean;
  /** The kit marked as the choice, highlighted in the lineup. */
  readonly chosenKitId?: string;
  /** Customer mode with no way out: no bench-view toggle and so never the cut controls (the consult page). */
  readonly lockCustomerMode?: boolean;
  /** The library's kit prices by kit id, for the kit switcher (display only). */
  readonly kitPrices?: Readonly<Record<string, Money | undefined>>;
}

/** The fit studio: the 3D view, the results in words, the cut controls with the walls, rig set-up and tilt they give, the kit lineup and the drawings. */
export function Studio({ study, result, units, onCutChange, customerMode = false, chosenKitId, lockCustomerMode = false, kitPrices }: StudioProps) {
  const initialKit = Math.max(0, result.kits.findIndex((k) => k.kitId === chosenKitId));
  const { store, snap, setCut, setKit, settle } = useLiveFit(study, result, initialKit);
  // The panels may lag behind a drag (deferred); the kit pickers follow `snap` itself, or a clicked radio would
  // spring back until the deferred render lands.
  const live = useDeferredValue(snap);
  const settled = useSettled(live);
  const [customerChosen, setCustomer] = useState(customerMode);
  const customer = lockCustomerMode || customerChosen;
  const [compare, setCompare] = useState<CompareMode>("one");
  const [view, setView] = useState<Omit<ViewState, "customer" | "units" | "overlay">>({
    section: true,
    sectionAngleDeg: 0,
    camera: "three-quarter",
    cameraNonce: 0,
    exaggeration: 1,
  });
  const fullView: ViewState = useMemo(() => ({ ...view, customer, units, overlay: compare === "overlay" }), [view, customer, units, compare]);
  const api = useRef<FitCanvasApi | null>(null);
  const onReady = useCallback((a: FitCanvasApi) => {
    api.current = a;
  }, []);

  // A change starts from the cut on show (the study's, or the last one set here), so a new study from the page is followed.
  const change = useCallback(
    (patch: CutDraft, final: boolean, at?: number) => {
      const cur = store.get().study.cut;
      const next = { diameterMm: cur?.diameterMm, depthMm: cur?.depthMm, ...patch };
      // A drag's end repeats the last live value: save it without evaluating it again.
      const same = next.diameterMm === cur?.diameterMm && next.depthMm === cur?.depthMm;
      if (!(final && same)) setCut(next, at, final);
      else settle();
      onCutChange?.(next, final);
    },
    [store, setCut, settle, onCutChange],
  );

  const k = snap.result.kits[snap.kitIndex];
  const following = snap.study.cut?.diameterMm === undefined && snap.study.cut?.depthMm === undefined;
  const multi = study.kits.length > 1;
  const mouth = study.case.mouth.outline;
  const mouthDiameterMm = mouth.kind === "circle" ? mouth.diameterMm : null;
  const snapshot = () => {
    const url = api.current?.snapshot();
    if (url) download(`${slug(`${study.name ?? "study"}-${k.name}`)}-fit.png`, url);
  };

  return (
    <div className="flex flex-col gap-4" data-testid="studio" data-customer={customer || undefined}>
      <div className="flex flex-wrap items-center justify-between gap-3">
        <p className="text-sm text-ink-2">
          {study.case.name} · {study.kits.length} {study.kits.length === 1 ? "kit" : "kits"}
        </p>
        {!lockCustomerMode && (
          <button type="button" className={customer ? "btn" : "btn-quiet"} aria-pressed={customer} onClick={() => setCustomer((c) => !c)} data-testid="customer-toggle">
            {customer ? "Back to the bench view" : "Show the customer"}
          </button>
        )}
      </div>
      <div className="grid items-start gap-4 lg:grid-cols-[minmax(0,1fr)_28rem] lg:grid-rows-[auto_1fr]">
        <div className="flex min-w-0 flex-col gap-3 lg:col-start-1 lg:row-start-1">
          <Toolbar view={fullView} compare={compare} customer={customer} onView={(v) => setView((s) => ({ ...s, ...v }))} onCompare={setCompare} onSnapshot={snapshot} multipleKits={multi} portWindows={(study.kits[snap.kitIndex]?.baseGasket?.ports.length ?? 0) > 0} />
          <div
            className="card relative aspect-[4/3] max-h-[72vh] w-full overflow-hidden bg-paper-2"
            role="img"
            aria-label={`3D view of ${k.name} in ${study.case.name}; the fit results beside it give every figure in words`}
            data-testid="view"
            data-camera={view.camera}
            data-section={view.section ? String(view.sectionAngleDeg) : "off"}
            data-wanted={drawnKey(fullView, snap.kitIndex, snap.study.cut)}
          >
            <div className={compare === "side" ? "hidden" : "h-full w-full"}>
              <FitView store={store} view={fullView} onReady={onReady} />
            </div>
            {compare === "side" && <SmallMultiples study={settled.study} result={settled.result} kitIndex={snap.kitIndex} chosenKitId={chosenKitId} units={units} onPick={setKit} prices={kitPrices} />}
          </div>
        </div>
        <aside className="flex min-w-0 flex-col gap-3 lg:col-start-2 lg:row-span-2 lg:row-start-1">
          <ResultsPanel result={live.result} kitIndex={live.kitIndex} mouthDiameterMm={mouthDiameterMm} units={units} large={customer} />
          {multi && <KitSwitcher study={live.study} result={live.result} kitIndex={snap.kitIndex} chosenKitId={chosenKitId} units={units} onPick={setKit} prices={kitPrices} />}
          <Legend result={live.result} units={units} large={customer} />
        </aside>
        {/* On a phone the results come right under the view, before the cut and the bench figures. */}
        {!customer && (
          <div className="flex min-w-0 flex-col gap-3 lg:col-start-1 lg:row-start-2">
            <CutCard study={snap.study} result={snap.result} kit={k} units={units} following={following} onChange={change} />
            <BenchDetails kit={live.result.kits[live.kitIndex]} result={live.result} units={units} />
          </div>
        )}
      </div>
      {!customer && <Cautions />}
      <Drawings study={settled.study} result={settled.result} kitIndex={settled.kitIndex} units={units} />
    </div>
  );
}
