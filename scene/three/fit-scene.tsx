"use client";

import { useFrame, useThree } from "@react-three/fiber";
import { useEffect, useMemo, useSyncExternalStore } from "react";
import { caseGeometry, flangeGeometry, skirtGeometry } from "../fit-model";
import type { FitStore } from "../store";
import type { FitObjects } from "./fit-objects";
import type { ViewState } from "./view";

function useDisposed<T extends { dispose(): void } | null>(value: T): T {
  useEffect(() => () => value?.dispose(), [value]);
  return value;
}

/**
 * Everything in the fit view. Slow parts (case, skirts, flange) rebuild in useMemo; the cut, the interference
 * and the labels (in `fit`, made and freed by the canvas) follow the store inside useFrame.
 */
export function FitScene({ store, view, fit }: { store: FitStore; view: ViewState; fit: FitObjects }) {
  const cs = useSyncExternalStore(store.subscribe, () => store.get().study.case);
  const kits = useSyncExternalStore(store.subscribe, () => store.get().study.kits);
  const kitIndex = useSyncExternalStore(store.subscribe, () => store.get().kitIndex);
  const skirtKey = useSyncExternalStore(store.subscribe, () =>
    store.get().result.kits.map((k) => `${k.skirt.diameterMm},${k.skirt.protrusionMm},${k.skirt.gasketMm},${k.skirt.centerMm.join(",")}`).join("|"),
  );
  const invalidate = useThree((s) => s.invalidate);
  useEffect(() => {
    fit.setView(view);
    invalidate();
  }, [fit, view, invalidate]);

  const caseGeom = useDisposed(useMemo(() => caseGeometry(cs), [cs]));
  const skirts = useMemo(() => {
    const r = store.get().result;
    return skirtKey ? kits.map((kit, i) => skirtGeometry(r.kits[i], kit)) : [];
  }, [kits, skirtKey, store]);
  useEffect(() => () => skirts.forEach((g) => g?.dispose()), [skirts]);
  const flange = useMemo(() => {
    const k = store.get().result.kits[kitIndex];
    return skirtKey ? flangeGeometry(k, kits[kitIndex], cs.studHoleDiameterMm) : null;
  }, [kits, kitIndex, skirtKey, store, cs.studHoleDiameterMm]);
  useEffect(
    () => () => {
      flange?.flange.dispose();
      flange?.gasket?.dispose();
    },
    [flange],
  );

  useFrame(({ camera, size }) => {
    const t0 = performance.now();
    fit.apply(store.get());
    fit.placeLabelsOnScreen(camera, size.width, size.height);
    performance.measure("studio:scene-update", { start: t0, duration: performance.now() - t0 });
  });

  return (
    <group>
      <mesh geometry={caseGeom} material={fit.materials.case} />
      <primitive object={fit.cut} />
      <primitive object={fit.hit} />
      <primitive object={fit.hitBelow} />
      <primitive object={fit.ports} />
      {kits.map((kit, i) =>
        skirts[i] ? <mesh key={kit.id} geometry={skirts[i] ?? undefined} material={fit.skirtMaterial(i)} visible={i === kitIndex || view.overlay} renderOrder={i === kitIndex ? 0 : 3} /> : null,
      )}
      {/* From above the flange would hide the deck, the mouth and the cut: the plan preset leaves it out. */}
      {flange && <mesh geometry={flange.flange} material={fit.materials.flange} visible={view.camera !== "plan"} />}
      {flange?.gasket && <mesh geometry={flange.gasket} material={fit.materials.gasket} visible={view.camera !== "plan"} />}
      <primitive object={fit.wallLine} />
    </group>
  );
}
