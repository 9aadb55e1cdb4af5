"use client";

import { dateTimeText } from "@/model/dates";
import { errorText } from "../../../../_ui/query/fetch";
import { useShopTimeZone } from "../../../../_ui/query/settings/use-shop-settings";
import { useStudyHistory } from "../../../../_ui/query/studies/use-study";

/** Who changed what, newest first. */
export function HistoryPanel({ id }: { id: string }) {
  const history = useStudyHistory(id);
  const zone = useShopTimeZone();
  const items = history.data?.items ?? [];
  return (
    <section className="card flex flex-col gap-2 p-4" aria-label="History">
      <h2 className="font-semibold">History</h2>
      {history.isError ? <p className="text-sm text-error">The history could not be loaded: {errorText(history.error)}</p> : null}
      {items.length === 0 && !history.isPending ? <p className="text-sm text-ink-2">No changes yet.</p> : null}
      <ol className="flex max-h-72 flex-col gap-1 overflow-auto text-sm" data-testid="history">
        {items.map((h, i) => (
          <li key={`${h.at}-${i}`} className="border-b border-rule pb-1 last:border-0">
            <span className="text-ink">{h.summary}</span>
            <span className="block text-xs text-ink-3">
              {h.by.name} · {dateTimeText(h.at, zone)}
            </span>
          </li>
        ))}
      </ol>
    </section>
  );
}
