import type { ViewState } from "./view";

// Kept apart from view.ts, which needs three.js: the studio computes this key in its first-load code.

/** What a frame shows, in a few words: the view and the cut on show. The canvas carries the key of its last frame, the studio the key of what it asks for. */
export function drawnKey(view: ViewState, kitIndex: number, cut: { readonly diameterMm?: number; readonly depthMm?: number } | undefined): string {
  const section = view.section ? `section ${view.sectionAngleDeg}` : "no section";
  return `${view.camera}/${view.cameraNonce} · ${section} · ×${view.exaggeration} · ${view.overlay ? "overlay" : "one"} · ${view.units}${view.customer ? " · customer" : ""} · kit ${kitIndex} · cut ${cut?.diameterMm ?? "least"} × ${cut?.depthMm ?? "least"}`;
}
