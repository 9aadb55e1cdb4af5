import { createStore, type StoreApi } from "zustand/vanilla";
import type { Study, StudyResult } from "@/geometry";

// A small store for what changes on every pointer move: the study with the cut being dragged and the
// core's result for it. The 3D view reads it inside useFrame; React reads slices of it through selectors.

/** What the studio shows right now. */
export interface FitSnapshot {
  readonly study: Study;
  readonly result: StudyResult;
  readonly kitIndex: number;
  /** performance.now() of the input that produced this snapshot (0 when none), for the input-to-frame figure. */
  readonly inputAt: number;
}

/** A zustand store of one snapshot, with the short names the scene reads it by. */
export interface FitStore extends StoreApi<FitSnapshot> {
  get(): FitSnapshot;
  /** Merges the fields given into a new snapshot; listeners run after every set. */
  set(next: Partial<FitSnapshot>): void;
}

/** A store holding one snapshot. */
export function createFitStore(initial: FitSnapshot): FitStore {
  const api = createStore<FitSnapshot>()(() => initial);
  return { ...api, get: api.getState, set: (next) => api.setState(next) };
}
