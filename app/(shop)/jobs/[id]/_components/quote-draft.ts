import { TERM } from "@/model/glossary";
import { amountText, parseAmount, type CurrencyCode } from "@/model/money";
import { QuoteDraftSchema, quoteTotals, type QuoteDraft, type QuoteTotals, type StoredQuote } from "@/model/quote";
import type { Pricing } from "@/model/schemas";

// The quote form's texts as typed, read into the quote's draft (money in minor units), with what cannot be
// read kept as a message at the same path the API answers with ("parts.0.unitMinor").

export type PartText = { label: string; quantity: string; unit: string };
export type OtherText = { label: string; amount: string };
export type QuoteTexts = {
  kitLabel: string;
  kitPrice: string;
  parts: PartText[];
  hours: string;
  others: OtherText[];
  overrideOn: boolean;
  overrideAmount: string;
  overrideReason: string;
};

/** The form's first texts: the stored quote, or the library kit's price and the usual base gasket line. */
export function quoteTexts(quote: StoredQuote | null, libraryKit: { label: string; amountMinor: number } | null, currency: CurrencyCode): QuoteTexts {
  const a = (minor: number) => amountText(minor, currency);
  if (!quote) {
    return {
      kitLabel: libraryKit?.label ?? "",
      kitPrice: libraryKit ? a(libraryKit.amountMinor) : "",
      parts: [],
      hours: "",
      others: [],
      overrideOn: false,
      overrideAmount: "",
      overrideReason: "",
    };
  }
  return {
    kitLabel: quote.kit?.label ?? libraryKit?.label ?? quote.kitStale?.kitName ?? "",
    kitPrice: quote.kit ? a(quote.kit.unitMinor) : "",
    parts: quote.parts.map((p) => ({ label: p.label, quantity: String(p.quantity), unit: a(p.unitMinor) })),
    hours: quote.machiningHours ? String(quote.machiningHours) : "",
    others: quote.others.map((o) => ({ label: o.label, amount: a(o.amountMinor) })),
    overrideOn: quote.depositOverride !== null,
    overrideAmount: quote.depositOverride ? a(quote.depositOverride.amountMinor) : "",
    overrideReason: quote.depositOverride?.reason ?? "",
  };
}

/** The texts as a draft the API takes, or the messages by path. */
export function readQuote(t: QuoteTexts, currency: CurrencyCode, owner: boolean): { draft: QuoteDraft | null; errors: Record<string, string> } {
  const errors: Record<string, string> = {};
  const money = (text: string, path: string): number => {
    const v = parseAmount(text, currency);
    if (v === null) errors[path] = text.trim() ? `Write an amount in ${currency}, e.g. 12.50.` : "Give the amount.";
    return v ?? 0;
  };
  const count = (text: string, path: string): number => {
    const n = Number(text.trim());
    if (!/^\d+$/.test(text.trim()) || n < 1) errors[path] = "A whole number, 1 or more.";
    return n;
  };
  const hoursText = t.hours.trim().replace(",", ".");
  const hours = hoursText === "" ? 0 : Number(hoursText);
  if (hoursText !== "" && !Number.isFinite(hours)) errors.machiningHours = "Write the hours as a number, e.g. 1.5.";
  const raw = {
    kit: t.kitPrice.trim() === "" ? null : { label: t.kitLabel.trim() || TERM.quoteKit.label, unitMinor: money(t.kitPrice, "kit.unitMinor") },
    parts: t.parts.map((p, i) => ({ label: p.label, quantity: count(p.quantity, `parts.${i}.quantity`), unitMinor: money(p.unit, `parts.${i}.unitMinor`) })),
    machiningHours: Number.isFinite(hours) ? hours : 0,
    others: t.others.map((o, i) => ({ label: o.label, amountMinor: money(o.amount, `others.${i}.amountMinor`) })),
    ...(owner ? { depositOverride: t.overrideOn ? { amountMinor: money(t.overrideAmount, "depositOverride.amountMinor"), reason: t.overrideReason } : null } : {}),
  };
  const parsed = QuoteDraftSchema.safeParse(raw);
  if (!parsed.success) for (const issue of parsed.error.issues) errors[issue.path.map(String).join(".")] ??= issue.message;
  return { draft: Object.keys(errors).length === 0 && parsed.success ? parsed.data : null, errors };
}

/** The figures the draft gives at the shop's rates now: the same computation the server stores. */
export function draftTotals(draft: QuoteDraft, pricing: Pricing, previous: StoredQuote | null): QuoteTotals {
  const override = draft.depositOverride === undefined ? (previous?.depositOverride ?? null) : draft.depositOverride;
  return quoteTotals({
    ...pricing,
    kit: draft.kit ?? null,
    parts: draft.parts,
    machiningHours: draft.machiningHours,
    others: draft.others,
    depositOverride: override ? { ...override, by: { id: "", name: "" }, at: "" } : null,
    updatedAt: "",
    updatedBy: { id: "", name: "" },
  });
}
