"use client";

import { useStore } from "zustand";
import { useShallow } from "zustand/react/shallow";
import type { FitSnapshot, FitStore } from "@/scene/store";

/**
 * A slice of the live fit: the component renders again only when the slice changes (compared field by
 * field), so a panel that does not show what a slider step changed is left alone.
 */
export function useFit<T>(store: FitStore, select: (s: FitSnapshot) => T): T {
  return useStore(store, useShallow(select));
}
