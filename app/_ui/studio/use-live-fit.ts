"use client";

import { useCallback, useEffect, useMemo, useRef, useState } from "react";
import type { Study, StudyResult } from "@/geometry";
import { evaluateStudy } from "@/geometry/evaluate";
import { createFitStore } from "@/scene/store";

export type CutDraft = { diameterMm?: number; depthMm?: number };

/** The study with a new cut: the study's own cut (centring offset kept) with the diameter and depth replaced. */
export function withCut(study: Study, cut: CutDraft): Study {
  return { ...study, cut: { ...study.cut, diameterMm: cut.diameterMm, depthMm: cut.depthMm } };
}

/** How long a drag must rest before every kit is evaluated for the cut it rests at. */
export const SETTLE_MS = 150;

/**
 * The live fit: a store the 3D view reads every frame and the panels read slices of. A cut
 * change re-evaluates the kit on show with the core in the browser, at once; the other kits (the lineup,
 * the overlays) follow once the cut settles: after the next frame when the drag ends or a value is typed,
 * or when a drag has rested for SETTLE_MS.
 */
export function useLiveFit(study: Study, result: StudyResult, initialKit: number) {
  const store = useMemo(() => createFitStore({ study, result, kitIndex: initialKit, inputAt: 0 }), [study, result, initialKit]);
  const pending = useRef<{ frame: number | null; timer: ReturnType<typeof setTimeout> | null }>({ frame: null, timer: null });
  // The study the other kits' results are for.
  const restFor = useRef<Study>(study);

  const cancelRest = useCallback(() => {
    const p = pending.current;
    if (p.frame !== null) cancelAnimationFrame(p.frame);
    if (p.timer !== null) clearTimeout(p.timer);
    pending.current = { frame: null, timer: null };
  }, []);
  const evaluateRest = useCallback(() => {
    cancelRest();
    const now = store.get();
    if (restFor.current === now.study) return;
    restFor.current = now.study;
    const full = evaluateStudy(now.study);
    // The kit on show keeps its result object (the same figures), so the scene has nothing to rebuild.
    store.set({ result: { ...full, kits: full.kits.map((k, i) => (i === now.kitIndex ? now.result.kits[i] : k)) } });
  }, [store, cancelRest]);
  /** Evaluates the other kits after the next frame (`soon`), or once no change came for SETTLE_MS. */
  const settle = useCallback(
    (soon = true) => {
      cancelRest();
      if (!soon) pending.current.timer = setTimeout(evaluateRest, SETTLE_MS);
      else
        pending.current.frame = requestAnimationFrame(() => {
          pending.current.frame = null;
          pending.current.timer = setTimeout(evaluateRest, 0);
        });
    },
    [cancelRest, evaluateRest],
  );
  useEffect(() => cancelRest, [store, cancelRest]);

  const setCut = useCallback(
    (cut: CutDraft, inputAt = performance.now(), final = true) => {
      const s = store.get();
      const next = withCut(s.study, cut);
      // The kit on show first, so its frame is not kept waiting; each kit's result depends only on the
      // study and that kit, so this is the very result the full evaluation gives for it.
      const t0 = performance.now();
      const shown = evaluateStudy({ ...next, kits: [next.kits[s.kitIndex]] }).kits[0];
      performance.measure("studio:evaluate", { start: t0, duration: performance.now() - t0 });
      store.set({ study: next, result: { ...s.result, kits: s.result.kits.map((k, i) => (i === s.kitIndex ? shown : k)) }, inputAt });
      settle(final);
    },
    [store, settle],
  );
  // Another kit goes on show with its result for the cut as it is now.
  const setKit = useCallback(
    (kitIndex: number) => {
      evaluateRest();
      store.set({ kitIndex });
    },
    [store, evaluateRest],
  );
  return { store, setCut, setKit, settle };
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
