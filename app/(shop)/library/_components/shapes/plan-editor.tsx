"use client";

import { useMemo, useRef } from "react";
import { useStore } from "zustand";
import type { ShapeIssue } from "@/geometry/shapes";
import { editDrawing, type Frame } from "@/scene/drawing/plan-edit";
import { useZoom, ZoomFrame } from "@/app/_ui/capture/use-zoom";
import { windowOf, type View } from "@/app/_ui/capture/zoom";
import { usePlanDrag } from "./plan-drag";
import { usePlanKeys } from "./plan-keys";
import { usePatchedSvg } from "./use-patched-svg";
import { docIssues, docShapes, type DocExtras } from "./read-doc";
import type { ShapeStore } from "./shape-store";

export type ShapeWords = { deck: string; mouth: string; pocket: string };

/** The part of the frame a view shows, as an SVG viewBox. */
const viewBoxOf = (f: Frame, v: View) => {
  const w = windowOf(v), fw = f.maxX - f.minX, fh = f.maxY - f.minY;
  return `${f.minX + w.left * fw} ${f.minY + w.top * fh} ${fw * w.size} ${fh * w.size}`;
};

type Props = {
  store: ShapeStore;
  extras: DocExtras;
  words: ShapeWords;
  title: string;
  fixedCircles?: string[];
  fixedStuds?: boolean;
  /** After a gesture or a nudge: the form validates the shapes again. */
  onCommit: () => void;
};

/**
 * The plan at the deck of the shapes being entered, drawn by the study's plan code, with every corner,
 * stud and circle edge draggable (snapped to the grid; Alt for free movement), an edge clicked to add a
 * corner, and the arrow keys nudging the focused point (Shift: ten steps; Delete removes a corner).
 * The wheel, a pinch, the buttons and the +, − and 0 keys zoom it; a drag on the empty drawing pans it.
 */
export function PlanEditor({ store, extras, words, title, fixedCircles, fixedStuds, onCommit }: Props) {
  const doc = useStore(store, (s) => s.doc);
  const units = useStore(store, (s) => s.units);
  const hover = useStore(store, (s) => s.hover);
  const selected = useStore(store, (s) => s.selected);
  const shapes = useMemo(() => docShapes(doc, units, extras), [doc, units, extras]);
  const issues = useMemo(() => docIssues(shapes, words.pocket), [shapes, words.pocket]);
  const drawing = useMemo(
    () => editDrawing(shapes, { units, highlight: hover, selected, issues, words, title, fixedCircles, fixedStuds }),
    [shapes, units, hover, selected, issues, words, title, fixedCircles, fixedStuds],
  );
  const host = useRef<HTMLDivElement>(null);
  const focusKey = useRef<string | null>(null);
  const downOn = useRef<Element | null>(null);
  // A point pressed or held by the pointer: the plan is not redrawn meanwhile, so the pressed element stays
  // on the page and keeps receiving the pointer's moves (see plan-drag.ts).
  const held = useRef(false);
  const zoom = useZoom(host);
  const first = usePatchedSvg(host, drawing.svg, viewBoxOf(drawing.frame, zoom.view), focusKey);

  const onGrab = (key: string) => {
    focusKey.current = key;
    held.current = true;
  };
  const onRelease = (key: string) => {
    held.current = false;
    downOn.current = null;
    store.setState({ selected: key, hover: key });
  };
  const bind = usePlanDrag({ store, host, downOn, shapes, units, words, onGrab, onRelease, onCommit, pan: zoom.pan });
  const onKeyDown = usePlanKeys({ store, units, keepFocus: (key) => void (focusKey.current = key), zoomKey: zoom.onKey, onCommit });
  const hoverTo = (key: string | null) => !held.current && store.getState().hover !== key && store.setState({ hover: key });

  return (
    <ZoomFrame zoom={zoom} what="plan">
      <div
        ref={host}
        {...bind()}
        data-testid="shape-plan"
        onKeyDown={onKeyDown}
        onPointerDownCapture={(e) => {
          downOn.current = e.target as Element;
          held.current = true;
        }}
        onPointerUpCapture={() => void (held.current = false)}
        onFocus={(e) => {
          const key = (e.target as Element).getAttribute?.("data-key");
          if (key) {
            focusKey.current = key;
            if (!held.current) store.setState({ hover: key });
          }
        }}
        onBlur={(e) => {
          if (e.relatedTarget && !host.current?.contains(e.relatedTarget as Node)) focusKey.current = null;
        }}
        onPointerOver={(e) => hoverTo((e.target as Element).closest?.("[data-key]")?.getAttribute("data-key") ?? null)}
        onPointerLeave={() => hoverTo(null)}
        className="cursor-move select-none overflow-hidden rounded-md border border-rule bg-white [&_[data-kind]]:touch-none [&_[data-kind=edge]]:cursor-copy [&_circle[data-kind]]:cursor-grab [&_svg]:h-auto [&_svg]:max-h-[70vh] [&_svg]:w-full [&_[data-kind]:focus-visible]:outline-2"
        dangerouslySetInnerHTML={first}
      />
      <PlanNotes units={units} issues={issues} />
    </ZoomFrame>
  );
}

/** How the plan is worked, and the problems of the shapes in words. */
function PlanNotes({ units, issues }: { units: string; issues: readonly ShapeIssue[] }) {
  return (
    <>
      <p className="text-xs text-ink-3">
        Drag a point (it snaps to {units === "in" ? "0.005 in" : "0.1 mm"}; hold Alt to place it freely), click an edge to add a corner; Tab to a point and use the arrow keys to nudge it (Shift: ten
        steps), Delete to remove a corner. The wheel, a pinch or +, − and 0 zoom; drag the empty drawing to move it.
      </p>
      {issues.length ? (
        <ul className="flex flex-col gap-1" aria-label="Problems with the shapes" data-testid="shape-issues">
          {issues.map((i) => (
            <li key={`${i.at}-${i.message}`} className="field-error">
              {i.message}
            </li>
          ))}
        </ul>
      ) : null}
    </>
  );
}
