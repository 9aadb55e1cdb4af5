// The solids of the 3D fit view (three.js geometry), built from the core's output only: where the core
// put the skirt and the cut, how deep, how wide. Nothing here decides whether anything clears.

import { BufferGeometry, Float32BufferAttribute, ShapeUtils, Vector2 } from "three";
import type { CaseProfile, CylinderKit, KitResult, Study } from "@/geometry";
import { drawnCutAxis, FLANGE_DRAWN_MM, flangeRadiusMm, type InterferenceBand, interferenceRegions } from "./fit";
import { circleRing, outlineRing } from "./outline";
import { ringMinus } from "./regions";
import { extrudeRegions } from "./solids";

export * from "./fit";


/** The case around the mouth: the deck outline from the deck down to the mouth's depth, less the mouth, the stud holes and the pockets (each from where it starts). */
export function caseGeometry(cs: CaseProfile): BufferGeometry {
  const M = cs.mouth.depthMm;
  const cuts = [0, ...cs.pockets.map((p) => p.startDepthMm).filter((z) => z > 0 && z < M), M];
  const levels = [...new Set(cuts)].sort((a, b) => a - b);
  const deck = outlineRing(cs.deck);
  const mouth = outlineRing(cs.mouth.outline);
  const studs = cs.studs.map((s) => circleRing(s.positionMm, cs.studHoleDiameterMm / 2, 48));
  const parts: BufferGeometry[] = [];
  for (let i = 0; i + 1 < levels.length; i++) {
    const z0 = levels[i], z1 = levels[i + 1];
    const pockets = cs.pockets.filter((p) => p.startDepthMm <= z0 + 1e-9).map((p) => outlineRing(p.outline));
    parts.push(extrudeRegions(ringMinus(deck, [mouth, ...studs, ...pockets]), z0, z1));
  }
  return merge(parts);
}

function merge(parts: BufferGeometry[]): BufferGeometry {
  if (parts.length === 1) return parts[0];
  const pos: number[] = [];
  const nor: number[] = [];
  for (const g of parts) {
    pos.push(...(g.getAttribute("position").array as Float32Array));
    nor.push(...(g.getAttribute("normal").array as Float32Array));
    g.dispose();
  }
  const out = new BufferGeometry();
  out.setAttribute("position", new Float32BufferAttribute(pos, 3));
  out.setAttribute("normal", new Float32BufferAttribute(nor, 3));
  out.computeBoundingBox();
  out.computeBoundingSphere();
  return out;
}

// A circle of n segments about the origin has the same cap triangles at every radius: kept per n.
const circleCaps = new Map<number, number[][]>();

function circleCapTriangles(n: number): number[][] {
  let tris = circleCaps.get(n);
  if (!tris) circleCaps.set(n, (tris = ShapeUtils.triangulateShape(circleRing([0, 0], 1, n).map(([x, y]) => new Vector2(x, y)), [])));
  return tris;
}

/**
 * The planned counterbore as a solid: the core's diameter and depth, its axis from the core's centre at the deck to its centre at the bottom.
 * Written into `into` when it has room for it (the same number of segments), so a dragged cut keeps its buffers.
 */
export function cutGeometry(k: KitResult, exaggeration = 1, into?: BufferGeometry): BufferGeometry | null {
  const axis = drawnCutAxis(k, exaggeration);
  if (!k.cut || !axis) return null;
  const ring = circleRing([0, 0], k.cut.diameterMm / 2);
  return extrudeRegions([{ outer: ring, holes: [] }], 0, k.cut.depthMm, { shiftTop: axis.top, shiftBottom: axis.bottom, smooth: true, capTriangles: circleCapTriangles(ring.length), into });
}

/** The skirt as a tube: outside the worst diameter reading, inside the bore, from the deck down by the core's protrusion. */
export function skirtGeometry(k: KitResult, kit: CylinderKit): BufferGeometry | null {
  const P = k.skirt.protrusionMm;
  if (P <= 0) return null;
  const r = k.skirt.diameterMm / 2;
  const inner = Math.min(kit.boreMm / 2, r - 0.5);
  const c = k.skirt.centerMm;
  return extrudeRegions([{ outer: circleRing(c, r), holes: [circleRing(c, inner)] }], 0, P, { smooth: true });
}

/** The base flange above the deck (schematic thickness) and, when the core counted one, the base gasket under it. */
export function flangeGeometry(k: KitResult, kit: CylinderKit, holeMm: number): { flange: BufferGeometry; gasket: BufferGeometry | null } {
  const c = k.skirt.centerMm;
  const R = flangeRadiusMm(kit, k, holeMm);
  const inner = Math.min(kit.boreMm / 2, k.skirt.diameterMm / 2 - 0.5);
  const studs = kit.studs.map((s) => circleRing(s.positionMm, holeMm / 2, 32));
  const g = k.skirt.gasketMm;
  const flange = extrudeRegions([{ outer: circleRing(c, R), holes: [circleRing(c, inner), ...studs] }], -g - FLANGE_DRAWN_MM, -g);
  const gasket = g > 0 ? extrudeRegions([{ outer: circleRing(c, R), holes: [circleRing(c, k.skirt.diameterMm / 2), ...studs] }], -g, 0) : null;
  return { flange, gasket };
}

/** One band of the interference as a solid, written into `into` when it has room for it (the same number of vertices). */
export function interferenceBandGeometry(band: InterferenceBand, into?: BufferGeometry): BufferGeometry {
  return extrudeRegions(band.regions, band.z0, band.z1, { into });
}

/** Interference as solids (null when the skirt sits in clear space everywhere). */
export function interferenceGeometry(study: Study, k: KitResult): BufferGeometry | null {
  const bands = interferenceRegions(study, k);
  if (bands.length === 0) return null;
  return merge(bands.map((b) => interferenceBandGeometry(b)));
}
