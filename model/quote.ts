// A job's quote: the kit, gaskets and parts, machining time at the shop's labour rate, other lines, tax,
// the total and the deposit. Pure: the shop's rates are given; every amount is money (model/money.ts).
//
// Prices on the lines are before tax (as a small shop quotes trade work: net lines, tax added once on their
// sum, the total with tax). Every multiplication rounds once to the minor unit, half away from zero: a line
// (quantity × unit, hours × rate), the tax on the subtotal, the deposit share of the total.
import { z } from "zod";
import { BIDI_CONTROL } from "@/model/names";
import { AmountMinorSchema, add, money, percentOf, sum, times, timesHours, zero, type CurrencyCode, type Money } from "@/model/money";

const label = (what: string) =>
  z
    .string({ error: `${what} must be text.` })
    .trim()
    .min(1, `Name the ${what.toLowerCase()}.`)
    .max(120, `Keep the ${what.toLowerCase()} to 120 characters or fewer.`)
    .refine((s) => !BIDI_CONTROL.test(s), { message: "Remove the invisible text-direction characters." });

/** Machining hours: 0 to 200, in quarter hours. */
export const HoursSchema = z
  .number({ error: "Machining time is a number of hours." })
  .min(0, "Machining time cannot be negative.")
  .max(200, "More than 200 hours is not one job.")
  .refine((h) => Math.abs(h * 4 - Math.round(h * 4)) < 1e-9, { message: "Give the machining time to the quarter hour (0.25, 0.5, 0.75 …)." });

/** A percentage with at most two decimals, 0 to 100. */
export const PercentSchema = (what: string) =>
  z
    .number({ error: `${what} is a number of percent.` })
    .min(0, `${what} cannot be negative.`)
    .max(100, `${what} is at most 100 %.`)
    .refine((p) => Math.abs(p * 100 - Math.round(p * 100)) < 1e-6, { message: `Give ${what.toLowerCase()} to two decimals at most.` });

export const QuotePartSchema = z.strictObject({
  label: label("Part"),
  quantity: z.number({ error: "The quantity is a whole number." }).int("The quantity is a whole number.").min(1, "At least 1.").max(999, "At most 999."),
  unitMinor: AmountMinorSchema,
});
export const QuoteOtherSchema = z.strictObject({ label: label("Line"), amountMinor: AmountMinorSchema });

/** What the shop writes: the lines. The kit line left out takes the library kit's price. */
export const QuoteDraftSchema = z.strictObject({
  kit: z.strictObject({ label: label("Kit"), unitMinor: AmountMinorSchema }).nullable().optional(),
  parts: z.array(QuotePartSchema).max(30, "Keep to 30 part lines or fewer.").default([]),
  machiningHours: HoursSchema.default(0),
  others: z.array(QuoteOtherSchema).max(20, "Keep to 20 other lines or fewer.").default([]),
  /** An owner's deposit instead of the shop's share, with the reason (kept with the quote). Null clears it. */
  depositOverride: z
    .strictObject({
      amountMinor: AmountMinorSchema,
      reason: z.string({ error: "Say why the deposit differs." }).trim().min(3, "Say why the deposit differs from the shop's share (kept with the quote).").max(500, "Keep the reason to 500 characters or fewer."),
    })
    .nullable()
    .optional(),
});
export type QuoteDraft = z.infer<typeof QuoteDraftSchema>;
export type QuoteDraftInput = z.input<typeof QuoteDraftSchema>;

/** The shop's rates a quote is priced at, kept with it so a later change of the settings does not move it. */
export type QuoteRates = { currency: CurrencyCode; labourRateMinor: number | null; taxPercent: number; depositPercent: number };

