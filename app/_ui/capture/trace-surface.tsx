"use client";

import { useDrag } from "@use-gesture/react";
import { useRef, useState, type KeyboardEvent, type ReactNode, type RefObject } from "react";
import type { Point } from "@/geometry/homography";
import { useZoom, ZoomFrame } from "./use-zoom";
import { windowOf } from "./zoom";
import type { TracePhoto } from "./use-trace-photo";

// The photo to click on, with what is traced drawn over it. A click places a point where it lands on the
// photo, whatever the zoom; a drag moves the zoomed photo; the wheel, a pinch, +, − and 0 zoom; the arrow
// keys move a marker (Shift for bigger steps) and Enter places a point there.

type Props = {
  photo: TracePhoto;
  ready: boolean;
  placed: number;
  canvasRef: RefObject<HTMLCanvasElement | null>;
  onPlace: (p: Point) => void;
  /** The marks drawn over the photo, in the photo's pixels. */
  children: (cursor: Point | null) => ReactNode;
};

export function TraceSurface({ photo, ready, placed, canvasRef, onPlace, children }: Props) {
  const viewport = useRef<HTMLDivElement>(null);
  const picture = useRef<HTMLDivElement>(null);
  const [cursor, setCursor] = useState<Point | null>(null);
  const zoom = useZoom(viewport);
  const w = windowOf(zoom.view);

  // The picture's box on screen is its zoomed and moved place, so a click maps to the photo's pixels directly.
  const toPhotoPx = (clientX: number, clientY: number): Point | null => {
    const box = picture.current?.getBoundingClientRect();
    if (!box || box.width === 0) return null;
    return [((clientX - box.left) / box.width) * photo.widthPx, ((clientY - box.top) / box.height) * photo.heightPx];
  };
  const bind = useDrag(
    ({ tap, delta: [dx, dy], xy: [x, y] }) => {
      if (!ready) return;
      if (!tap) return zoom.pan(dx, dy);
      const p = toPhotoPx(x, y);
      if (p) onPlace(p);
    },
    { filterTaps: true, pointer: { keys: false } },
  );

  function onKey(e: KeyboardEvent<HTMLDivElement>) {
    if (!ready) return;
    if (!e.ctrlKey && !e.metaKey && !e.altKey && zoom.onKey(e.key)) return e.preventDefault();
    const stepPx = (e.shiftKey ? 10 : 1) * Math.max(1, Math.max(photo.widthPx, photo.heightPx) / 400);
    const c = cursor ?? [photo.widthPx / 2, photo.heightPx / 2];
    const moves: Record<string, Point> = { ArrowLeft: [-stepPx, 0], ArrowRight: [stepPx, 0], ArrowUp: [0, -stepPx], ArrowDown: [0, stepPx] };
    if (moves[e.key]) {
      e.preventDefault();
      setCursor([Math.min(photo.widthPx, Math.max(0, c[0] + moves[e.key][0])), Math.min(photo.heightPx, Math.max(0, c[1] + moves[e.key][1]))]);
    } else if (e.key === "Enter" || e.key === " ") {
      e.preventDefault();
      onPlace(c);
      setCursor(c);
    }
  }

  return (
    <ZoomFrame zoom={zoom} what="photo">
      <div
        ref={viewport}
        {...bind()}
        className="relative w-full max-w-full cursor-crosshair touch-none select-none overflow-hidden"
        style={{ aspectRatio: `${photo.widthPx} / ${photo.heightPx}` }}
        role="application"
        aria-label="Photo to click on. Arrow keys move the marker (Shift for bigger steps), Enter places a point; +, − and 0 zoom, a drag moves the zoomed photo."
        tabIndex={0}
        data-testid="trace-surface"
        data-photo-width={photo.widthPx}
        data-photo-height={photo.heightPx}
        data-ready={ready}
        data-points={placed}
        data-zoom={zoom.view.zoom}
        aria-busy={!ready}
        onKeyDown={onKey}
      >
        <div ref={picture} className="absolute inset-0" style={{ transform: `scale(${zoom.view.zoom}) translate(${-w.left * 100}%, ${-w.top * 100}%)`, transformOrigin: "0 0" }}>
          <canvas ref={canvasRef} className="absolute inset-0 h-full w-full" aria-hidden="true" />
          <svg className="pointer-events-none absolute inset-0 h-full w-full" viewBox={`0 0 ${photo.widthPx} ${photo.heightPx}`} preserveAspectRatio="none" aria-hidden="true">
            {children(cursor)}
          </svg>
        </div>
      </div>
    </ZoomFrame>
  );
}
