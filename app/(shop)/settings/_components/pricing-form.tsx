"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { amountText, CURRENCY_CODES, parseAmount } from "@/model/money";
import { PricingSchema, type Pricing } from "@/model/schemas";
import { callApi } from "../../../_ui/api-client";
import { Field, FormNotice } from "../../../_ui/field";

type Texts = { currency: string; labourRate: string; taxPercent: string; depositPercent: string };

/** The texts as the shop's prices, or what is wrong with each, keyed as the API answers ("pricing.taxPercent"). */
function read(t: Texts): { pricing: Pricing | null; errors: Record<string, string> } {
  const errors: Record<string, string> = {};
  const rate = t.labourRate.trim() === "" ? null : parseAmount(t.labourRate, t.currency);
  if (t.labourRate.trim() !== "" && rate === null) errors["pricing.labourRateMinor"] = `Write the rate as an amount in ${t.currency}, e.g. 60 or 60.00.`;
  const pct = (text: string, key: string) => {
    const s = text.trim().replace(",", ".");
    if (!/^\d+(\.\d+)?$/.test(s)) errors[`pricing.${key}`] = "A number of percent, e.g. 20 or 7.7.";
    return Number(s);
  };
  const parsed = PricingSchema.safeParse({ currency: t.currency, labourRateMinor: rate, taxPercent: pct(t.taxPercent, "taxPercent"), depositPercent: pct(t.depositPercent, "depositPercent") });
  if (!parsed.success) for (const i of parsed.error.issues) errors[`pricing.${i.path.join(".")}`] ??= i.message;
  return { pricing: Object.keys(errors).length === 0 && parsed.success ? parsed.data : null, errors };
}

/** The shop's prices: the currency it quotes in, its labour rate, its tax and its deposit share. */
export function PricingForm({ pricing, version }: { pricing: Pricing; version: number }) {
  const router = useRouter();
  const [t, setT] = useState<Texts>({
    currency: pricing.currency,
    labourRate: pricing.labourRateMinor === null ? "" : amountText(pricing.labourRateMinor, pricing.currency),
    taxPercent: String(pricing.taxPercent),
    depositPercent: String(pricing.depositPercent),
  });
  const [server, setServer] = useState<Record<string, string>>({});
  const [notice, setNotice] = useState<{ tone: "ok" | "error"; text: string } | null>(null);
  const [busy, setBusy] = useState(false);
  const { pricing: next, errors: typed } = read(t);
  const errors = { ...typed, ...server };
  const set = (k: keyof Texts) => (e: React.ChangeEvent<HTMLInputElement | HTMLSelectElement>) => {
    setT((v) => ({ ...v, [k]: e.target.value }));
    setServer({});
  };

  async function save(e: React.FormEvent) {
    e.preventDefault();
    if (!next) return setNotice({ tone: "error", text: "Some fields are not valid; each says what is wrong. Nothing you typed is lost." });
    setBusy(true);
    const res = await callApi("/api/v1/settings", { method: "PATCH", body: { version, pricing: next } });
    setBusy(false);
    if (!res.ok) {
      setServer(res.error.fields ?? {});
      return setNotice({ tone: "error", text: res.status === 409 ? "Someone else changed the settings meanwhile. Reload to see their change; what you typed is still here." : res.error.message });
    }
    setNotice({ tone: "ok", text: "Saved. Quotes written from now on use these prices; a quote already written keeps the prices it was written with until it is saved again." });
    router.refresh();
  }

  return (
    <form aria-label="Prices" noValidate onSubmit={save} className="mt-4 flex flex-col gap-4">
      <p className="text-sm text-ink-2">
        A quote&apos;s lines are priced before tax; the tax is added once on their sum and the deposit is a share of the total, each rounded to the cent,
        halves up.
      </p>
      <div className="grid gap-4 md:grid-cols-2">
        <div>
          <label htmlFor="pricing-currency" className="field-label">Currency</label>
          <select id="pricing-currency" className="field-input" value={t.currency} onChange={set("currency")}>
            {CURRENCY_CODES.map((c) => <option key={c} value={c}>{c}</option>)}
          </select>
          <p className="field-hint">Every quote and deposit of the shop is in this currency (ISO 4217 code).</p>
        </div>
        <Field name="labourRate" id="pricing-labour-rate" label="Labour rate, per hour" unit={t.currency} inputMode="decimal" className="field-input num" value={t.labourRate} error={errors["pricing.labourRateMinor"]} hint="Machining time on a quote is charged at this rate; blank: not set." onChange={set("labourRate")} />
        <Field name="taxPercent" id="pricing-tax" label="Tax on a quote" unit="%" inputMode="decimal" className="field-input num" value={t.taxPercent} error={errors["pricing.taxPercent"]} hint="Added on the sum of the lines; 0 where the shop charges none." onChange={set("taxPercent")} />
        <Field name="depositPercent" id="pricing-deposit" label="Deposit, share of the total" unit="%" inputMode="decimal" className="field-input num" value={t.depositPercent} error={errors["pricing.depositPercent"]} hint="Asked when the customer approves; an owner may set another on one job, with a reason." onChange={set("depositPercent")} />
      </div>
      {notice ? <FormNotice tone={notice.tone}>{notice.text}</FormNotice> : null}
      <button type="submit" className="btn self-start" disabled={busy}>{busy ? "Saving…" : "Save the prices"}</button>
    </form>
  );
}
