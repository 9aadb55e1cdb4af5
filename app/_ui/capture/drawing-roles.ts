import type { DrawingRead, DrawingShape, ShapeRole } from "./drawing-file";

// Which shape of an imported drawing is which: the words for each role and a first guess from layer
// names and sizes, which the person then corrects.

export const ROLE_WORDS: Record<ShapeRole, string> = { deck: "Deck", mouth: "Mouth", passage: "Passage", stud: "Stud hole", port: "Gasket port", unused: "Not used" };

function area(s: DrawingShape): number {
  if (s.shape.kind === "circle") return Math.PI * s.shape.radius ** 2;
  const p = s.shape.points;
  let a = 0;
  for (let i = 0; i < p.length; i++) a += p[i][0] * p[(i + 1) % p.length][1] - p[(i + 1) % p.length][0] * p[i][1];
  return Math.abs(a) / 2;
}

/** A first guess from layer names, then from size: the largest shape is the deck, repeated equal circles are studs, the largest other circle the mouth. */
export function guessRoles(read: DrawingRead, allowed: ShapeRole[]): Record<string, ShapeRole> {
  const roles: Record<string, ShapeRole> = {};
  const byName = (s: DrawingShape): ShapeRole | null => {
    const n = (s.layer ?? "").toLowerCase();
    if (/deck/.test(n)) return "deck";
    if (/mouth|bore/.test(n)) return "mouth";
    if (/stud|bolt|hole/.test(n)) return "stud";
    if (/passage|transfer|pocket/.test(n)) return "passage";
    if (/port/.test(n)) return "port";
    return null;
  };
  for (const s of read.shapes) {
    const r = byName(s);
    if (r && allowed.includes(r)) roles[s.id] = r;
  }
  const rest = read.shapes.filter((s) => !roles[s.id]).sort((a, b) => area(b) - area(a));
  if (allowed.includes("deck") && !Object.values(roles).includes("deck") && rest[0]) roles[rest[0].id] = "deck";
  const radii = new Map<string, number>();
  for (const s of rest) if (s.shape.kind === "circle" && !roles[s.id]) radii.set(s.shape.radius.toFixed(6), (radii.get(s.shape.radius.toFixed(6)) ?? 0) + 1);
  for (const s of rest) {
    if (roles[s.id]) continue;
    if (s.shape.kind === "circle" && (radii.get(s.shape.radius.toFixed(6)) ?? 0) >= 2 && allowed.includes("stud")) roles[s.id] = "stud";
  }
  if (allowed.includes("mouth") && !Object.values(roles).includes("mouth")) {
    const m = rest.find((s) => !roles[s.id] && s.shape.kind === "circle");
    if (m) roles[m.id] = "mouth";
  }
  for (const s of read.shapes) roles[s.id] ??= allowed.includes("passage") ? "passage" : "unused";
  return roles;
}

/** The box around every shape of the drawing, padded by 5 %, in the SVG's frame (y down). */
export function drawingBox(view: DrawingRead): { x: number; y: number; w: number; h: number } {
  let minX = Infinity, minY = Infinity, maxX = -Infinity, maxY = -Infinity;
  for (const s of view.shapes) {
    const pts = s.shape.kind === "circle" ? [[s.shape.center[0] - s.shape.radius, s.shape.center[1] - s.shape.radius], [s.shape.center[0] + s.shape.radius, s.shape.center[1] + s.shape.radius]] : s.shape.points;
    for (const [x, y] of pts) {
      minX = Math.min(minX, x); minY = Math.min(minY, y); maxX = Math.max(maxX, x); maxY = Math.max(maxY, y);
    }
  }
  const pad = 0.05 * Math.max(maxX - minX, maxY - minY, 1e-6);
  return { x: minX - pad, y: -(maxY + pad), w: maxX - minX + 2 * pad, h: maxY - minY + 2 * pad };
}
