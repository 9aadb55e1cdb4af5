"use client";

import { memo } from "react";
import type { CameraPreset, ViewState } from "@/scene/three/view";

export type CompareMode = "one" | "overlay" | "side";

interface Props {
  readonly view: ViewState;
  readonly compare: CompareMode;
  readonly customer: boolean;
  readonly onView: (patch: Partial<ViewState>) => void;
  readonly onCompare: (m: CompareMode) => void;
  readonly onSnapshot: () => void;
  readonly multipleKits: boolean;
  /** The kit on show has base-gasket port windows to lay over the case's passages. */
  readonly portWindows?: boolean;
}

const PRESETS: [CameraPreset, string][] = [
  ["three-quarter", "Three-quarter"],
  ["plan", "From above"],
  ["section", "Face the section"],
];

/** View controls: camera presets, the section plane, the exaggeration, the comparison and the snapshot. */
export const Toolbar = memo(function Toolbar({ view, compare, customer, onView, onCompare, onSnapshot, multipleKits, portWindows }: Props) {
  return (
    <div className="flex flex-wrap items-center gap-x-4 gap-y-2 text-sm" role="toolbar" aria-label="View">
      <div className="flex gap-1" role="group" aria-label="Camera">
        {PRESETS.map(([p, label]) => (
          <button
            key={p}
            type="button"
            className={`btn-quiet ${view.camera === p ? "border-accent text-accent" : ""}`}
            aria-pressed={view.camera === p}
            data-testid={`camera-${p}`}
            onClick={() => onView({ camera: p, cameraNonce: view.cameraNonce + 1 })}
          >
            {label}
          </button>
        ))}
      </div>
      <label className="flex items-center gap-2">
        <input type="checkbox" className="accent-accent" checked={view.section} onChange={(e) => onView({ section: e.target.checked })} data-testid="section-toggle" />
        Cut away the front
      </label>
      <label className={`flex items-center gap-2 ${view.section ? "" : "opacity-50"}`}>
        Section at
        <input
          type="range"
          min={0}
          max={180}
          step={5}
          value={view.sectionAngleDeg}
          disabled={!view.section}
          aria-valuetext={`${view.sectionAngleDeg} degrees from the x axis`}
          onChange={(e) => onView({ sectionAngleDeg: Number(e.target.value) })}
          data-testid="section-angle"
          className="w-24 accent-accent"
        />
        <span className="num w-9">{view.sectionAngleDeg}°</span>
      </label>
      {portWindows && (
        <label className="flex items-center gap-2">
          <input type="checkbox" className="accent-accent" checked={view.ports !== false} onChange={(e) => onView({ ports: e.target.checked })} data-testid="ports-toggle" />
          Kit&apos;s port windows
        </label>
      )}
      {!customer && (
        <label className="flex items-center gap-2">
          Tilt and offset
          <select className="field-input mt-0 w-auto py-1" value={view.exaggeration} onChange={(e) => onView({ exaggeration: Number(e.target.value) })} data-testid="exaggeration">
            <option value={1}>true to scale</option>
            <option value={10}>shown ×10</option>
            <option value={50}>shown ×50</option>
          </select>
        </label>
      )}
      {multipleKits && (
        <label className="flex items-center gap-2">
          Compare
          <select className="field-input mt-0 w-auto py-1" value={compare} onChange={(e) => onCompare(e.target.value as CompareMode)} data-testid="compare">
            <option value="one">one kit</option>
            <option value="overlay">all kits overlaid</option>
            <option value="side">side by side</option>
          </select>
        </label>
      )}
      <button type="button" className="btn-quiet" onClick={onSnapshot} data-testid="snapshot">
        Save a picture (PNG)
      </button>
    </div>
  );
});
