"use client";

import { useFrame, useThree } from "@react-three/fiber";
import { useEffect, useRef } from "react";
import type { FitStore } from "../store";
import { drawnKey } from "./drawn-key";
import { drawsTheSame, type FitObjects } from "./fit-objects";
import { TARGET, cameraPosition, type ViewState } from "./view";

/** What the studio can ask of the canvas. */
export interface FitCanvasApi {
  /** A PNG data URL of the view as it is now, labels included. */
  snapshot(): string;
}

declare global {
  interface Window {
    /** Input-to-frame times of the cut sliders, ms (read by the benchmark). */
    __fitFrames?: number[];
  }
}

/**
 * Renders on demand, after the scene updated from the store, and records the time from the input to this frame.
 * The canvas element carries the key of what its last frame shows (`data-drawn`), so anyone can wait for a change to be drawn.
 */
export function FrameRenderer({ store, view, fit, onReady }: { store: FitStore; view: ViewState; fit: FitObjects; onReady?: (api: FitCanvasApi) => void }) {
  const gl = useThree((s) => s.gl);
  const scene = useThree((s) => s.scene);
  const camera = useThree((s) => s.camera);
  const invalidate = useThree((s) => s.invalidate);
  const advance = useThree((s) => s.advance);
  const size = useThree((s) => s.size);
  const measured = useRef(0);
  const viewRef = useRef(view);
  useEffect(() => {
    viewRef.current = view;
  }, [view]);

  // A cut input is drawn at once, inside the input's own task, so the canvas is ready for the next
  // composited frame; anything else waits for the next animation frame.
  useEffect(() => {
    let last = store.get();
    return store.subscribe(() => {
      const snap = store.get();
      const at = snap.inputAt;
      if (at > 0 && at !== measured.current) advance(performance.now());
      else if (!drawsTheSame(last, snap, viewRef.current)) invalidate();
      last = snap;
    });
  }, [store, invalidate, advance]);
  useEffect(() => {
    onReady?.({
      snapshot: () => {
        gl.render(scene, camera);
        // The labels are HTML over the canvas: drawn onto a copy of the frame where they are shown.
        const frame = gl.domElement;
        const sheet = document.createElement("canvas");
        sheet.width = frame.width;
        sheet.height = frame.height;
        const ctx = sheet.getContext("2d");
        if (!ctx) return frame.toDataURL("image/png");
        ctx.drawImage(frame, 0, 0);
        fit.drawLabels(ctx, frame.width / Math.max(1, size.width));
        return sheet.toDataURL("image/png");
      },
    });
  }, [gl, scene, camera, fit, size, onReady]);

  useFrame(() => {
    const t0 = performance.now();
    gl.render(scene, camera);
    performance.measure("studio:render", { start: t0, duration: performance.now() - t0 });
    const snap = store.get();
    gl.domElement.setAttribute("data-drawn", drawnKey(viewRef.current, snap.kitIndex, snap.study.cut));
    const at = snap.inputAt;
    if (at > 0 && at !== measured.current) {
      measured.current = at;
      const ms = performance.now() - at;
      (window.__fitFrames ??= []).push(ms);
      performance.measure("studio:input-to-frame", { start: at, duration: ms });
      requestAnimationFrame(() => performance.measure("studio:input-to-animation-frame", { start: at, duration: performance.now() - at }));
    }
  }, 1);
  return null;
}

/** Moves the camera to the chosen preset whenever the preset (or its nonce) changes. */
export function CameraRig({ view }: { view: ViewState }) {
  const camera = useThree((s) => s.camera);
  const controls = useThree((s) => s.controls) as unknown as { target: { copy(v: unknown): void }; update(): void } | null;
  const invalidate = useThree((s) => s.invalidate);
  const angle = view.camera === "section" ? view.sectionAngleDeg : 0;
  useEffect(() => {
    cameraPosition(view.camera, angle, camera.position);
    camera.lookAt(TARGET);
    if (controls) {
      controls.target.copy(TARGET);
      controls.update();
    }
    invalidate();
  }, [view.camera, view.cameraNonce, angle, camera, controls, invalidate]);
  return null;
}
