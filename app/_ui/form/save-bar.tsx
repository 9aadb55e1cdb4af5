"use client";

import Link from "next/link";

/** The foot of a library form: save, cancel, and what happened. */
export function SaveBar({ busy, isNew, backHref, dirty }: { busy: boolean; isNew: boolean; backHref: string; dirty: boolean }) {
  return (
    <div className="sticky bottom-0 -mx-6 flex flex-wrap items-center gap-3 border-t border-rule bg-paper/95 px-6 py-3 backdrop-blur">
      <button type="submit" className="btn" disabled={busy}>
        {busy ? "Saving…" : isNew ? "Create" : "Save changes"}
      </button>
      <Link href={backHref} className="btn-quiet no-underline">
        Back to the list
      </Link>
      <span className="text-sm text-ink-2">{dirty ? "Unsaved changes" : isNew ? "" : "No unsaved changes"}</span>
    </div>
  );
}
