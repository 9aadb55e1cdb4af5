"use client";

import { useDeferredValue } from "react";
import type { Money } from "@/model/money";
import type { FitStore } from "@/scene/store";
import type { FitCanvasApi } from "@/scene/three/fit-canvas";
import { drawnKey } from "@/scene/three/drawn-key";
import type { ViewState } from "@/scene/three/view";
import { FitView } from "./fit-view";
import { SmallMultiples } from "./lineup";
import type { CompareMode } from "./toolbar";
import { useFit } from "./use-fit";
import { useSettled } from "./use-live-fit";

interface LineupProps {
  readonly chosenKitId?: string;
  readonly units: "mm" | "in";
  readonly onPick: (kitIndex: number) => void;
  readonly prices?: Readonly<Record<string, Money | undefined>>;
}

/**
 * The view box: the 3D view (or every kit side by side), labelled with the kit on show and carrying the
 * key of the frame it asks for (`data-wanted`), which the canvas answers with the key of its last frame.
 */
export function StudioView({ store, view, compare, caseName, onReady, ...lineup }: LineupProps & { store: FitStore; view: ViewState; compare: CompareMode; caseName: string; onReady: (api: FitCanvasApi) => void }) {
  const { kitIndex, cut, kitName } = useFit(store, (s) => ({ kitIndex: s.kitIndex, cut: s.study.cut, kitName: s.result.kits[s.kitIndex].name }));
  return (
    <div
      className="card relative aspect-[4/3] max-h-[72vh] w-full overflow-hidden bg-paper-2"
      role="img"
      aria-label={`3D view of ${kitName} in ${caseName}; the fit results beside it give every figure in words`}
      data-testid="view"
      data-camera={view.camera}
      data-section={view.section ? String(view.sectionAngleDeg) : "off"}
      data-wanted={drawnKey(view, kitIndex, cut)}
    >
      <div className={compare === "side" ? "hidden" : "h-full w-full"}>
        <FitView store={store} view={view} onReady={onReady} />
      </div>
      {compare === "side" && <SideBySide store={store} kitIndex={kitIndex} {...lineup} />}
    </div>
  );
}

/** Every kit as a small section, drawn once the cut has settled. */
function SideBySide({ store, kitIndex, chosenKitId, units, onPick, prices }: LineupProps & { store: FitStore; kitIndex: number }) {
  const settled = useSettled(useDeferredValue(useFit(store, (s) => ({ study: s.study, result: s.result }))));
  return <SmallMultiples study={settled.study} result={settled.result} kitIndex={kitIndex} chosenKitId={chosenKitId} units={units} onPick={onPick} prices={prices} />;
}
