"use client";

import { createContext, useContext } from "react";
import { callApi } from "@/app/_ui/api-client";
import { uploadPhoto } from "@/app/_ui/query/photo-upload";
import type { PhotoReference } from "@/app/_ui/capture/captured-shapes";
import type { ChosenPhoto } from "@/app/_ui/capture/photo-trace";

// The case form's side of a deck photo: the photo chosen before the case's first save (kept at that save),
// and the reference points, restored from the kept photo and saved with it when the case is saved.

/** What the case form hands the photo trace (through CaptureSources, which the plan mounts). */
export type CasePhotoLink = {
  initialReference?: PhotoReference;
  onReferenceChange: (ref: PhotoReference | null) => void;
  onPhotoChosen: (photo: ChosenPhoto) => void;
};

export const CasePhotoContext = createContext<CasePhotoLink | null>(null);

/** The case form's photo link, or null outside a case form (a kit's gasket). */
export function useCasePhotoLink(): CasePhotoLink | null {
  return useContext(CasePhotoContext);
}

/** The smallest length a field shows in inches (0.001 in), in mm: a kept length read back through a field may move by this much. */
const FIELD_STEP_MM = 0.0254;

/**
 * Whether two references are the same for keeping: the same kind and points, and lengths within what a field
 * rounds them to (a length kept in mm, shown in inches and read back, is not a change someone made).
 */
export function sameReference(a: PhotoReference | null | undefined, b: PhotoReference | null | undefined): boolean {
  if (!a || !b) return !a && !b;
  if (a.kind !== b.kind || a.points.length !== b.points.length) return false;
  if (a.points.some((p, i) => Math.abs(p[0] - b.points[i][0]) > 1e-6 || Math.abs(p[1] - b.points[i][1]) > 1e-6)) return false;
  const near = (x: number, y: number) => Math.abs(x - y) <= FIELD_STEP_MM / 2 + 1e-9;
  if (a.kind === "scale" && b.kind === "scale") return near(a.distanceMm, b.distanceMm);
  if (a.kind === "rectangle" && b.kind === "rectangle") return near(a.widthMm, b.widthMm) && near(a.heightMm, b.heightMm);
  return false;
}

type StoredPhoto = { id: string; state: string; reference: PhotoReference | null };

/** The case profile's latest kept photo (the one the trace shows), null when none, or why it could not be read. */
export async function latestCasePhoto(caseId: string): Promise<{ ok: true; photo: StoredPhoto | null } | { ok: false; message: string }> {
  const res = await callApi<{ items: StoredPhoto[] }>(`/api/v1/cases/${caseId}/photos`);
  if (!res.ok) return { ok: false, message: res.error.message };
  return { ok: true, photo: res.data.items.find((p) => p.state === "ready") ?? null };
}

/** The first message of a refusal: a field's reason when there is one, else the refusal's own words. */
function reason(error: { message: string; fields?: Record<string, string> }): string {
  const first = error.fields ? Object.values(error.fields)[0] : undefined;
  return first ?? error.message;
}

/** Keeps a chosen photo with a saved case profile: asks for an upload address, sends the file, has it checked. */
export async function keepCasePhoto(caseId: string, photo: ChosenPhoto, reference: PhotoReference | null): Promise<{ ok: true; id: string } | { ok: false; message: string }> {
  return uploadPhoto(`/api/v1/cases/${caseId}/photos`, photo.file, { contentType: photo.contentType, sizeBytes: photo.file.size, widthPx: photo.widthPx, heightPx: photo.heightPx, ...(reference ? { reference } : {}) });
}

/** Saves the reference points with the case profile's latest kept photo; nothing to do without one. */
export async function keepReference(caseId: string, reference: PhotoReference | null): Promise<{ ok: true } | { ok: false; message: string }> {
  const latest = await latestCasePhoto(caseId);
  if (!latest.ok) return latest;
  if (!latest.photo) return { ok: true };
  const res = await callApi(`/api/v1/cases/${caseId}/photos/${latest.photo.id}`, { method: "PATCH", body: { reference } });
  return res.ok ? { ok: true } : { ok: false, message: reason(res.error) };
}

/** A message for the case's edit form after the first save moved there (the new form is gone by then). */
export function leaveNoticeFor(caseId: string, text: string) {
  try {
    sessionStorage.setItem(`case-form-notice:${caseId}`, text);
  } catch {
    // Storage refused (private mode, full): the case is saved either way; its form then opens without the note.
  }
}

/** Takes the message left for this case's form, once. */
export function takeNoticeFor(caseId: string): string | null {
  try {
    const key = `case-form-notice:${caseId}`;
    const text = sessionStorage.getItem(key);
    sessionStorage.removeItem(key);
    return text;
  } catch {
    // Storage unreadable: there is no note to show.
    return null;
  }
}
