"use client";

import { useGesture } from "@use-gesture/react";
import { useCallback, useState, type ReactNode, type RefObject } from "react";
import { FIT, panBy, viewForKey, ZOOM_STEP, zoomAt, type View } from "./zoom";

const TOUCH = typeof window !== "undefined" && "ontouchstart" in window;

/**
 * The zoom and pan of a drawing or photo shown in `viewport`: the wheel and a pinch zoom about the
 * pointer, `pan` moves by screen pixels (a drag), `onKey` takes +, − and 0, and the buttons of <ZoomBar>.
 */
export function useZoom(viewport: RefObject<HTMLElement | SVGElement | null>) {
  const [view, setView] = useState<View>(FIT);
  const fraction = useCallback(
    (clientX: number, clientY: number): [number, number] => {
      const box = viewport.current?.getBoundingClientRect();
      if (!box || box.width === 0 || box.height === 0) return [0.5, 0.5];
      return [(clientX - box.left) / box.width, (clientY - box.top) / box.height];
    },
    [viewport],
  );
  useGesture(
    {
      onWheel: ({ event, delta: [, dy] }) => {
        // Scrolling down over a picture shown whole scrolls the page on; anything else zooms.
        if (dy === 0 || (dy > 0 && view.zoom <= 1)) return;
        event.preventDefault();
        const [sx, sy] = fraction(event.clientX, event.clientY);
        setView((v) => zoomAt(v, Math.exp(-dy * 0.002), sx, sy));
      },
      onPinch: ({ event, origin: [ox, oy], movement: [scale], memo }) => {
        if (event.type === "wheel") return memo;
        const before = (memo as number | undefined) ?? 1;
        const [sx, sy] = fraction(ox, oy);
        setView((v) => zoomAt(v, scale / before, sx, sy));
        return scale;
      },
    },
    // A trackpad's pinch arrives as a wheel with Ctrl. Two fingers on a touch screen are read as touch events:
    // the pointer-event pinch would capture the pointer on the element pressed, which a redrawn plan replaces.
    { target: viewport, eventOptions: { passive: false }, pinch: { pinchOnWheel: false, enabled: TOUCH, pointer: { touch: true } } },
  );
  const pan = useCallback(
    (dxPx: number, dyPx: number) => {
      const box = viewport.current?.getBoundingClientRect();
      if (box && box.width > 0 && box.height > 0) setView((v) => panBy(v, dxPx / box.width, dyPx / box.height));
    },
    [viewport],
  );
  /** Handles +, − and 0; true when the key was a zoom key. */
  const onKey = useCallback((key: string) => {
    if (viewForKey(FIT, key) === null) return false;
    setView((v) => viewForKey(v, key) ?? v);
    return true;
  }, []);
  return { view, setView, pan, onKey };
}

/** A zoomable view (the viewport `useZoom` was given, and what goes with it) with its zoom buttons above it. */
export function ZoomFrame({ zoom, what, children }: { zoom: ReturnType<typeof useZoom>; what: string; children: ReactNode }) {
  return (
    <div className="flex flex-col gap-2">
      <ZoomBar view={zoom.view} setView={zoom.setView} what={what} />
      {children}
    </div>
  );
}

/** The buttons of a zoomable view: in, out and fit, with the zoom shown. */
function ZoomBar({ view, setView, what }: { view: View; setView: (f: (v: View) => View) => void; what: string }) {
  return (
    <div className="flex items-center gap-1 text-sm" role="group" aria-label={`Zoom of the ${what}`}>
      <button type="button" className="btn-quiet" aria-label={`Zoom in on the ${what}`} aria-keyshortcuts="+" onClick={() => setView((v) => zoomAt(v, ZOOM_STEP))}>
        +
      </button>
      <button type="button" className="btn-quiet" aria-label={`Zoom out of the ${what}`} aria-keyshortcuts="-" disabled={view.zoom <= 1} onClick={() => setView((v) => zoomAt(v, 1 / ZOOM_STEP))}>
        −
      </button>
      <button type="button" className="btn-quiet" aria-label={`Fit the whole ${what}`} aria-keyshortcuts="0" disabled={view.zoom <= 1} onClick={() => setView(() => FIT)}>
        Fit
      </button>
      <span className="text-xs text-ink-3 num" aria-live="polite" data-testid="zoom-level">
        {`× ${view.zoom.toFixed(1)}`}
      </span>
    </div>
  );
}
