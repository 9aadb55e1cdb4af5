import { BufferAttribute, BufferGeometry, ShapeUtils, Vector2 } from "three";
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
  const st = options.shiftTop ?? [0, 0];
  const sb = options.shiftBottom ?? [0, 0];
  const smooth = options.smooth ?? false;
  // Each region's rings (the outer counter-clockwise, the holes clockwise) and its caps' triangles.
  const parts = regions.map((region) => {
    const outer = ccw(region.outer);
    const holes = region.holes.map((h) => ccw(h).reverse());
    const tris =
      options.capTriangles && regions.length === 1
        ? options.capTriangles
        : ShapeUtils.triangulateShape(
            outer.map(([x, y]) => new Vector2(x, y)),
            holes.map((h) => h.map(([x, y]) => new Vector2(x, y))),
          );
    const rings = [outer, ...holes];
    return { rings, all: rings.flat(), tris };
  });
  // Six vertices a cap triangle (top and bottom) and a side edge: the buffers are sized once and written in place.
  const vertices = parts.reduce((sum, p) => sum + 6 * p.tris.length + 6 * p.rings.reduce((n, r) => n + r.length, 0), 0);
  const into = options.into;
  const reuse = into?.getAttribute("position")?.array.length === 3 * vertices && into.getAttribute("normal")?.array.length === 3 * vertices;
  const pos = reuse ? (into.getAttribute("position").array as Float32Array) : new Float32Array(3 * vertices);
  const nor = reuse ? (into.getAttribute("normal").array as Float32Array) : new Float32Array(3 * vertices);
  let w = 0;
  // world = (x, −z, −y), for the normal as for the point.
  const put: Put = (x, y, z, nx, ny, nz) => {
    pos[w] = x;
    pos[w + 1] = -z;
    pos[w + 2] = -y;
    nor[w] = nx;
    nor[w + 1] = -nz;
    nor[w + 2] = -ny;
    w += 3;
  };
  for (const { rings, all, tris } of parts) {
    for (const [a, b, c] of tris) {
      // Top cap faces up (−z); seen from above, counter-clockwise in the (x, y) plane stays counter-clockwise in the world.
      for (const i of [a, b, c]) put(all[i][0] + st[0], all[i][1] + st[1], zTop, 0, 0, -1);
      for (const i of [a, c, b]) put(all[i][0] + sb[0], all[i][1] + sb[1], zBottom, 0, 0, 1);
    }
    for (const ring of rings) sideWalls(ring, zTop, zBottom, st, sb, smooth, put);
  }
  const g = reuse ? into : new BufferGeometry();
  if (reuse) {
    g.getAttribute("position").needsUpdate = true;
    g.getAttribute("normal").needsUpdate = true;
  } else {
    g.setAttribute("position", new BufferAttribute(pos, 3));
    g.setAttribute("normal", new BufferAttribute(nor, 3));
  }
  g.computeBoundingBox();
  g.computeBoundingSphere();
  return g;
}

/** Writes one vertex: a core point and its normal, in the core's frame. */
type Put = (x: number, y: number, z: number, nx: number, ny: number, nz: number) => void;

function edgeNormal(a: Vec2, b: Vec2): Vec2 {
  const dx = b[0] - a[0], dy = b[1] - a[1];
  const l = Math.hypot(dx, dy) || 1;
  return [dy / l, -dx / l];
}

function sideWalls(ring: readonly Vec2[], zt: number, zb: number, st: Vec2, sb: Vec2, smooth: boolean, put: Put) {
  const n = ring.length;
  // Smooth: each vertex's normal halfway between its two edges' normals.
  const vn = smooth
    ? ring.map((_, i) => {
        const a = edgeNormal(ring[(i - 1 + n) % n], ring[i]);
        const b = edgeNormal(ring[i], ring[(i + 1) % n]);
        const l = Math.hypot(a[0] + b[0], a[1] + b[1]) || 1;
        return [(a[0] + b[0]) / l, (a[1] + b[1]) / l] as Vec2;
      })
    : null;
  for (let i = 0; i < n; i++) {
    const j = (i + 1) % n;
    const p = ring[i], q = ring[j];
    const ni = vn ? vn[i] : edgeNormal(p, q);
    const nj = vn ? vn[j] : ni;
    const ptx = p[0] + st[0], pty = p[1] + st[1], qtx = q[0] + st[0], qty = q[1] + st[1];
    const pbx = p[0] + sb[0], pby = p[1] + sb[1], qbx = q[0] + sb[0], qby = q[1] + sb[1];
    // Outward-facing winding for a counter-clockwise ring (holes are passed clockwise, so they face inward to the hole).
    put(ptx, pty, zt, ni[0], ni[1], 0);
    put(pbx, pby, zb, ni[0], ni[1], 0);
    put(qbx, qby, zb, nj[0], nj[1], 0);
    put(ptx, pty, zt, ni[0], ni[1], 0);
    put(qbx, qby, zb, nj[0], nj[1], 0);
    put(qtx, qty, zt, nj[0], nj[1], 0);
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
