"use client";

import { useDrag } from "@use-gesture/react";
import { useLayoutEffect, useMemo, useRef, useState, type KeyboardEvent } from "react";
import { flushSync } from "react-dom";
import { useStore } from "zustand";
import { editDrawing, type Frame } from "@/scene/drawing/plan-edit";
import { docIssues, docShapes, type DocExtras } from "./read-doc";
import { gesture, SNAP, type ShapeStore } from "./shape-store";

export type ShapeWords = { deck: string; mouth: string; pocket: string };

type Grip = { key: string; kind: string; offset: [number, number]; end?: () => void } | null;

const ARROWS: Record<string, [number, number]> = { ArrowLeft: [-1, 0], ArrowRight: [1, 0], ArrowUp: [0, 1], ArrowDown: [0, -1] };

/**
 * The plan at the deck of the shapes being entered, drawn by the study's plan code, with every corner,
 * stud and circle edge draggable (snapped to the grid; Alt for free movement), an edge clicked to add a
 * corner, and the arrow keys nudging the focused point (Shift: ten steps; Delete removes a corner).
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
  // What the pointer went down on: the gesture itself starts a few pixels later, perhaps over something else.
  const downOn = useRef<Element | null>(null);
  const html = useMemo(() => ({ __html: drawing.svg }), [drawing.svg]);

  // The markup is replaced on every change; a point that had the focus gets it back.
  useLayoutEffect(() => {
    const key = focusKey.current;
    const active = document.activeElement;
    if (!key || (active && active !== document.body && !host.current?.contains(active))) return;
    const el = host.current?.querySelector<SVGElement>(`[data-key="${CSS.escape(key)}"]`);
    if (el && el !== active) el.focus({ preventScroll: true });
  }, [drawing.svg]);

  const toMm = (clientX: number, clientY: number): [number, number] | null => {
    const svg = host.current?.querySelector("svg");
    const m = svg?.getScreenCTM();
    if (!m) return null;
    const p = new DOMPoint(clientX, clientY).matrixTransform(m.inverse());
    return [p.x, -p.y];
  };
  // The drawing's y runs down: a handle at (cx, cy) stands for the point (cx, −cy) in mm.
  const pointOf = (el: Element): [number, number] => [Number(el.getAttribute("cx")), -Number(el.getAttribute("cy"))];

  const bind = useDrag<PointerEvent>(
    ({ first, last, tap, xy: [cx, cy], initial: [ix, iy], event, memo, altKey }) => {
      let grip = memo as Grip;
      if (first) {
        const el = (downOn.current ?? (event.target as Element | null))?.closest?.("[data-kind]");
        const key = el?.getAttribute("data-key");
        const kind = el?.getAttribute("data-kind");
        // The gesture starts once the pointer has moved past the tap threshold: measure from where it went down.
        const at = toMm(ix, iy);
        if (!el || !key || !kind || !at) return null;
        if (kind === "edge") grip = { key, kind, offset: [0, 0] };
        else {
          const p = pointOf(el);
          grip = { key, kind, offset: [p[0] - at[0], p[1] - at[1]], end: gesture(store).end };
          focusKey.current = key;
          setFrame(drawing.frame);
          store.setState({ selected: key, hover: key });
        }
      }
      if (!grip) return null;
      if (grip.kind === "edge") {
        if (last && tap) {
          const [shape, after] = grip.key.split("~");
          const at = toMm(cx, cy);
          if (at) store.getState().act.insertCorner(shape, Number(after), at, !altKey);
          onCommit();
        }
        return grip;
      }
      const at = toMm(cx, cy);
      const g = grip;
      // Rendered before the event returns, so the frame that follows the pointer shows the point where it is.
      if (!tap && at && (!first || Math.hypot(cx - ix, cy - iy) > 0)) flushSync(() => store.getState().act.movePoint(g.key, [at[0] + g.offset[0], at[1] + g.offset[1]], !altKey));
      if (last) {
        grip.end?.();
        setFrame(null);
        onCommit();
      }
      return grip;
    },
    { pointer: { capture: false, keys: false }, filterTaps: true },
  );

  const onKeyDown = (e: KeyboardEvent<HTMLDivElement>) => {
    const el = (e.target as Element).closest?.("[data-kind]");
    const key = el?.getAttribute("data-key");
    const kind = el?.getAttribute("data-kind");
    if (!el || !key || !kind || kind === "edge") return;
    const step = SNAP[units] * (units === "in" ? 25.4 : 1) * (e.shiftKey ? 10 : 1);
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
        className="rounded-md border border-rule bg-white [&_[data-kind]]:touch-none [&_[data-kind=edge]]:cursor-copy [&_circle[data-kind]]:cursor-grab [&_svg]:h-auto [&_svg]:max-h-[70vh] [&_svg]:w-full [&_[data-kind]:focus-visible]:outline-2"
        dangerouslySetInnerHTML={html}
      />
      <p className="text-xs text-ink-3">Drag a point (it snaps to {units === "in" ? "0.005 in" : "0.1 mm"}; hold Alt to place it freely), click an edge to add a corner; Tab to a point and use the arrow keys to nudge it (Shift: ten steps), Delete to remove a corner.</p>
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
