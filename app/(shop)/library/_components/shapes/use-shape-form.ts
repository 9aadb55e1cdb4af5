"use client";

import type { LengthUnits } from "@/geometry";
import { useMemo, useRef, useState } from "react";
import { useStore } from "zustand";
import { convertLengthTexts } from "@/app/_ui/form/units-text";
import type { OutsideValues } from "@/app/_ui/form/use-library-form";
import { createShapeStore, switchUnits, type ShapeDoc } from "./shape-store";

/**
 * A library form's shape store beside react-hook-form: the store (its doc written in mm, shown in the form's
 * units), what the form reads from it on save and on a unit switch, and whether its shapes changed since the
 * last save.
 */
export function useShapeForm<V>(firstDoc: () => ShapeDoc, initialUnits: LengthUnits, merge: (values: V, doc: ShapeDoc) => V) {
  const [store] = useState(() => createShapeStore(convertLengthTexts(firstDoc(), "mm", initialUnits), initialUnits));
  const saved = useRef(store.getState().doc);
  const [mergeFirst] = useState(() => merge);
  const outside = useMemo<OutsideValues<V>>(
    () => ({ merge: (v) => mergeFirst(v, store.getState().doc), switchUnits: (to) => switchUnits(store, to), saved: () => void (saved.current = store.getState().doc) }),
    [store, mergeFirst],
  );
  const shapesDirty = useStore(store, (s) => s.doc !== saved.current);
  return { store, outside, shapesDirty };
}
