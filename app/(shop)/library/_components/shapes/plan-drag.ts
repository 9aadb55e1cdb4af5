"use client";

import { useDrag } from "@use-gesture/react";
import type { RefObject } from "react";
import type { LengthUnits } from "@/geometry";
import { parseLengthText } from "@/model/units";
import { dragPatch, type DragPatch, type EditShapes } from "@/scene/drawing/plan-edit";
import { pointText, type ShapeStore } from "./shape-store";
import type { ShapeWords } from "./plan-editor";

// Dragging on the plan. A point being dragged moves only its handle and its own outline in the drawing
// (two elements, patched in place); the store, its undo history, the fields and the live result take the
// point once, when it is released, as one step of undo. A drag on the empty drawing pans it.

type Point = [number, number];
type Grip =
  | { kind: "edge"; key: string }
  | { kind: "pan"; last: Point }
  | { kind: "corner" | "stud" | "radius"; key: string; offset: Point; base: EditShapes; raw: Point | null; snap: boolean }
  | null;

const mmOf = (t: string, units: LengthUnits) => {
  const r = parseLengthText(t, units);
  return r.ok && r.value !== undefined ? r.value : 0;
};

/** Where the store will put a point dragged to `raw`: on the grid as its fields will show it (a circle's edge: its diameter on the grid). */
export function snappedPoint(base: EditShapes, key: string, kind: string, raw: Point, units: LengthUnits, snap: boolean): Point {
  // The texts in the form's units, read back in mm: the same rounding as the fields.
  const onGrid = (p: Point): Point => {
    const [x, y] = pointText(p, units, snap);
    return [mmOf(x, units), mmOf(y, units)];
  };
  if (kind !== "radius") return onGrid(raw);
  const shape = key.split(":")[0];
  const o = shape === "deck" ? base.deck : shape === "mouth" ? base.mouth : (base.pockets[Number(shape.split(".")[1])]?.outline ?? null);
  const c = o?.kind === "circle" ? (o.centerMm ?? [0, 0]) : [0, 0];
  const d = onGrid([2 * Math.hypot(raw[0] - c[0], raw[1] - c[1]), 0])[0];
  return [c[0] + d / 2, c[1]];
}

/** Sets the patched attributes on the drawn elements (found by their data keys). */
export function applyPatches(host: HTMLElement, patches: readonly DragPatch[]) {
  for (const p of patches) {
    const sel = `[data-key="${CSS.escape(p.key)}"]`;
    const node = host.querySelector(p.part === "handle" ? `${sel}[data-kind]` : `${sel}:not([data-kind])`);
    const target = p.part === "cross" ? node?.nextElementSibling : node;
    if (target) for (const [k, v] of Object.entries(p.attrs)) target.setAttribute(k, v);
  }
}

type DragOptions = {
  store: ShapeStore;
  host: RefObject<HTMLDivElement | null>;
  /** What the pointer went down on: the gesture starts a few pixels later, perhaps over something else. */
  downOn: RefObject<Element | null>;
  shapes: EditShapes;
  units: LengthUnits;
  words: ShapeWords;
  /** A point is taken hold of: nothing redraws the plan until it is let go (the pressed element stays on the page). */
  onGrab: (key: string) => void;
  /** The point is let go: it is the one picked for the keys. */
  onRelease: (key: string) => void;
  onCommit: () => void;
  pan: (dxPx: number, dyPx: number) => void;
};

export function usePlanDrag(o: DragOptions) {
  const toMm = (clientX: number, clientY: number): Point | null => {
    const m = o.host.current?.querySelector("svg")?.getScreenCTM();
    if (!m) return null;
    const p = new DOMPoint(clientX, clientY).matrixTransform(m.inverse());
    return [p.x, -p.y];
  };
  // The drawing's y runs down: a handle at (cx, cy) stands for the point (cx, −cy) in mm.
  const pointOf = (el: Element): Point => [Number(el.getAttribute("cx")), -Number(el.getAttribute("cy"))];

  const start = (ix: number, iy: number, target: EventTarget | null): Grip => {
    const el = (o.downOn.current ?? (target as Element | null))?.closest?.("[data-kind]");
    const key = el?.getAttribute("data-key");
    const kind = el?.getAttribute("data-kind");
    if (!el || !key || !kind) return { kind: "pan", last: [ix, iy] };
    if (kind === "edge") return { kind: "edge", key };
    const at = toMm(ix, iy);
    if (!at || (kind !== "corner" && kind !== "stud" && kind !== "radius")) return null;
    const p = pointOf(el);
    o.onGrab(key);
    return { kind, key, offset: [p[0] - at[0], p[1] - at[1]], base: o.shapes, raw: null, snap: true };
  };

  return useDrag<PointerEvent>(
    ({ first, last, tap, xy: [cx, cy], initial: [ix, iy], event, memo, altKey }) => {
      const grip: Grip = first ? start(ix, iy, event.target) : (memo as Grip);
      if (!grip) return null;
      if (grip.kind === "pan") {
        if (!tap) o.pan(cx - grip.last[0], cy - grip.last[1]);
        grip.last = [cx, cy];
        return grip;
      }
      if (grip.kind === "edge") {
        const at = last && tap ? toMm(cx, cy) : null;
        if (at) {
          const [shape, after] = grip.key.split("~");
          o.store.getState().act.insertCorner(shape, Number(after), at, !altKey);
          o.onCommit();
        }
        return grip;
      }
      const at = toMm(cx, cy);
      if (!tap && at && o.host.current) {
        grip.raw = [at[0] + grip.offset[0], at[1] + grip.offset[1]];
        grip.snap = !altKey;
        const p = snappedPoint(grip.base, grip.key, grip.kind, grip.raw, o.units, grip.snap);
        applyPatches(o.host.current, dragPatch(grip.base, grip.key, p, o.units, o.words));
      }
      if (last) {
        // One write of the store: one step of undo, one validation, one live result.
        if (grip.raw) o.store.getState().act.movePoint(grip.key, grip.raw, grip.snap);
        o.onRelease(grip.key);
        o.onCommit();
      }
      return grip;
    },
    { pointer: { capture: false, keys: false }, filterTaps: true },
  );
}
