import "server-only";
import { createHash } from "node:crypto";
import { formatMoney } from "@/model/money";
import { quoteTotals, type QuoteTotals, type StoredQuote } from "@/model/quote";
import type { Caller } from "../access";
import { SHOP_STAFF } from "../roles";
import type * as jobs from "../schema-jobs";

// A job's stored quote read back: its figures for a caller and the words its approval is recorded with.

/** The quote as stored on the job (null when none is written or it no longer parses). */
export function parseQuote(json: string | null): StoredQuote | null {
  if (!json) return null;
  try {
    return JSON.parse(json) as StoredQuote;
  } catch (error) {
    // A quote that no longer parses shows as none; the shop writes it again.
    console.warn("a job's stored quote does not parse; it shows as no quote.", error);
    return null;
  }
}

/**
 * The quote's figures as one short hash: every line (its kind, words, quantity, unit and amount), the
 * subtotal, tax, total and deposit, in its currency. The customer's approval names it; any change of a
 * figure or a line's words gives another one. Who wrote it and when are not figures and are left out.
 */
export function quoteFingerprint(totals: QuoteTotals): string {
  const figures = {
    lines: totals.lines.map((l) => [l.kind, l.label, l.quantity, l.unit?.amountMinor ?? null, l.amount.amountMinor, l.amount.currency]),
    subtotal: totals.subtotal,
    tax: totals.tax,
    total: totals.total,
    deposit: totals.deposit,
  };
  return createHash("sha256").update(JSON.stringify(figures)).digest("hex").slice(0, 16);
}

/** The quote, its figures and their fingerprint (what an approval names). */
export type QuoteView = { quote: StoredQuote; totals: QuoteTotals; fingerprint: string };

/** The quote and its figures for a caller; a customer does not see why an owner changed the deposit. */
export function quoteView(caller: Caller, json: string | null): QuoteView | null {
  const q = parseQuote(json);
  if (!q) return null;
  const shown = SHOP_STAFF.includes(caller.role) || !q.depositOverride ? q : { ...q, depositOverride: { ...q.depositOverride, reason: "" } };
  const totals = quoteTotals(q);
  return { quote: shown, totals, fingerprint: quoteFingerprint(totals) };
}

/** The history words for an approval that takes the quote with the plan. */
export function approvalWords(record: jobs.JobRecord): string {
  const q = parseQuote(record.quoteJson);
  if (!q) return "the plan (no quote was written)";
  const t = quoteTotals(q);
  return `the plan and the quote (total ${formatMoney(t.total)}, deposit ${formatMoney(t.deposit)})`;
}
