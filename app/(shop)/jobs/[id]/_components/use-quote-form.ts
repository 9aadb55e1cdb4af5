"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import type { CurrencyCode } from "@/model/money";
import type { StoredQuote } from "@/model/quote";
import type { Pricing } from "@/model/schemas";
import { callApi } from "../../../../_ui/api-client";
import { draftTotals, quoteTexts, readQuote, type QuoteTexts } from "./quote-draft";

export type LibraryKitPrice = { label: string; amountMinor: number; currency: CurrencyCode };

/** The quote form's state: the lines as typed, read into a draft and its figures as they are typed, and the save. */
export function useQuoteForm({ jobId, version, quote, pricing, libraryKit, owner }: { jobId: string; version: number; quote: StoredQuote | null; pricing: Pricing; libraryKit: LibraryKitPrice | null; owner: boolean }) {
  const router = useRouter();
  const currency = pricing.currency;
  const kitFromLibrary = libraryKit && libraryKit.currency === currency ? libraryKit : null;
  const [t, setT] = useState<QuoteTexts>(() => quoteTexts(quote, kitFromLibrary, currency));
  const [serverErrors, setServerErrors] = useState<Record<string, string>>({});
  const [notice, setNotice] = useState<{ tone: "ok" | "error"; text: string } | null>(null);
  const [busy, setBusy] = useState(false);
  const [tried, setTried] = useState(false);
  const { draft, errors: typed } = readQuote(t, currency, owner);
  const errors = { ...(tried ? typed : {}), ...serverErrors };
  const totals = draft ? draftTotals(draft, pricing, quote) : null;
  const set = (patch: Partial<QuoteTexts>) => {
    setT((v) => ({ ...v, ...patch }));
    setServerErrors({});
  };

  async function save(e: React.FormEvent) {
    e.preventDefault();
    setTried(true);
    if (!draft) return setNotice({ tone: "error", text: "Some fields are not valid; each says what is wrong. Nothing was saved, nothing you typed is lost." });
    setBusy(true);
    const res = await callApi(`/api/v1/jobs/${jobId}/quote`, { method: "PUT", body: { version, ...draft } });
    setBusy(false);
    if (!res.ok) {
      setServerErrors(res.error.fields ?? {});
      return setNotice({ tone: "error", text: res.error.message });
    }
    setNotice({ tone: "ok", text: "The quote is saved; the job's deposit follows it." });
    router.refresh();
  }

  return { t, set, errors, totals, notice, busy, save, kitFromLibrary };
}
