import "server-only";
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

export type QuoteView = { quote: StoredQuote; totals: QuoteTotals };

/** The quote and its figures for a caller; a customer does not see why an owner changed the deposit. */
export function quoteView(caller: Caller, json: string | null): QuoteView | null {
  const q = parseQuote(json);
  if (!q) return null;
  const shown = SHOP_STAFF.includes(caller.role) || !q.depositOverride ? q : { ...q, depositOverride: { ...q.depositOverride, reason: "" } };
  return { quote: shown, totals: quoteTotals(q) };
}

/** The history words for an approval that takes the quote with the plan. */
export function approvalWords(record: jobs.JobRecord): string {
  const q = parseQuote(record.quoteJson);
  if (!q) return "the plan (no quote was written)";
  const t = quoteTotals(q);
  return `the plan and the quote (total ${formatMoney(t.total)}, deposit ${formatMoney(t.deposit)})`;
}
