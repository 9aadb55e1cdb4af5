"use client";

import { timeText } from "@/model/dates";
import { useShopTimeZone } from "../../../../_ui/query/settings/use-shop-settings";
import type { SaveStatus } from "./use-autosave";

const LOOK: Record<SaveStatus, { text: string; cls: string; dot: string }> = {
  saved: { text: "All changes saved", cls: "text-ink-2", dot: "bg-success" },
  unsaved: { text: "Unsaved changes", cls: "text-ink", dot: "bg-caution" },
  saving: { text: "Saving…", cls: "text-ink-2", dot: "bg-accent animate-pulse" },
  invalid: { text: "Not saved: fix the marked fields", cls: "text-error", dot: "bg-error" },
  conflict: { text: "Not saved: someone else changed this study", cls: "text-error", dot: "bg-error" },
  error: { text: "Not saved", cls: "text-error", dot: "bg-error" },
};

/** Where the study stands: saved, unsaved, saving, or refused. */
export function SaveStatusBadge({ status, savedAt }: { status: SaveStatus; savedAt: Date | null }) {
  const l = LOOK[status];
  const zone = useShopTimeZone();
  return (
    <span role="status" aria-live="polite" data-testid="save-status" data-status={status} className={`inline-flex items-center gap-2 text-sm ${l.cls}`}>
      <span aria-hidden="true" className={`inline-block h-2.5 w-2.5 rounded-full ${l.dot}`} />
      {l.text}
      {status === "saved" && savedAt ? <span className="text-ink-3">· {timeText(savedAt, zone)}</span> : null}
    </span>
  );
}
