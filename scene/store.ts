import type { Study, StudyResult } from "@/geometry";

// A tiny store for what changes on every pointer move: the study with the cut being dragged and the
// core's result for it. The 3D view reads it inside useFrame; React reads it through a subscription.

/** What the studio shows right now. */
export interface FitSnapshot {
  readonly study: Study;
  readonly result: StudyResult;
  readonly kitIndex: number;
  /** performance.now() of the input that produced this snapshot (0 when none), for the input-to-frame figure. */
  readonly inputAt: number;
}

export interface FitStore {
  get(): FitSnapshot;
  set(next: Partial<FitSnapshot>): void;
  subscribe(listener: () => void): () => void;
}

/** A store holding one snapshot; listeners run after every set. */
export function createFitStore(initial: FitSnapshot): FitStore {
  let snap = initial;
  const listeners = new Set<() => void>();
  return {
    get: () => snap,
    set(next) {
      snap = { ...snap, ...next };
      for (const l of listeners) l();
    },
    subscribe(listener) {
      listeners.add(listener);
      return () => listeners.delete(listener);
    },
  };
}
