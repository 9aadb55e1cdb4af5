"use client";

import type { KeyboardEvent } from "react";
import type { LengthUnits } from "@/geometry";
import { MM_PER_INCH } from "@/geometry/units";
import { SNAP, type ShapeStore } from "./shape-store";

// The keys of the plan: +, − and 0 zoom; on a focused point the arrows nudge it one grid step (Shift:
// ten; Alt: off the grid), Delete removes a corner, Enter picks the point.

const ARROWS: Record<string, [number, number]> = { ArrowLeft: [-1, 0], ArrowRight: [1, 0], ArrowUp: [0, 1], ArrowDown: [0, -1] };

type Options = {
  store: ShapeStore;
  units: LengthUnits;
  /** Names the point that keeps the focus when the drawing is replaced (null: none). */
  keepFocus: (key: string | null) => void;
  /** Handles a zoom key; true when it was one. */
  zoomKey: (key: string) => boolean;
  onCommit: () => void;
};

// The drawing's y runs down: a handle at (cx, cy) stands for the point (cx, −cy) in mm.
const pointOf = (el: Element): [number, number] => [Number(el.getAttribute("cx")), -Number(el.getAttribute("cy"))];

export function usePlanKeys({ store, units, keepFocus, zoomKey, onCommit }: Options) {
  return (e: KeyboardEvent<HTMLDivElement>) => {
    if (!e.ctrlKey && !e.metaKey && !e.altKey && zoomKey(e.key)) return e.preventDefault();
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
      keepFocus(key);
      act.movePoint(key, [x + d[0], y + d[1]], !e.altKey);
    } else if ((e.key === "Delete" || e.key === "Backspace") && kind === "corner") {
      const [shape, i] = key.split(":");
      keepFocus(null);
      act.removeCorner(shape, Number(i));
    } else if (e.key === "Enter" || e.key === " ") {
      store.setState({ selected: store.getState().selected === key ? null : key });
    } else return;
    e.preventDefault();
    onCommit();
  };
}
