"use client";

import { useRef, useState } from "react";
import { FormNotice } from "../../../../_ui/field";
import { MAX_PHOTO_MB } from "@/model/photo-files";
import { type JobPhoto, type PhotoFields, useJobPhotos } from "./use-job-photos";

const KINDS = [
  ["readings", "Readings"],
  ["before", "Case before"],
  ["after", "Case after"],
  ["trial-fit", "Trial fit"],
  ["other", "Other"],
] as const;

const kindLabel = (kind: string) => KINDS.find((k) => k[0] === kind)?.[1];

/** The job's photos as a thumbnail grid; the shop uploads straight to storage and marks what the customer may see. */
export function Photos({ jobId, canEdit, initial }: { jobId: string; canEdit: boolean; initial: JobPhoto[] | null }) {
  const { photos, notice, busy, upload, toggleShared } = useJobPhotos(jobId, initial);
  const ready = photos.filter((p) => p.state === "ready");
  const refused = photos.filter((p) => p.state === "refused");
  return (
    <section className="flex flex-col gap-3" aria-label="Photos">
      <h2 className="text-xl font-semibold">Photos</h2>
      {initial === null ? <p className="text-sm text-error">Photo storage is not available on this server right now.</p> : null}
      {ready.length === 0 ? <p className="text-sm text-ink-2">{canEdit ? "No photos yet. Add the case before and after the cut, the readings and the trial fit." : "The shop has shared no photos yet."}</p> : null}
      <PhotoGrid photos={ready} canEdit={canEdit} onToggleShared={toggleShared} />
      {canEdit && refused.length ? (
        <ul className="text-sm text-error">
          {refused.map((p) => (
            <li key={p.id}>A file was refused: {p.refusedReason}</li>
          ))}
        </ul>
      ) : null}
      {canEdit ? <PhotoUploadForm busy={busy} onUpload={upload} /> : null}
      {notice ? <FormNotice tone={notice.tone}>{notice.text}</FormNotice> : null}
    </section>
  );
}

function PhotoGrid({ photos, canEdit, onToggleShared }: { photos: JobPhoto[]; canEdit: boolean; onToggleShared: (p: JobPhoto) => void }) {
  return (
    <ul className="grid grid-cols-2 gap-3 sm:grid-cols-4 lg:grid-cols-6" data-testid="photo-grid">
      {photos.map((p) => (
        <li key={p.id} className="card overflow-hidden">
          {p.url ? (
            <a href={p.url} target="_blank" rel="noreferrer">
              {/* eslint-disable-next-line @next/next/no-img-element -- presigned storage URLs, not optimisable */}
              <img src={p.url} alt={p.caption || kindLabel(p.kind) || "Job photo"} className="aspect-square w-full object-cover" loading="lazy" />
            </a>
          ) : null}
          <div className="p-2 text-xs">
            <p className="truncate">{p.caption || kindLabel(p.kind)}</p>
            {canEdit ? (
              <label className="mt-1 flex items-center gap-1 text-ink-2">
                <input type="checkbox" checked={p.shared} onChange={() => onToggleShared(p)} /> shared with the customer
              </label>
            ) : null}
          </div>
        </li>
      ))}
    </ul>
  );
}

function PhotoUploadForm({ busy, onUpload }: { busy: boolean; onUpload: (file: File | undefined, fields: PhotoFields) => Promise<boolean> }) {
  const [kind, setKind] = useState<string>("after");
  const [caption, setCaption] = useState("");
  const [share, setShare] = useState(false);
  const file = useRef<HTMLInputElement>(null);

  async function submit(e: React.FormEvent) {
    e.preventDefault();
    if (!(await onUpload(file.current?.files?.[0], { caption, kind, shared: share }))) return;
    setCaption("");
    if (file.current) file.current.value = "";
  }

  return (
    <form onSubmit={submit} className="card flex flex-wrap items-end gap-3 p-3">
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
  );
}
