"use client";

import { useLayoutEffect, useMemo, useRef, useState, type KeyboardEvent } from "react";
import { useStore } from "zustand";
import { MM_PER_INCH } from "@/geometry/units";
import { editDrawing, type Frame } from "@/scene/drawing/plan-edit";
import { useZoom, ZoomBar } from "@/app/_ui/capture/use-zoom";
import { windowOf, type View } from "@/app/_ui/capture/zoom";
import { usePlanDrag } from "./plan-drag";
import { docIssues, docShapes, type DocExtras } from "./read-doc";
import { SNAP, type ShapeStore } from "./shape-store";

export type ShapeWords = { deck: string; mouth: string; pocket: string };

const ARROWS: Record<string, [number, number]> = { ArrowLeft: [-1, 0], ArrowRight: [1, 0], ArrowUp: [0, 1], ArrowDown: [0, -1] };

/** The part of the frame a view shows, as an SVG viewBox. */
const viewBoxOf = (f: Frame, v: View) => {
  const w = windowOf(v), fw = f.maxX - f.minX, fh = f.maxY - f.minY;
  return `${f.minX + w.left * fw} ${f.minY + w.top * fh} ${fw * w.size} ${fh * w.size}`;
};

/**
 * The plan at the deck of the shapes being entered, drawn by the study's plan code, with every corner,
 * stud and circle edge draggable (snapped to the grid; Alt for free movement), an edge clicked to add a
 * corner, and the arrow keys nudging the focused point (Shift: ten steps; Delete removes a corner).
 * The wheel, a pinch, the buttons and the +, − and 0 keys zoom it; a drag on the empty drawing pans it.
 */
export function PlanEditor({
  store,
  extras,
  words,
  title,
  fixedCircles,
  fixedStuds,
  onCommit,
}: {
  store: ShapeStore;
  extras: DocExtras;
  words: ShapeWords;
  title: string;
  fixedCircles?: string[];
  fixedStuds?: boolean;
  /** After a gesture or a nudge: the form validates the shapes again. */
  onCommit: () => void;
}) {
  const doc = useStore(store, (s) => s.doc);
  const units = useStore(store, (s) => s.units);
  const hover = useStore(store, (s) => s.hover);
  const selected = useStore(store, (s) => s.selected);
  const [frame, setFrame] = useState<Frame | null>(null);
  const shapes = useMemo(() => docShapes(doc, units, extras), [doc, units, extras]);
  // The checks run again when a drag is released, not on every pointer move (a 200-corner outline's sweep each frame).
  const [settled, setSettled] = useState(shapes);
  if (!frame && settled !== shapes) setSettled(shapes);
  const issues = useMemo(() => docIssues(settled, words.pocket), [settled, words.pocket]);
  const drawing = useMemo(
    () => editDrawing(shapes, { units, highlight: hover, selected, issues, frame, words, title, fixedCircles, fixedStuds, dragging: frame !== null }),
    [shapes, units, hover, selected, issues, frame, words, title, fixedCircles, fixedStuds],
  );
  const host = useRef<HTMLDivElement>(null);
  const focusKey = useRef<string | null>(null);
  const downOn = useRef<Element | null>(null);
  const html = useMemo(() => ({ __html: drawing.svg }), [drawing.svg]);
  const zoom = useZoom(host);

  // The markup is replaced on every change: the view is set on it again, and a point that had the focus gets it back.
  useLayoutEffect(() => {
    host.current?.querySelector("svg")?.setAttribute("viewBox", viewBoxOf(drawing.frame, zoom.view));
  }, [drawing.svg, drawing.frame, zoom.view]);
  useLayoutEffect(() => {
    const key = focusKey.current;
    const active = document.activeElement;
    if (!key || (active && active !== document.body && !host.current?.contains(active))) return;
    const el = host.current?.querySelector<SVGElement>(`[data-key="${CSS.escape(key)}"]`);
    if (el && el !== active) el.focus({ preventScroll: true });
  }, [drawing.svg]);

  const bind = usePlanDrag({ store, host, downOn, shapes, units, words, frame: drawing.frame, onGrab: (key) => void (focusKey.current = key), setFrame, onCommit, pan: zoom.pan });
  const pointOf = (el: Element): [number, number] => [Number(el.getAttribute("cx")), -Number(el.getAttribute("cy"))];

  const onKeyDown = (e: KeyboardEvent<HTMLDivElement>) => {
    if (!e.ctrlKey && !e.metaKey && !e.altKey && zoom.onKey(e.key)) {
      e.preventDefault();
      return;
    }
    const el = (e.target as Element).closest?.("[data-kind]");
    const key = el?.getAttribute("data-key");
    const kind = el?.getAttribute("data-kind");
    if (!el || !key || !kind || kind === "edge") return;
    const step = SNAP[units] * (units === "in" ? MM_PER_INCH : 1) * (e.shiftKey ? 10 : 1);
    const dir = ARROWS[e.key];
    const act = store.getState().act;
    if (dir) {
      const [x, y] = pointOf(el);
      const d = kind === "radius" ? [(dir[0] + dir[1]) * step, 0] : [dir[0] * step, dir[1] * step];
      focusKey.current = key;
      act.movePoint(key, [x + d[0], y + d[1]], !e.altKey);
    } else if ((e.key === "Delete" || e.key === "Backspace") && kind === "corner") {
      const [shape, i] = key.split(":");
      focusKey.current = null;
      act.removeCorner(shape, Number(i));
    } else if (e.key === "Enter" || e.key === " ") {
      store.setState({ selected: store.getState().selected === key ? null : key });
    } else return;
    e.preventDefault();
    onCommit();
  };

  return (
    <div className="flex flex-col gap-2">
      <ZoomBar view={zoom.view} setView={zoom.setView} what="plan" />
      <div
        ref={host}
        {...bind()}
        data-testid="shape-plan"
        onKeyDown={onKeyDown}
        onPointerDownCapture={(e) => void (downOn.current = e.target as Element)}
        onFocus={(e) => {
          const key = (e.target as Element).getAttribute?.("data-key");
          if (key) {
            focusKey.current = key;
            store.setState({ hover: key });
          }
        }}
        onBlur={(e) => {
          if (e.relatedTarget && !host.current?.contains(e.relatedTarget as Node)) focusKey.current = null;
        }}
        onPointerOver={(e) => {
          const key = (e.target as Element).closest?.("[data-key]")?.getAttribute("data-key") ?? null;
          if (!frame && store.getState().hover !== key) store.setState({ hover: key });
        }}
        onPointerLeave={() => !frame && store.setState({ hover: null })}
        className="cursor-move overflow-hidden rounded-md border border-rule bg-white [&_[data-kind]]:touch-none [&_[data-kind=edge]]:cursor-copy [&_circle[data-kind]]:cursor-grab [&_svg]:h-auto [&_svg]:max-h-[70vh] [&_svg]:w-full [&_[data-kind]:focus-visible]:outline-2"
        dangerouslySetInnerHTML={html}
      />
      <p className="text-xs text-ink-3">Drag a point (it snaps to {units === "in" ? "0.005 in" : "0.1 mm"}; hold Alt to place it freely), click an edge to add a corner; Tab to a point and use the arrow keys to nudge it (Shift: ten steps), Delete to remove a corner. The wheel, a pinch or +, − and 0 zoom; drag the empty drawing to move it.</p>
      {issues.length ? (
        <ul className="flex flex-col gap-1" aria-label="Problems with the shapes" data-testid="shape-issues">
          {issues.map((i) => (
            <li key={`${i.at}-${i.message}`} className="field-error">
              {i.message}
            </li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}
