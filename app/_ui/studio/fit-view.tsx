"use client";

import { type ComponentType, memo, useDeferredValue, useEffect, useMemo, useRef, useState, useSyncExternalStore } from "react";
import { planDrawing } from "@/scene/drawing/plan";
import type { FitCanvasProps } from "@/scene/three/fit-canvas";

// three.js and react-three-fiber load only here, in the browser, so other pages carry none of it. They load
// once the view box is in sight and the page has gone idle after its first paint, so the page answers first;
// until then the box shows the plan drawing of what is on show, at the box's own size, so nothing moves.

/** How long the main thread must stay free of work, after the first paint, before the 3D view loads. */
const QUIET_MS = 1500;
/** The longest wait for that quiet stretch (a page that never goes quiet still gets its 3D view). */
const LATEST_MS = 6000;

type Canvas = ComponentType<FitCanvasProps>;
let loaded: Canvas | null = null;

function loadCanvas(): Promise<Canvas> {
  return loaded ? Promise.resolve(loaded) : import("@/scene/three/fit-canvas").then((m) => (loaded = m.default));
}

/** Calls `then` once, when the page has had no task for QUIET_MS in a row (idle callbacks with a whole idle period each), or after LATEST_MS. */
function whenQuiet(then: () => void): () => void {
  let done = false;
  const once = () => {
    if (done) return;
    done = true;
    stop();
    then();
  };
  const latest = window.setTimeout(once, typeof window.requestIdleCallback === "function" ? LATEST_MS : QUIET_MS);
  let id = 0;
  let since = performance.now();
  const step = (d: IdleDeadline) => {
    // A short idle period means work or a frame came in between: the quiet stretch starts again.
    if (d.timeRemaining() < 40) since = performance.now();
    if (performance.now() - since >= QUIET_MS) once();
    else id = window.requestIdleCallback(step);
  };
  if (typeof window.requestIdleCallback === "function") id = window.requestIdleCallback(step);
  function stop() {
    window.clearTimeout(latest);
    if (id) window.cancelIdleCallback(id);
  }
  return stop;
}

/** The plan drawing of what is on show, filling the view box; drawn in the page's HTML so it paints with the first paint. */
function PlanStill({ store, units }: { store: FitCanvasProps["store"]; units: FitCanvasProps["view"]["units"] }) {
  const snap = useDeferredValue(useSyncExternalStore(store.subscribe, store.get, store.get));
  const svg = useMemo(() => planDrawing(snap.study, snap.result, snap.kitIndex, units).svg, [snap.study, snap.result, snap.kitIndex, units]);
  return (
    <div className="relative h-full w-full" data-testid="view-still">
      {/* The view box itself is the labelled image; the still is decoration until the 3D view arrives. */}
      <div aria-hidden="true" className="h-full w-full p-3 [&>svg]:h-full [&>svg]:w-full" dangerouslySetInnerHTML={{ __html: svg }} />
      <p className="absolute bottom-2 left-3 text-xs text-ink-2">Plan at the deck; the 3D view is on its way…</p>
    </div>
  );
}

/** The 3D fit view, with the plan drawing in its place until three.js has loaded. */
export const FitView = memo(function FitView(props: FitCanvasProps) {
  const [Canvas, setCanvas] = useState<Canvas | null>(() => loaded);
  const box = useRef<HTMLDivElement>(null);
  useEffect(() => {
    if (Canvas || !box.current) return;
    let live = true;
    let stopQuiet = () => {};
    const start = () => {
      stopQuiet = whenQuiet(() => {
        loadCanvas().then((c) => live && setCanvas(() => c));
      });
    };
    const seen = new IntersectionObserver((entries) => {
      if (entries.some((e) => e.isIntersecting)) {
        seen.disconnect();
        start();
      }
    });
    seen.observe(box.current);
    return () => {
      live = false;
      seen.disconnect();
      stopQuiet();
    };
  }, [Canvas]);
  return (
    <div ref={box} className="h-full w-full">
      {Canvas ? <Canvas {...props} /> : <PlanStill store={props.store} units={props.view.units} />}
    </div>
  );
});
