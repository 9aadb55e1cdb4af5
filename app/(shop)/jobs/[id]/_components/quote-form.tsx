"use client";

import { TERM } from "@/model/glossary";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { formatMoney, type CurrencyCode } from "@/model/money";
import type { StoredQuote } from "@/model/quote";
import type { Pricing } from "@/model/schemas";
import { callApi } from "../../../../_ui/api-client";
import { Field, FormNotice } from "../../../../_ui/field";
import { QuoteTable } from "../../_components/quote-table";
import { draftTotals, quoteTexts, readQuote, type QuoteTexts } from "./quote-draft";

type Props = {
  jobId: string;
  version: number;
  quote: StoredQuote | null;
  pricing: Pricing;
  libraryKit: { label: string; amountMinor: number; currency: CurrencyCode } | null;
  role: string;
};

/** The job's quote as the shop writes it: lines typed here, figures worked out as you type, saved with the job. */
export function QuoteForm({ jobId, version, quote, pricing, libraryKit, role }: Props) {
  const router = useRouter();
  const owner = role === "owner";
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

  const rateText = pricing.labourRateMinor === null ? "not set" : `${formatMoney({ amountMinor: pricing.labourRateMinor, currency })} an hour`;
  return (
    <form onSubmit={save} noValidate className="flex flex-col gap-4" aria-label="The quote">
      <p className="text-sm text-ink-2">
        Prices before tax, in {currency}. Labour rate {rateText}, tax {pricing.taxPercent} %, deposit {pricing.depositPercent} % of the total
        {owner ? " — change them in Shop settings." : " — the shop's owner sets them in Shop settings."}
      </p>
      <div className="grid gap-3 sm:grid-cols-[1fr_10rem]">
        <Field name="kitLabel" id="quote-kit-label" label={TERM.quoteKit.short} value={t.kitLabel} onChange={(e) => set({ kitLabel: e.target.value })} />
        <Field name="kitPrice" id="quote-kit-price" label={`${TERM.quoteKit.short} price`} unit={currency} inputMode="decimal" className="field-input num" value={t.kitPrice} error={errors["kit.unitMinor"] ?? errors.kit}
          hint={kitFromLibrary ? "From the library; blank for no kit." : "The library gives no price; blank for no kit."} onChange={(e) => set({ kitPrice: e.target.value })} />
      </div>
      <LineList
        title={TERM.quoteParts.label}
        cols="sm:grid-cols-[1fr_6rem_9rem_auto]"
        addLabel="Add a part"
        rows={t.parts}
        blank={{ label: "", quantity: "1", unit: "" }}
        onChange={(parts) => set({ parts })}
        cells={(p, i, change) => (
          <>
            <Field name={`part-${i}-label`} id={`quote-part-${i}-label`} label="Part" value={p.label} error={errors[`parts.${i}.label`]} onChange={(e) => change({ label: e.target.value })} />
            <Field name={`part-${i}-qty`} id={`quote-part-${i}-qty`} label="Quantity" inputMode="numeric" className="field-input num" value={p.quantity} error={errors[`parts.${i}.quantity`]} onChange={(e) => change({ quantity: e.target.value })} />
            <Field name={`part-${i}-unit`} id={`quote-part-${i}-unit`} label="Each" unit={currency} inputMode="decimal" className="field-input num" value={p.unit} error={errors[`parts.${i}.unitMinor`]} onChange={(e) => change({ unit: e.target.value })} />
          </>
        )}
      />
      <div className="max-w-xs">
        <Field name="hours" id="quote-hours" label={`${TERM.quoteMachining.label} time`} unit="h" inputMode="decimal" className="field-input num" value={t.hours} error={errors.machiningHours} hint="To the quarter hour: 1.25, 1.5 …" onChange={(e) => set({ hours: e.target.value })} />
      </div>
      <LineList
        title={`${TERM.quoteOther.label} lines`}
        cols="sm:grid-cols-[1fr_9rem_auto]"
        addLabel="Add a line"
        rows={t.others}
        blank={{ label: "", amount: "" }}
        onChange={(others) => set({ others })}
        cells={(o, i, change) => (
          <>
            <Field name={`other-${i}-label`} id={`quote-other-${i}-label`} label="What" value={o.label} error={errors[`others.${i}.label`]} onChange={(e) => change({ label: e.target.value })} />
            <Field name={`other-${i}-amount`} id={`quote-other-${i}-amount`} label="Amount" unit={currency} inputMode="decimal" className="field-input num" value={o.amount} error={errors[`others.${i}.amountMinor`]} onChange={(e) => change({ amount: e.target.value })} />
          </>
        )}
      />
      {owner ? (
        <fieldset className="flex flex-col gap-2">
          <label className="flex items-center gap-2 text-sm">
            <input type="checkbox" checked={t.overrideOn} onChange={(e) => set({ overrideOn: e.target.checked })} />
            Ask a deposit other than {pricing.depositPercent} % of the total
          </label>
          {t.overrideOn ? (
            <div className="grid gap-3 sm:grid-cols-[10rem_1fr]">
              <Field name="overrideAmount" id="quote-deposit" label={TERM.quoteDeposit.short} unit={currency} inputMode="decimal" className="field-input num" value={t.overrideAmount} error={errors["depositOverride.amountMinor"]} onChange={(e) => set({ overrideAmount: e.target.value })} />
              <Field name="overrideReason" id="quote-deposit-reason" label="Why (kept with the quote)" value={t.overrideReason} error={errors["depositOverride.reason"]} onChange={(e) => set({ overrideReason: e.target.value })} />
            </div>
          ) : null}
        </fieldset>
      ) : quote?.depositOverride ? (
        <p className="text-sm text-ink-2">The owner set the deposit to {formatMoney({ amountMinor: quote.depositOverride.amountMinor, currency: quote.currency })}: {quote.depositOverride.reason}</p>
      ) : null}
      {totals ? (
        <div className="card p-3" aria-label="The figures as typed">
          <QuoteTable totals={totals} taxPercent={pricing.taxPercent} depositPercent={pricing.depositPercent} overridden={owner ? t.overrideOn : Boolean(quote?.depositOverride)} />
        </div>
      ) : null}
      {notice ? <FormNotice tone={notice.tone}>{notice.text}</FormNotice> : null}
      <div>
        <button type="submit" className="btn" disabled={busy}>{busy ? "Saving…" : quote ? "Save the quote" : "Save as the job's quote"}</button>
      </div>
    </form>
  );
}

/** A list of line rows with add and remove. */
function LineList<R>({ title, cols, addLabel, rows, blank, onChange, cells }: {
  title: string;
  cols: string;
  addLabel: string;
  rows: R[];
  blank: R;
  onChange: (rows: R[]) => void;
  cells: (row: R, i: number, change: (patch: Partial<R>) => void) => React.ReactNode;
}) {
  return (
    <fieldset className="flex flex-col gap-2">
      <legend className="font-medium">{title}</legend>
      {rows.map((r, i) => (
        <div key={i} className={`grid items-start gap-3 ${cols}`}>
          {cells(r, i, (patch) => onChange(rows.map((x, k) => (k === i ? { ...x, ...patch } : x))))}
          <button type="button" className="btn-quiet sm:mt-6" onClick={() => onChange(rows.filter((_, k) => k !== i))}>Remove<span className="sr-only"> line {i + 1}</span></button>
        </div>
      ))}
      <div><button type="button" className="btn-quiet" onClick={() => onChange([...rows, blank])}>{addLabel}</button></div>
    </fieldset>
  );
}
