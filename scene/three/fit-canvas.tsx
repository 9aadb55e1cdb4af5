"use client";

import { OrbitControls } from "@react-three/drei";
import { Canvas } from "@react-three/fiber";
import { useEffect, useRef, useState } from "react";
import { SCENE } from "@/model/palette";
import type { FitStore } from "../store";
import { quietClockDeprecation } from "./console";
import { FitObjects } from "./fit-objects";
import { CameraRig, FrameRenderer, type FitCanvasApi } from "./frame";
import { FitScene } from "./fit-scene";
import { cameraPosition, type ViewState } from "./view";

export type { FitCanvasApi } from "./frame";

export interface FitCanvasProps {
  readonly store: FitStore;
  readonly view: ViewState;
  readonly onReady?: (api: FitCanvasApi) => void;
}

const START = cameraPosition("three-quarter", 0).toArray();
quietClockDeprecation();

/**
 * The 3D fit view: case, planned cut, skirt and flange, interference, drawn from the core's result in the
 * store, with the labels in a layer of HTML over the canvas (decoration: the view box is a labelled image).
 */
export default function FitCanvas({ store, view, onReady }: FitCanvasProps) {
  const [fit] = useState(() => new FitObjects());
  const layer = useRef<HTMLDivElement>(null);
  useEffect(() => {
    layer.current?.append(...Object.values(fit.labels).map((l) => l.element));
    return () => fit.dispose();
  }, [fit]);
  return (
    <div className="relative h-full w-full">
      <Canvas
        frameloop="demand"
        dpr={[1, 1.5]}
        gl={{ preserveDrawingBuffer: true, antialias: true }}
        camera={{ fov: 30, near: 1, far: 4000, position: START }}
        onCreated={({ gl }) => {
          gl.localClippingEnabled = true;
        }}
        data-testid="fit-canvas"
      >
        <color attach="background" args={[SCENE.background]} />
        <hemisphereLight args={[SCENE.skyLight, SCENE.groundLight, 1.6]} />
        <directionalLight position={[90, 160, 120]} intensity={1.6} />
        <directionalLight position={[-140, 40, -90]} intensity={0.5} />
        <FitScene store={store} view={view} fit={fit} />
        <OrbitControls makeDefault enableDamping={false} />
        <CameraRig view={view} />
        <FrameRenderer store={store} view={view} fit={fit} onReady={onReady} />
      </Canvas>
      <div ref={layer} aria-hidden="true" className="pointer-events-none absolute inset-0 overflow-hidden select-none" data-testid="fit-labels" />
    </div>
  );
}
