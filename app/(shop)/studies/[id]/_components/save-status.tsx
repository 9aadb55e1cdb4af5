"use client";

import { timeText } from "@/model/dates";
import { SAVE_STATE } from "@/model/glossary";
import { useShopTimeZone } from "../../../../_ui/query/settings/use-shop-settings";
import type { SaveStatus } from "./use-autosave";

/** The look of a change that was not saved, whatever the reason. */
const REFUSED = { cls: "text-error", dot: "bg-error" };

/** Each state's colours; its words are the glossary's. */
const LOOK: Record<SaveStatus, { cls: string; dot: string }> = {
  saved: { cls: "text-ink-2", dot: "bg-success" },
  unsaved: { cls: "text-ink", dot: "bg-caution" },
  saving: { cls: "text-ink-2", dot: "bg-accent animate-pulse" },
  invalid: REFUSED,
  conflict: REFUSED,
  error: REFUSED,
};
const WORDS: Record<SaveStatus, string> = SAVE_STATE;

/** Where the study stands: saved, unsaved, saving, or refused. */
export function SaveStatusBadge({ status, savedAt }: { status: SaveStatus; savedAt: Date | null }) {
  const l = LOOK[status];
  const zone = useShopTimeZone();
  return (
    <span role="status" aria-live="polite" data-testid="save-status" data-status={status} className={`inline-flex items-center gap-2 text-sm ${l.cls}`}>
      <span aria-hidden="true" className={`inline-block h-2.5 w-2.5 rounded-full ${l.dot}`} />
      {WORDS[status]}
      {status === "saved" && savedAt ? <span className="text-ink-3">· {timeText(savedAt, zone)}</span> : null}
    </span>
  );
}
