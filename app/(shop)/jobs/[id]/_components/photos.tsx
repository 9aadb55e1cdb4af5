"use client";

import { useCallback, useRef, useState } from "react";
import { callApi } from "../../../../_ui/api-client";
import { FormNotice } from "../../../../_ui/field";
import { MAX_PHOTO_MB, photoSizeProblem } from "@/model/photo-files";

type Photo = { id: string; caption: string; kind: string; shared: boolean; state: string; refusedReason: string | null; url: string | null; sizeBytes: number };

const KINDS = [
  ["readings", "Readings"],
  ["before", "Case before"],
  ["after", "Case after"],
  ["trial-fit", "Trial fit"],
  ["other", "Other"],
] as const;

/** The job's photos as a thumbnail grid; the shop uploads straight to storage and marks what the customer may see. */
export function Photos({ jobId, canEdit, initial }: { jobId: string; canEdit: boolean; initial: Photo[] | null }) {
  const [photos, setPhotos] = useState<Photo[]>(initial ?? []);
  const [notice, setNotice] = useState<{ tone: "ok" | "error"; text: string } | null>(null);
  const [busy, setBusy] = useState(false);
  const [kind, setKind] = useState<string>("after");
  const [caption, setCaption] = useState("");
  const [share, setShare] = useState(false);
  const file = useRef<HTMLInputElement>(null);

  const load = useCallback(async () => {
    const res = await callApi<{ items: Photo[] }>(`/api/v1/jobs/${jobId}/photos`);
    if (res.ok) setPhotos(res.data.items);
    else setNotice({ tone: "error", text: res.error.message });
  }, [jobId]);

  async function upload(e: React.FormEvent) {
    e.preventDefault();
    const f = file.current?.files?.[0];
    if (!f) {
      setNotice({ tone: "error", text: "Choose a photo first." });
      return;
    }
    const tooLarge = photoSizeProblem(f.size);
    if (tooLarge) {
      setNotice({ tone: "error", text: tooLarge });
      return;
    }
    setBusy(true);
    setNotice(null);
    const start = await callApi<{ id: string; uploadUrl: string; headers: Record<string, string> }>(`/api/v1/jobs/${jobId}/photos`, {
      body: { contentType: f.type || "application/octet-stream", sizeBytes: f.size, caption, kind, shared: share },
    });
    if (!start.ok) {
      setBusy(false);
      setNotice({ tone: "error", text: start.error.fields?.contentType ?? start.error.fields?.sizeBytes ?? start.error.message });
      return;
    }
    let put: Response;
    try {
      put = await fetch(start.data.uploadUrl, { method: "PUT", headers: start.data.headers, body: f });
    } catch {
      setBusy(false);
      setNotice({ tone: "error", text: "The photo store could not be reached; try again." });
      return;
    }
    if (!put.ok) {
      setBusy(false);
      setNotice({ tone: "error", text: `The photo store refused the upload (${put.status}).` });
      return;
    }
    const done = await callApi<{ item: Photo }>(`/api/v1/jobs/${jobId}/photos/${start.data.id}/complete`, { body: {} });
    setBusy(false);
    if (!done.ok) {
      setNotice({ tone: "error", text: `Refused: ${done.error.message}` });
    } else {
      setNotice({ tone: "ok", text: "Photo added." });
      setCaption("");
      if (file.current) file.current.value = "";
    }
    await load();
  }

  async function toggle(p: Photo) {
    const res = await callApi(`/api/v1/jobs/${jobId}/photos/${p.id}`, { method: "PATCH", body: { shared: !p.shared } });
    if (!res.ok) setNotice({ tone: "error", text: res.error.message });
    await load();
  }

  const ready = photos.filter((p) => p.state === "ready");
  const refused = photos.filter((p) => p.state === "refused");
  return (
    <section className="flex flex-col gap-3" aria-label="Photos">
      <h2 className="text-xl font-semibold">Photos</h2>
      {initial === null ? <p className="text-sm text-error">Photo storage is not available on this server right now.</p> : null}
      {ready.length === 0 ? <p className="text-sm text-ink-2">{canEdit ? "No photos yet. Add the case before and after the cut, the readings and the trial fit." : "The shop has shared no photos yet."}</p> : null}
      <ul className="grid grid-cols-2 gap-3 sm:grid-cols-4 lg:grid-cols-6" data-testid="photo-grid">
        {ready.map((p) => (
          <li key={p.id} className="card overflow-hidden">
            {p.url ? (
              <a href={p.url} target="_blank" rel="noreferrer">
                {/* eslint-disable-next-line @next/next/no-img-element -- presigned storage URLs, not optimisable */}
                <img src={p.url} alt={p.caption || KINDS.find((k) => k[0] === p.kind)?.[1] || "Job photo"} className="aspect-square w-full object-cover" loading="lazy" />
              </a>
            ) : null}
            <div className="p-2 text-xs">
              <p className="truncate">{p.caption || KINDS.find((k) => k[0] === p.kind)?.[1]}</p>
              {canEdit ? (
                <label className="mt-1 flex items-center gap-1 text-ink-2">
                  <input type="checkbox" checked={p.shared} onChange={() => toggle(p)} /> shared with the customer
                </label>
              ) : null}
            </div>
          </li>
        ))}
      </ul>
      {canEdit && refused.length ? (
        <ul className="text-sm text-error">
          {refused.map((p) => (
            <li key={p.id}>A file was refused: {p.refusedReason}</li>
          ))}
        </ul>
      ) : null}
      {canEdit ? (
        <form onSubmit={upload} className="card flex flex-wrap items-end gap-3 p-3">
          <div>
            <label htmlFor="photo-file" className="field-label">Photo (JPEG, PNG or WebP, up to {MAX_PHOTO_MB} MB)</label>
            <input id="photo-file" ref={file} type="file" accept="image/jpeg,image/png,image/webp" className="text-sm" />
          </div>
          <div>
            <label htmlFor="photo-kind" className="field-label">Shows</label>
            <select id="photo-kind" className="field-input" value={kind} onChange={(e) => setKind(e.target.value)}>
              {KINDS.map(([k, label]) => (
                <option key={k} value={k}>{label}</option>
              ))}
            </select>
          </div>
          <div>
            <label htmlFor="photo-caption" className="field-label">Caption</label>
            <input id="photo-caption" className="field-input" value={caption} onChange={(e) => setCaption(e.target.value)} />
          </div>
          <label className="flex items-center gap-1 pb-2 text-sm"><input type="checkbox" checked={share} onChange={(e) => setShare(e.target.checked)} /> share with the customer</label>
          <button className="btn" type="submit" disabled={busy}>{busy ? "Uploading…" : "Upload"}</button>
        </form>
      ) : null}
      {notice ? <FormNotice tone={notice.tone}>{notice.text}</FormNotice> : null}
    </section>
  );
}
