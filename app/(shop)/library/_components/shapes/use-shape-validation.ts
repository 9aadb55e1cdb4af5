"use client";

import { useCallback, useEffect } from "react";
import type { FieldValues, UseFormReturn } from "react-hook-form";
import type { ShapeStore } from "./shape-store";

/**
 * Validates the whole form again whenever the shapes change, except in the middle of a drag (the
 * store's history is paused then; the drag's end validates once). Returns the validation, for callers
 * that know a change is complete.
 */
export function useShapeValidation<FV extends FieldValues, C, T extends FieldValues>(store: ShapeStore, form: UseFormReturn<FV, C, T>) {
  const validate = useCallback(() => void form.trigger(), [form]);
  useEffect(
    () =>
      store.subscribe((s, prev) => {
        if (s.doc !== prev.doc && store.temporal.getState().isTracking) validate();
      }),
    [store, validate],
  );
  return validate;
}
