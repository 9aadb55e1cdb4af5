"use client";

import { useFrame, useThree } from "@react-three/fiber";
import { useEffect, useMemo, useState, useSyncExternalStore } from "react";
import { caseGeometry, flangeGeometry, skirtGeometry } from "../fit-model";
import type { FitStore } from "../store";
import { FitObjects } from "./fit-objects";
import type { ViewState } from "./view";

function useDisposed<T extends { dispose(): void } | null>(value: T): T {
  useEffect(() => () => value?.dispose(), [value]);
  return value;
}

/** Everything in the fit view. Slow parts (case, skirts, flange) rebuild in useMemo; the cut, the interference and the labels follow the store inside useFrame. */
export function FitScene({ store, view }: { store: FitStore; view: ViewState }) {
  const cs = useSyncExternalStore(store.subscribe, () => store.get().study.case);
  const kits = useSyncExternalStore(store.subscribe, () => store.get().study.kits);
  const kitIndex = useSyncExternalStore(store.subscribe, () => store.get().kitIndex);
  const skirtKey = useSyncExternalStore(store.subscribe, () =>
    store.get().result.kits.map((k) => `${k.skirt.diameterMm},${k.skirt.protrusionMm},${k.skirt.gasketMm},${k.skirt.centerMm.join(",")}`).join("|"),
  );
  const invalidate = useThree((s) => s.invalidate);
  const [fit] = useState(() => new FitObjects());
  useEffect(() => () => fit.dispose(), [fit]);
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

  useFrame(() => {
    const t0 = performance.now();
    fit.apply(store.get());
    performance.measure("studio:scene-update", { start: t0, duration: performance.now() - t0 });
  });

  return (
    <group>
      <mesh geometry={caseGeom} material={fit.materials.case} />
      <primitive object={fit.cut} />
      <primitive object={fit.hit} />
      <primitive object={fit.ports} />
      {kits.map((kit, i) =>
        skirts[i] ? <mesh key={kit.id} geometry={skirts[i] ?? undefined} material={fit.skirtMaterial(i)} visible={i === kitIndex || view.overlay} renderOrder={i === kitIndex ? 0 : 3} /> : null,
      )}
      {/* From above the flange would hide the deck, the mouth and the cut: the plan preset leaves it out. */}
      {flange && <mesh geometry={flange.flange} material={fit.materials.flange} visible={view.camera !== "plan"} />}
      {flange?.gasket && <mesh geometry={flange.gasket} material={fit.materials.gasket} visible={view.camera !== "plan"} />}
      <primitive object={fit.wallLine} />
      {Object.entries(fit.labels).map(([name, l]) => (
        <primitive key={name} object={l.sprite} />
      ))}
    </group>
  );
}
