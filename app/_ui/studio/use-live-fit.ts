"use client";

import { useCallback, useEffect, useMemo, useRef, useState, useSyncExternalStore } from "react";
import { evaluateStudy, type Study, type StudyResult } from "@/geometry";
import { createFitStore, type FitSnapshot } from "@/scene/store";

export type CutDraft = { diameterMm?: number; depthMm?: number };

/** The study with a new cut: the study's own cut (centring offset kept) with the diameter and depth replaced. */
export function withCut(study: Study, cut: CutDraft): Study {
  return { ...study, cut: { ...study.cut, diameterMm: cut.diameterMm, depthMm: cut.depthMm } };
}

/**
 * The live fit: a store the 3D view reads every frame, and a React view of it for the panels. A cut
 * change re-evaluates with the core in the browser, at once, and the panels follow one render later.
 */
export function useLiveFit(study: Study, result: StudyResult, initialKit: number) {
  const store = useMemo(() => createFitStore({ study, result, kitIndex: initialKit, inputAt: 0 }), [study, result, initialKit]);
  const snap: FitSnapshot = useSyncExternalStore(store.subscribe, store.get, store.get);
  const pending = useRef<number | null>(null);
  const setCut = useCallback(
    (cut: CutDraft, inputAt = performance.now()) => {
      const s = store.get();
      const next = withCut(s.study, cut);
      // The kit on show first, so its frame is not kept waiting; each kit's result depends only on the
      // study and that kit, so this is the very result the full evaluation gives for it.
      const t0 = performance.now();
      const shown = evaluateStudy({ ...next, kits: [next.kits[s.kitIndex]] }).kits[0];
      performance.measure("studio:evaluate", { start: t0, duration: performance.now() - t0 });
      store.set({ study: next, result: { ...s.result, kits: s.result.kits.map((k, i) => (i === s.kitIndex ? shown : k)) }, inputAt });
      // Then every kit, after that frame, for the lineup and the overlays (coalesced while dragging).
      if (pending.current !== null) cancelAnimationFrame(pending.current);
      pending.current = requestAnimationFrame(() => {
        pending.current = null;
        setTimeout(() => {
          const now = store.get();
          if (now.study !== next) return;
          const full = evaluateStudy(next);
          store.set({ result: { ...full, kits: full.kits.map((k, i) => (i === now.kitIndex ? now.result.kits[i] : k)) } });
        }, 0);
      });
    },
    [store],
  );
  const setKit = useCallback((kitIndex: number) => store.set({ kitIndex }), [store]);
  return { store, snap, setCut, setKit };
}

/** A value that follows `value` but lags behind it while it changes quickly (for heavy panels such as SVG drawings). */
export function useSettled<T>(value: T, ms = 120): T {
  const [v, setV] = useState(value);
  const t = useRef<ReturnType<typeof setTimeout> | null>(null);
  useEffect(() => {
    if (t.current) clearTimeout(t.current);
    t.current = setTimeout(() => setV(value), ms);
    return () => {
      if (t.current) clearTimeout(t.current);
    };
  }, [value, ms]);
  return v;
}
