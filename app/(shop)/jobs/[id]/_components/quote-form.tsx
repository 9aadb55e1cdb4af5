"use client";

import { TERM } from "@/model/glossary";
import type { CurrencyCode } from "@/model/money";
import { formatMoney } from "@/model/money-text";
import type { StoredQuote } from "@/model/quote";
import type { Pricing } from "@/model/schemas";
import { Field, FormNotice } from "../../../../_ui/field";
import { QuoteTable } from "../../_components/quote-table";
import type { QuoteTexts } from "./quote-draft";
import { type LibraryKitPrice, useQuoteForm } from "./use-quote-form";

type Props = {
  jobId: string;
  version: number;
  quote: StoredQuote | null;
  pricing: Pricing;
  libraryKit: LibraryKitPrice | null;
  role: string;
};
type Errors = Record<string, string>;

/** The job's quote as the shop writes it: lines typed here, figures worked out as you type, saved with the job. */
export function QuoteForm({ jobId, version, quote, pricing, libraryKit, role }: Props) {
  const owner = role === "owner";
  const currency = pricing.currency;
  const { t, set, errors, totals, notice, busy, save, kitFromLibrary } = useQuoteForm({ jobId, version, quote, pricing, libraryKit, owner });
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
      <PartLines t={t} set={set} errors={errors} currency={currency} />
      <div className="max-w-xs">
        <Field name="hours" id="quote-hours" label={`${TERM.quoteMachining.label} time`} unit="h" inputMode="decimal" className="field-input num" value={t.hours} error={errors.machiningHours} hint="To the quarter hour: 1.25, 1.5 …" onChange={(e) => set({ hours: e.target.value })} />
      </div>
      <OtherLines t={t} set={set} errors={errors} currency={currency} />
      {owner ? (
        <DepositOverride t={t} set={set} errors={errors} currency={currency} depositPercent={pricing.depositPercent} />
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

type Part = { t: QuoteTexts; set: (patch: Partial<QuoteTexts>) => void; errors: Errors; currency: CurrencyCode };

function PartLines({ t, set, errors, currency }: Part) {
  return (
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
  );
}

function OtherLines({ t, set, errors, currency }: Part) {
  return (
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
  );
}

/** The owner's own deposit instead of the shop's share, with the reason kept beside it. */
function DepositOverride({ t, set, errors, currency, depositPercent }: Part & { depositPercent: number }) {
  return (
    <fieldset className="flex flex-col gap-2">
      <label className="flex items-center gap-2 text-sm">
        <input type="checkbox" checked={t.overrideOn} onChange={(e) => set({ overrideOn: e.target.checked })} />
        Ask a deposit other than {depositPercent} % of the total
      </label>
      {t.overrideOn ? (
        <div className="grid gap-3 sm:grid-cols-[10rem_1fr]">
          <Field name="overrideAmount" id="quote-deposit" label={TERM.quoteDeposit.short} unit={currency} inputMode="decimal" className="field-input num" value={t.overrideAmount} error={errors["depositOverride.amountMinor"]} onChange={(e) => set({ overrideAmount: e.target.value })} />
          <Field name="overrideReason" id="quote-deposit-reason" label="Why (kept with the quote)" value={t.overrideReason} error={errors["depositOverride.reason"]} onChange={(e) => set({ overrideReason: e.target.value })} />
        </div>
      ) : null}
    </fieldset>
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