/** The quote as stored with the job: the lines, the rates, who wrote it last and when. */
export type StoredQuote = {
  currency: CurrencyCode;
  kit: { label: string; unitMinor: number } | null;
  /** The library kit the kit line prices (the job's planned kit when the quote was written). */
  kitId?: string | null;
  /**
   * Set when the job was re-planned with another kit whose price the library does not give in the shop's
   * currency: the old kit line is taken out and the quote waits for the shop to price the new kit.
   */
  kitStale?: { previous: string; kitName: string; reason: string } | null;
  parts: { label: string; quantity: number; unitMinor: number }[];
  machiningHours: number;
  others: { label: string; amountMinor: number }[];
  labourRateMinor: number | null;
  taxPercent: number;
  depositPercent: number;
  depositOverride: { amountMinor: number; reason: string; by: { id: string; name: string }; at: string } | null;
  updatedAt: string;
  updatedBy: { id: string; name: string };
};

/** One line of the quote; `quantity` × `unit` for parts (a count) and machining (hours at the labour rate). */
export type QuoteLine = { kind: "kit" | "part" | "machining" | "other"; label: string; quantity: number | null; unit: Money | null; amount: Money };

/** The quote's figures, each one rounded as the file header says. */
export type QuoteTotals = {
  lines: QuoteLine[];
  subtotal: Money;
  tax: Money;
  total: Money;
  /** The deposit the customer is asked: the override when an owner set one, else the shop's share of the total. */
  deposit: Money;
  /** The shop's share of the total, whether or not it is overridden. */
  depositShare: Money;
  pricesIncludeTax: false;
};

/** The lines, subtotal, tax, total and deposit of a stored quote. */
export function quoteTotals(q: StoredQuote): QuoteTotals {
  const c = q.currency;
  const lines: QuoteLine[] = [];
  if (q.kit) lines.push({ kind: "kit", label: q.kit.label, quantity: null, unit: null, amount: money(q.kit.unitMinor, c) });
  for (const p of q.parts) {
    const unit = money(p.unitMinor, c);
    lines.push({ kind: "part", label: p.label, quantity: p.quantity, unit, amount: times(unit, p.quantity) });
  }
  if (q.machiningHours > 0) {
    const rate = money(q.labourRateMinor ?? 0, c);
    lines.push({ kind: "machining", label: "Machining", quantity: q.machiningHours, unit: rate, amount: timesHours(rate, q.machiningHours) });
  }
  for (const o of q.others) lines.push({ kind: "other", label: o.label, quantity: null, unit: null, amount: money(o.amountMinor, c) });
  const subtotal = sum(lines.map((l) => l.amount), c);
  const tax = percentOf(subtotal, q.taxPercent);
  const total = add(subtotal, tax);
  const depositShare = percentOf(total, q.depositPercent);
  const deposit = q.depositOverride ? money(q.depositOverride.amountMinor, c) : depositShare;
  return { lines, subtotal, tax, total, deposit, depositShare, pricesIncludeTax: false };
}

export const emptyTotals = (currency: CurrencyCode): QuoteTotals => ({
  lines: [],
  subtotal: zero(currency),
  tax: zero(currency),
  total: zero(currency),
  deposit: zero(currency),
  depositShare: zero(currency),
  pricesIncludeTax: false,
});

/** The body of PUT /api/v1/jobs/{id}/quote. */
export const QuotePutSchema = QuoteDraftSchema.extend({ version: z.number({ error: "Send the version you last read." }).int().min(1) });
export type QuotePut = z.infer<typeof QuotePutSchema>;

/** The body of POST /api/v1/consult/{id}/approve: the fingerprint of the quote the customer read (null: they saw none). */
export const ApproveSchema = z.strictObject({
  quoteFingerprint: z
    .string({ error: "Send the fingerprint of the quote you read." })
    .regex(/^[0-9a-f]{16}$/, "Send the fingerprint of the quote you read, as the job gives it.")
    .nullable()
    .optional(),
});
export type Approve = z.infer<typeof ApproveSchema>;

/** What the customer is told when the quote changed between reading it and approving it. */
export const QUOTE_CHANGED = "The price changed since you opened this page — read it again.";
