"use client";

import { useCallback, useState } from "react";
import { callApi } from "../../../../_ui/api-client";
import { uploadPhoto } from "../../../../_ui/query/photo-upload";
import { photoSizeProblem } from "@/model/photo-files";

export type JobPhoto = { id: string; caption: string; kind: string; shared: boolean; state: string; refusedReason: string | null; url: string | null; sizeBytes: number };
export type PhotoNotice = { tone: "ok" | "error"; text: string };
export type PhotoFields = { caption: string; kind: string; shared: boolean };

/** A job's photos as the page keeps them: the list, uploading one, sharing one, and what the last action said. */
export function useJobPhotos(jobId: string, initial: JobPhoto[] | null) {
  const [photos, setPhotos] = useState<JobPhoto[]>(initial ?? []);
  const [notice, setNotice] = useState<PhotoNotice | null>(null);
  const [busy, setBusy] = useState(false);

  const load = useCallback(async () => {
    const res = await callApi<{ items: JobPhoto[] }>(`/api/v1/jobs/${jobId}/photos`);
    if (res.ok) setPhotos(res.data.items);
    else setNotice({ tone: "error", text: res.error.message });
  }, [jobId]);

  /** Uploads a file with its caption, kind and sharing; true once the server kept it. */
  async function upload(file: File | undefined, fields: PhotoFields): Promise<boolean> {
    const problem = file ? photoSizeProblem(file.size) : "Choose a photo first.";
    if (!file || problem) {
      setNotice({ tone: "error", text: problem ?? "Choose a photo first." });
      return false;
    }
    setBusy(true);
    setNotice(null);
    const r = await uploadPhoto(`/api/v1/jobs/${jobId}/photos`, file, { contentType: file.type || "application/octet-stream", sizeBytes: file.size, caption: fields.caption, kind: fields.kind, shared: fields.shared });
    setBusy(false);
    if (!r.ok && r.step === "request") {
      setNotice({ tone: "error", text: r.message });
      return false;
    }
    if (!r.ok && r.step === "store") {
      setNotice({ tone: "error", text: `${r.message} Try again.` });
      return false;
    }
    setNotice(r.ok ? { tone: "ok", text: "Photo added." } : { tone: "error", text: `Refused: ${r.message}` });
    await load();
    return r.ok;
  }

  async function toggleShared(p: JobPhoto) {
    const res = await callApi(`/api/v1/jobs/${jobId}/photos/${p.id}`, { method: "PATCH", body: { shared: !p.shared } });
    if (!res.ok) setNotice({ tone: "error", text: res.error.message });
    await load();
  }

  return { photos, notice, busy, upload, toggleShared };
}
