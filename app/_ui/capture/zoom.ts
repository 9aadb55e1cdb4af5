// Zoom and pan of a drawing or a photo, as a window onto the whole picture: `zoom` ≥ 1 times the fit,
// centred at (u, v), both as fractions of the whole picture (0 at its left or top edge, 1 at the other).
// Pure: the hook in use-zoom.ts keeps the view and turns wheel, pinch, keys and buttons into these calls.

export type View = { zoom: number; u: number; v: number };

export const FIT: View = { zoom: 1, u: 0.5, v: 0.5 };
export const MAX_ZOOM = 16;
/** One step of the buttons and the + and − keys. */
export const ZOOM_STEP = 1.5;

const clamp = (x: number, lo: number, hi: number) => Math.min(hi, Math.max(lo, x));

/** The view moved back inside the picture (no empty margin past an edge) and its zoom within 1…MAX_ZOOM. */
export function bounded(view: View): View {
  const zoom = clamp(view.zoom, 1, MAX_ZOOM);
  const half = 1 / (2 * zoom);
  return { zoom, u: clamp(view.u, half, 1 - half), v: clamp(view.v, half, 1 - half) };
}

/** The part of the picture shown: its left and top edges and its size, as fractions of the whole. */
export function windowOf(view: View): { left: number; top: number; size: number } {
  const size = 1 / view.zoom;
  return { left: view.u - size / 2, top: view.v - size / 2, size };
}

/** Where a point of the viewport (fractions of its width and height) lies on the whole picture. */
export function pictureAt(view: View, sx: number, sy: number): [number, number] {
  const w = windowOf(view);
  return [w.left + sx * w.size, w.top + sy * w.size];
}

/**
 * Zooms by `factor` keeping the picture's point under the viewport point (sx, sy) where it is
 * (the pointer's place for the wheel and a pinch; the middle for the buttons and keys).
 */
export function zoomAt(view: View, factor: number, sx = 0.5, sy = 0.5): View {
  const [a, b] = pictureAt(view, sx, sy);
  const zoom = clamp(view.zoom * factor, 1, MAX_ZOOM);
  const size = 1 / zoom;
  return bounded({ zoom, u: a - sx * size + size / 2, v: b - sy * size + size / 2 });
}

/** Moves the picture by (dx, dy) fractions of the viewport (a drag to the right shows more of the left). */
export function panBy(view: View, dx: number, dy: number): View {
  return bounded({ zoom: view.zoom, u: view.u - dx / view.zoom, v: view.v - dy / view.zoom });
}

/** The view a key asks for (+ or = zooms in, − zooms out, 0 fits), or null for any other key. */
export function viewForKey(view: View, key: string): View | null {
  if (key === "+" || key === "=") return zoomAt(view, ZOOM_STEP);
  if (key === "-" || key === "_" || key === "\u2212") return zoomAt(view, 1 / ZOOM_STEP);
  if (key === "0") return FIT;
  return null;
}
