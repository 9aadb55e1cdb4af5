"use client";

import type { Money } from "@/model/money";
import { useCallback, useMemo, useRef, useState } from "react";
import type { Study, StudyResult } from "@/geometry";
import type { FitCanvasApi } from "@/scene/three/fit-canvas";
import type { ViewState } from "@/scene/three/view";
import { Cautions } from "./cautions";
import { download, slug } from "./download";
import { LiveBenchDetails, LiveCutCard, LivePanels, SettledDrawings } from "./studio-panels";
import { StudioView } from "./studio-view";
import { type CompareMode, Toolbar } from "./toolbar";
import { useFit } from "./use-fit";
import { type CutDraft, useLiveFit } from "./use-live-fit";

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

type ToolbarView = Omit<ViewState, "customer" | "units" | "overlay">;
/**
 * The parts below the first screen on a phone: the browser lays them out only once they come near the screen
 * (room kept at their last size, 40rem until first drawn), so the first layout of the page is the view and the results;
 * the clip margin keeps focus rings whole.
 */
const OFF_SCREEN_FIRST = "[content-visibility:auto] [contain-intrinsic-size:auto_40rem] [overflow-clip-margin:0.5rem]";
const START_VIEW: ToolbarView = { section: true, sectionAngleDeg: 0, camera: "three-quarter", cameraNonce: 0, exaggeration: 1 };

/**
 * The fit studio: the 3D view, the results in words, the cut controls with the walls, rig set-up and tilt they give, the kit lineup and the drawings.
 * It holds the view and the comparison; each part reads its own slice of the live fit, so a slider step renders only the parts it changes.
 */
export function Studio({ study, result, units, onCutChange, customerMode = false, chosenKitId, lockCustomerMode = false, kitPrices }: StudioProps) {
  const initialKit = Math.max(0, result.kits.findIndex((k) => k.kitId === chosenKitId));
  const { store, setCut, setKit, settle } = useLiveFit(study, result, initialKit);
  const kitIndex = useFit(store, (s) => s.kitIndex);
  const [customerChosen, setCustomer] = useState(customerMode);
  const customer = lockCustomerMode || customerChosen;
  const [compare, setCompare] = useState<CompareMode>("one");
  const [view, setView] = useState<ToolbarView>(START_VIEW);
  const fullView: ViewState = useMemo(() => ({ ...view, customer, units, overlay: compare === "overlay" }), [view, customer, units, compare]);
  const onView = useCallback((v: Partial<ViewState>) => setView((s) => ({ ...s, ...v })), []);
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
  const snapshot = useCallback(() => {
    const url = api.current?.snapshot();
    const s = store.get();
    if (url) download(`${slug(`${study.name ?? "study"}-${s.result.kits[s.kitIndex].name}`)}-fit.png`, url);
  }, [store, study.name]);

  const multi = study.kits.length > 1;
  const mouth = study.case.mouth.outline;
  const mouthDiameterMm = mouth.kind === "circle" ? mouth.diameterMm : null;
  const lineup = { chosenKitId, units, onPick: setKit, prices: kitPrices };

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
          <Toolbar view={fullView} compare={compare} customer={customer} onView={onView} onCompare={setCompare} onSnapshot={snapshot} multipleKits={multi} portWindows={(study.kits[kitIndex]?.baseGasket?.ports.length ?? 0) > 0} />
          <StudioView store={store} view={fullView} compare={compare} caseName={study.case.name} onReady={onReady} {...lineup} />
        </div>
        <aside className="flex min-w-0 flex-col gap-3 lg:col-start-2 lg:row-span-2 lg:row-start-1">
          <LivePanels store={store} mouthDiameterMm={mouthDiameterMm} large={customer} multipleKits={multi} {...lineup} />
        </aside>
        {/* On a phone the results come right under the view, before the cut and the bench figures. */}
        {!customer && (
          <div className={`flex min-w-0 flex-col gap-3 lg:col-start-1 lg:row-start-2 ${OFF_SCREEN_FIRST}`}>
            <LiveCutCard store={store} units={units} onChange={change} />
            <LiveBenchDetails store={store} units={units} />
          </div>
        )}
      </div>
      {!customer && (
        <div className={OFF_SCREEN_FIRST}>
          <Cautions />
        </div>
      )}
      <div className={OFF_SCREEN_FIRST}>
        <SettledDrawings store={store} units={units} />
      </div>
    </div>
  );
}
