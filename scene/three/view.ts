import { Vector3 } from "three";

// Camera presets and the section plane, in the scene's frame (y up, world = (x, −z, −y) of the core).

export type CameraPreset = "plan" | "section" | "three-quarter";

/** What the user chose to see (slow-changing: toolbar state). */
export interface ViewState {
  readonly section: boolean;
  /** Direction of the section line in the plan, degrees counter-clockwise from +x. */
  readonly sectionAngleDeg: number;
  readonly camera: CameraPreset;
  /** Bumped to re-apply the same preset after orbiting. */
  readonly cameraNonce: number;
  /** Factor on the cut axis's offset and tilt from the skirt centre. */
  readonly exaggeration: number;
  /** Show every kit's skirt at once. */
  readonly overlay: boolean;
  /** Large labels for showing a customer. */
  readonly customer: boolean;
  readonly units: "mm" | "in";
  /** Show the kit's base-gasket port windows over the case's passages (shown unless false). */
  readonly ports?: boolean;
}

export const TARGET = new Vector3(0, -9, 0);
const DISTANCE = 190;

/** Normal of the kept half-space of the section plane (points with n·p ≥ 0 stay): the removed side faces the viewer of the section preset. */
export function sectionNormal(angleDeg: number, out = new Vector3()): Vector3 {
  const t = (angleDeg * Math.PI) / 180;
  return out.set(-Math.sin(t), 0, -Math.cos(t));
}

/** Camera position for a preset. */
export function cameraPosition(preset: CameraPreset, sectionAngleDeg: number, out = new Vector3()): Vector3 {
  if (preset === "plan") return out.set(TARGET.x, TARGET.y + DISTANCE * 1.4, TARGET.z + 0.01);
  if (preset === "section") {
    const n = sectionNormal(sectionAngleDeg).multiplyScalar(-1);
    return out.set(TARGET.x + n.x * DISTANCE * 1.1, TARGET.y + DISTANCE * 0.08, TARGET.z + n.z * DISTANCE * 1.1);
  }
  return out.set(TARGET.x + DISTANCE * 0.5, TARGET.y + DISTANCE * 0.55, TARGET.z + DISTANCE * 0.67);
}

