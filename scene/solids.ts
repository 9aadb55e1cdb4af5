import { BufferGeometry, Float32BufferAttribute, ShapeUtils, Vector2 } from "three";
import type { Vec2 } from "@/geometry";
import { ccw } from "./outline";

// Pure builders of closed solids for the 3D view. Points come in the core's frame (x, y in the deck
// plane, z positive down into the case); vertices go out in the scene's frame, y up:
// world = (x, −z, −y), so a camera looking down on the deck sees x to the right and y up, as in the plan.

/** World position of a core point. */
export function toWorld(x: number, y: number, z: number): [number, number, number] {
  return [x, -z, -y];
}

/** Core point of a world position. */
export function toCore(wx: number, wy: number, wz: number): [x: number, y: number, z: number] {
  return [wx, -wz, -wy];
}

export type { Region } from "./regions";
import type { Region } from "./regions";

/** Options of extrudeRegions. */
export interface ExtrudeOptions {
  /** Shift of the region in the deck plane at the top and at the bottom (a sheared prism, for a tilted cut). */
  readonly shiftTop?: Vec2;
  readonly shiftBottom?: Vec2;
  /** Smooth side normals (circles) instead of flat faces (polygons). */
  readonly smooth?: boolean;
  /** The caps' triangles of a single region (indices into its outer ring, then its holes), when the caller already has them. */
  readonly capTriangles?: readonly (readonly number[])[];
  /** A geometry to write into when it holds as many vertices (a solid that follows a slider keeps its buffers); else a new one is made. */
  readonly into?: BufferGeometry;
}

/**
 * A closed prism between depths zTop and zBottom (zTop < zBottom) over one or more regions: caps
 * triangulated by earcut (three's ShapeUtils), side walls per ring edge, outward normals.
 */
export function extrudeRegions(regions: readonly Region[], zTop: number, zBottom: number, options: ExtrudeOptions = {}): BufferGeometry {
  const pos: number[] = [];
  const nor: number[] = [];
  const st = options.shiftTop ?? [0, 0];
  const sb = options.shiftBottom ?? [0, 0];
  // world = (x, −z, −y), written out to spare an array per vertex.
  const push = (x: number, y: number, z: number, n: [number, number, number]) => {
    pos.push(x, -z, -y);
    nor.push(n[0], -n[2], -n[1]);
  };
  for (const region of regions) {
    const outer = ccw(region.outer);
    const holes = region.holes.map((h) => ccw(h).reverse());
    const all = [outer, ...holes].flat();
    const tris =
      options.capTriangles && regions.length === 1
        ? options.capTriangles
        : ShapeUtils.triangulateShape(
            outer.map(([x, y]) => new Vector2(x, y)),
            holes.map((h) => h.map(([x, y]) => new Vector2(x, y))),
          );
    for (const [a, b, c] of tris) {
      // Top cap faces up (−z); seen from above, counter-clockwise in the (x, y) plane stays counter-clockwise in the world.
      for (const i of [a, b, c]) push(all[i][0] + st[0], all[i][1] + st[1], zTop, [0, 0, -1]);
      for (const i of [a, c, b]) push(all[i][0] + sb[0], all[i][1] + sb[1], zBottom, [0, 0, 1]);
    }
    for (const ring of [outer, ...holes]) sideWalls(ring, zTop, zBottom, st, sb, options.smooth ?? false, push);
  }
  const into = options.into;
  const reuse = into?.getAttribute("position")?.array.length === pos.length && into.getAttribute("normal")?.array.length === nor.length;
  const g = reuse ? into : new BufferGeometry();
  if (reuse) {
    for (const [name, values] of [["position", pos], ["normal", nor]] as const) {
      const a = g.getAttribute(name) as Float32BufferAttribute;
      (a.array as Float32Array).set(values);
      a.needsUpdate = true;
    }
  } else {
    g.setAttribute("position", new Float32BufferAttribute(pos, 3));
    g.setAttribute("normal", new Float32BufferAttribute(nor, 3));
  }
  g.computeBoundingBox();
  g.computeBoundingSphere();
  return g;
}

function edgeNormal(a: Vec2, b: Vec2): Vec2 {
  const dx = b[0] - a[0], dy = b[1] - a[1];
  const l = Math.hypot(dx, dy) || 1;
  return [dy / l, -dx / l];
}

function sideWalls(
  ring: readonly Vec2[],
  zt: number,
  zb: number,
  st: Vec2,
  sb: Vec2,
  smooth: boolean,
  push: (x: number, y: number, z: number, n: [number, number, number]) => void,
) {
  const n = ring.length;
  const vn = ring.map((_, i) => {
    const a = edgeNormal(ring[(i - 1 + n) % n], ring[i]);
    const b = edgeNormal(ring[i], ring[(i + 1) % n]);
    const l = Math.hypot(a[0] + b[0], a[1] + b[1]) || 1;
    return [(a[0] + b[0]) / l, (a[1] + b[1]) / l] as Vec2;
  });
  for (let i = 0; i < n; i++) {
    const j = (i + 1) % n;
    const p = ring[i], q = ring[j];
    const en = edgeNormal(p, q);
    const ni: [number, number, number] = smooth ? [vn[i][0], vn[i][1], 0] : [en[0], en[1], 0];
    const nj: [number, number, number] = smooth ? [vn[j][0], vn[j][1], 0] : [en[0], en[1], 0];
    const pt: [number, number, number] = [p[0] + st[0], p[1] + st[1], zt];
    const qt: [number, number, number] = [q[0] + st[0], q[1] + st[1], zt];
    const pb: [number, number, number] = [p[0] + sb[0], p[1] + sb[1], zb];
    const qb: [number, number, number] = [q[0] + sb[0], q[1] + sb[1], zb];
    // Outward-facing winding for a counter-clockwise ring (holes are passed clockwise, so they face inward to the hole).
    push(...pt, ni); push(...pb, ni); push(...qb, nj);
    push(...pt, ni); push(...qb, nj); push(...qt, nj);
  }
}

/** Volume enclosed by a closed triangle mesh (sum of signed tetrahedra from the origin), in mm³. */
export function meshVolume(g: BufferGeometry): number {
  const p = g.getAttribute("position");
  let v = 0;
  for (let i = 0; i < p.count; i += 3) {
    const ax = p.getX(i), ay = p.getY(i), az = p.getZ(i);
    const bx = p.getX(i + 1), by = p.getY(i + 1), bz = p.getZ(i + 1);
    const cx = p.getX(i + 2), cy = p.getY(i + 2), cz = p.getZ(i + 2);
    v += (ax * (by * cz - bz * cy) - ay * (bx * cz - bz * cx) + az * (bx * cy - by * cx)) / 6;
  }
  return v;
}

/** Extent of a geometry in the core's frame: depth range and largest distance from a vertical axis through c. */
export function coreExtent(g: BufferGeometry, c: Vec2 = [0, 0]): { zMin: number; zMax: number; radiusMax: number } {
  const p = g.getAttribute("position");
  let zMin = Infinity, zMax = -Infinity, r = 0;
  for (let i = 0; i < p.count; i++) {
    const [x, y, z] = toCore(p.getX(i), p.getY(i), p.getZ(i));
    zMin = Math.min(zMin, z); zMax = Math.max(zMax, z);
    r = Math.max(r, Math.hypot(x - c[0], y - c[1]));
  }
  return { zMin, zMax, radiusMax: r };
}
