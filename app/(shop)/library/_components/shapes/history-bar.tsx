"use client";

import { useEffect } from "react";
import { useStore } from "zustand";
import type { ShapeStore } from "./shape-store";

/** True for a key press that a text field undoes by itself. */
const inText = (t: EventTarget | null) => t instanceof HTMLElement && (t.tagName === "INPUT" || t.tagName === "TEXTAREA" || t.isContentEditable);

/** The two steps through the shapes' history, with their keys. */
const STEPS = [
  { label: "Undo", keys: "Control+Z", take: (store: ShapeStore) => store.temporal.getState().undo() },
  { label: "Redo", keys: "Control+Shift+Z", take: (store: ShapeStore) => store.temporal.getState().redo() },
] as const;

/**
 * Undo and redo of the shapes, as buttons and as Ctrl+Z / Ctrl+Shift+Z (or Ctrl+Y) anywhere in the
 * form except inside a text field, which keeps its own undo of what is being typed.
 */
export function HistoryBar({ store, scope, onChange }: { store: ShapeStore; scope: React.RefObject<HTMLElement | null>; onChange: () => void }) {
  const past = useStore(store.temporal, (t) => t.pastStates.length);
  const future = useStore(store.temporal, (t) => t.futureStates.length);
  useEffect(() => {
    const el = scope.current;
    if (!el) return;
    const onKey = (e: KeyboardEvent) => {
      if (!(e.ctrlKey || e.metaKey) || inText(e.target)) return;
      const k = e.key.toLowerCase();
      const t = store.temporal.getState();
      if (k === "z" && !e.shiftKey) t.undo();
      else if ((k === "z" && e.shiftKey) || k === "y") t.redo();
      else return;
      e.preventDefault();
      onChange();
    };
    el.addEventListener("keydown", onKey);
    return () => el.removeEventListener("keydown", onKey);
  }, [store, scope, onChange]);
  return (
    <div className="flex items-center gap-2" role="group" aria-label="Undo and redo of the shapes">
      {STEPS.map((step) => (
        <button
          key={step.label}
          type="button"
          className="btn-quiet"
          disabled={(step.label === "Undo" ? past : future) === 0}
          aria-keyshortcuts={step.keys}
          onClick={() => {
            step.take(store);
            onChange();
          }}
        >
          {step.label}
        </button>
      ))}
      <span className="text-xs text-ink-3 num" aria-live="polite">
        {past ? `${past} change${past === 1 ? "" : "s"} to undo` : "nothing to undo"}
      </span>
    </div>
  );
}
