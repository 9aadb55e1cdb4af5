import { BufferGeometry, DoubleSide, Float32BufferAttribute, Group, LineDashedMaterial, LineLoop, Mesh, MeshBasicMaterial, ShapeUtils, Vector2, type Plane } from "three";
import type { KitResult, Study, Vec2 } from "@/geometry";
import { FIT, printed } from "@/model/palette";
import { ccw, outlineRing } from "../outline";
import { toWorld } from "../solids";

// The kit's base-gasket port windows laid over the case's passages at the deck, as the plan draws them:
// each window a dash-dotted outline over a see-through fill in the palette's port colour (its wall-below-
// minimum colour where the core says the matched passage leaves too little wall), each passage open at the
// deck outlined dotted in the passage colour. Drawn from the study and the core's result; nothing measured.

/** Height of the overlay above the deck, so it is never hidden in the deck's face. */
export const OVERLAY_LIFT_MM = 0.3;

/** The overlay's materials, shared by its objects (clipped by the section plane like the solids). */
export class PortOverlayMaterials {
  readonly port: LineDashedMaterial;
  readonly portLow: LineDashedMaterial;
  readonly portFill: MeshBasicMaterial;
  readonly portLowFill: MeshBasicMaterial;
  readonly passage: LineDashedMaterial;

  constructor(clip: Plane[] = []) {
    const line = (color: string, dashSize: number, gapSize: number) => new LineDashedMaterial({ color, dashSize, gapSize, depthTest: false, clippingPlanes: clip });
    const fill = (color: string) => new MeshBasicMaterial({ color, transparent: true, opacity: 0.28, depthWrite: false, side: DoubleSide, clippingPlanes: clip });
    this.port = line(printed(FIT.port), 1.6, 0.6);
    this.portLow = line(printed(FIT.wallLow), 1.6, 0.6);
    this.portFill = fill(printed(FIT.port));
    this.portLowFill = fill(printed(FIT.wallLow));
    this.passage = line(printed(FIT.passage), 0.4, 0.6);
  }

  dispose() {
    for (const m of [this.port, this.portLow, this.portFill, this.portLowFill, this.passage]) m.dispose();
  }
}

function loop(ring: readonly Vec2[], lift: number): BufferGeometry {
  const pos = ring.flatMap(([x, y]) => toWorld(x, y, -lift));
  const g = new BufferGeometry();
  g.setAttribute("position", new Float32BufferAttribute(pos, 3));
  return g;
}

function flat(ring: readonly Vec2[], lift: number): BufferGeometry {
  const r = ccw(ring);
  const tris = ShapeUtils.triangulateShape(r.map(([x, y]) => new Vector2(x, y)), []);
  const pos = tris.flatMap((t) => t.flatMap((i) => toWorld(r[i][0], r[i][1], -lift)));
  const g = new BufferGeometry();
  g.setAttribute("position", new Float32BufferAttribute(pos, 3));
  g.computeBoundingSphere();
  return g;
}

/**
 * The overlay of kit `kitIndex`: a group named "port-windows" holding, per window, a fill and an outline
 * (userData `{ port: label, ok }`) and, per passage open at the deck, an outline (userData `{ passage: label }`).
 * Empty when the kit has no base-gasket ports. Dispose of it with `disposeOverlay`.
 */
export function portOverlay(study: Study, kitIndex: number, result: KitResult, materials: PortOverlayMaterials): Group {
  const group = new Group();
  group.name = "port-windows";
  const windows = study.kits[kitIndex]?.baseGasket?.ports ?? [];
  if (windows.length === 0) return group;
  for (const p of study.case.pockets) {
    if (p.startDepthMm > 0) continue;
    const line = new LineLoop(loop(outlineRing(p.outline), OVERLAY_LIFT_MM / 2), materials.passage);
    line.computeLineDistances();
    line.userData = { passage: p.label };
    line.renderOrder = 7;
    group.add(line);
  }
  for (const w of windows) {
    const ring = outlineRing(w.outline);
    const ok = result.ports.find((r) => r.portLabel === w.label)?.ok !== false;
    const fill = new Mesh(flat(ring, OVERLAY_LIFT_MM), ok ? materials.portFill : materials.portLowFill);
    fill.userData = { port: w.label, ok, part: "fill" };
    fill.renderOrder = 6;
    const line = new LineLoop(loop(ring, OVERLAY_LIFT_MM), ok ? materials.port : materials.portLow);
    line.computeLineDistances();
    line.userData = { port: w.label, ok, part: "outline" };
    line.renderOrder = 8;
    group.add(fill, line);
  }
  return group;
}

/** Frees the overlay's geometries (its materials are shared and freed with PortOverlayMaterials). */
export function disposeOverlay(group: Group) {
  for (const o of group.children) (o as Mesh | LineLoop).geometry.dispose();
  group.clear();
}
