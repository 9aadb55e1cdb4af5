import "server-only";
import { and, eq } from "drizzle-orm";
import { formatMoney, money, type Money } from "@/model/money";
import { QUOTE_CHANGED, quoteTotals, type Approve, type QuotePut, type StoredQuote } from "@/model/quote";
import { AccessError, type Caller } from "../access";
import { getDb } from "../client";
import { DataError } from "../errors";
import { libraryRowsById } from "../library";
import type * as jobs from "../schema-jobs";
import { shopPricing } from "../settings";
import { addEvent } from "./events";
import { getJob } from "./reads";
import { parseQuote, quoteFingerprint, quoteView, type QuoteView } from "./quote-view";
import { assertStaff, isStaff, j, loadFor, parsePlan, type JobView } from "./view";

// A job's quote: the shop writes it (a builder may draft it, an owner alone sets a deposit other than the
// shop's share, with a reason), the customer approves it together with the plan, and from then on it is
// fixed: changing it means moving the job back to planned, which asks for a new approval.

const STALE = "Someone else changed this job since you opened it. Reload to see their change; your edits are kept.";
/** Statuses in which the quote may still change: before the plan (and with it the quote) is approved. */
const OPEN = new Set(["intake", "planned"]);

/** The library kit's price for the job's planned kit: the suggested kit line. */
export async function libraryKitPrice(shopId: string, record: jobs.JobRecord): Promise<{ label: string; price: Money } | null> {
  if (!record.kitId) return null;
  const kit = (await libraryRowsById("kits", shopId, [record.kitId])).get(record.kitId);
  const plan = parsePlan(record);
  if (!kit?.data.price) return null;
  return { label: plan?.kitName ?? kit.name, price: money(kit.data.price.amountMinor, kit.data.price.currency) };
}

/** What the quote section needs: the stored quote with its figures, the shop's rates now and the library's kit price. */
export async function quoteFor(caller: Caller, id: string) {
  const { record } = await loadFor(caller, id);
  const quote = quoteView(caller, record.quoteJson);
  if (!isStaff(caller)) return { quote, approved: quoteView(caller, record.approvedQuoteJson), editable: false, version: record.version };
  const [pricing, kit] = await Promise.all([shopPricing(caller.shopId), libraryKitPrice(caller.shopId, record)]);
  return { quote, approved: quoteView(caller, record.approvedQuoteJson), editable: OPEN.has(record.status), version: record.version, pricing, libraryKit: kit };
}

/** Writes the job's quote, priced at the shop's rates now, and makes its deposit the job's deposit. */
export async function saveQuote(caller: Caller, id: string, put: QuotePut): Promise<{ job: JobView; quote: QuoteView }> {
  assertStaff(caller);
  const { record } = await loadFor(caller, id);
  if (record.version !== put.version) throw new DataError("conflict", STALE);
  if (!OPEN.has(record.status))
    throw new DataError("quote_fixed", "The quote was approved with the plan and is fixed now: move the job back to planned, with a reason, to change it; the customer then approves again.");
  if (record.paidAt) throw new DataError("paid", "The deposit was paid already; the quote cannot change.");
  const previous = parseQuote(record.quoteJson);
  const pricing = await shopPricing(caller.shopId);
  const fields: Record<string, string> = {};

  let kit: StoredQuote["kit"] = null;
  if (put.kit === undefined) {
    const library = await libraryKitPrice(caller.shopId, record);
    if (!record.kitId) fields.kit = "The job has no planned kit yet; attach the study's plan or leave the kit out.";
    else if (!library) fields.kit = "The library gives no price for this kit: type the kit's price, or add it to the kit in the library.";
    else if (library.price.currency !== pricing.currency)
      fields.kit = `The library prices this kit in ${library.price.currency}; the shop quotes in ${pricing.currency}. Type the kit's price in ${pricing.currency}.`;
    else kit = { label: library.label, unitMinor: library.price.amountMinor };
  } else kit = put.kit;

  if (put.machiningHours > 0 && pricing.labourRateMinor === null)
    fields.machiningHours = "The shop's labour rate is not set yet: the owner sets it in Shop settings.";

  // The deposit override is the owner's; a builder's save keeps the one there is.
  let depositOverride = previous?.depositOverride ?? null;
  if (put.depositOverride !== undefined) {
    const changes = JSON.stringify(put.depositOverride) !== JSON.stringify(depositOverride && { amountMinor: depositOverride.amountMinor, reason: depositOverride.reason });
    if (changes && caller.role !== "owner") throw new AccessError("forbidden", "Only the shop's owner asks a deposit other than the shop's share.");
    if (changes) depositOverride = put.depositOverride ? { ...put.depositOverride, by: { id: caller.userId, name: caller.name }, at: new Date().toISOString() } : null;
  }
  if (Object.keys(fields).length > 0) throw new DataError("invalid_input", "Some fields are not valid.", fields);

  const quote: StoredQuote = {
    currency: pricing.currency,
    kit,
    kitId: kit ? record.kitId : null,
    kitStale: null,
    parts: put.parts,
    machiningHours: put.machiningHours,
    others: put.others,
    labourRateMinor: pricing.labourRateMinor,
    taxPercent: pricing.taxPercent,
    depositPercent: pricing.depositPercent,
    depositOverride,
    updatedAt: new Date().toISOString(),
    updatedBy: { id: caller.userId, name: caller.name },
  };
  const totals = quoteTotals(quote);
  if (depositOverride && depositOverride.amountMinor > totals.total.amountMinor)
    throw new DataError("invalid_input", "Some fields are not valid.", { "depositOverride.amountMinor": "The deposit cannot be more than the total." });
  const db = await getDb();
  await db.transaction(async (tx) => {
    const done = await tx
      .update(j)
      .set({
        quoteJson: JSON.stringify(quote),
        depositAmount: record.ownEngine ? 0 : totals.deposit.amountMinor,
        currency: quote.currency.toLowerCase(),
        version: record.version + 1,
        updatedAt: new Date(),
      })
      .where(and(eq(j.id, id), eq(j.version, record.version)))
      .returning({ id: j.id });
    if (done.length === 0) throw new DataError("conflict", STALE);
    const why = depositOverride ? ` (the owner's deposit: ${depositOverride.reason})` : "";
    await addEvent(tx, id, { id: caller.userId, name: caller.name }, "quote", `${previous ? "changed" : "wrote"} the quote: total ${formatMoney(totals.total)}, deposit ${formatMoney(totals.deposit)}${why}`);
  });
  return { job: await getJob(caller, id), quote: { quote, totals, fingerprint: quoteFingerprint(totals) } };
}

/**
 * Refuses a customer's approval of a quote other than the one they read: `approve.quoteFingerprint` is the
 * fingerprint of the quote on their page (null: the page showed none). A job with no quote takes no body.
 */
export function checkApprovedQuote(record: jobs.JobRecord, approve: Approve): void {
  const stored = parseQuote(record.quoteJson);
  if (stored?.kitStale)
    throw new DataError("quote_stale", `The shop is pricing the new kit (${stored.kitStale.kitName}) for this plan; the price can be approved once the shop has written it.`);
  const now = stored ? quoteFingerprint(quoteTotals(stored)) : null;
  if (approve.quoteFingerprint === undefined) {
    if (now === null) return;
    throw new DataError("invalid_input", "Some fields are not valid.", { quoteFingerprint: "Send the fingerprint of the quote you read: the plan and the price are approved together." });
  }
  if (approve.quoteFingerprint !== now) throw new DataError("quote_changed", QUOTE_CHANGED);
}

/**
 * The quote after the job is re-planned with another kit: the kit line priced from the library's price
 * for the new kit, or, when the library gives none in the shop's currency, the old line taken out and the
 * quote marked as waiting for the new kit's price (the job page says so; the customer cannot approve it).
 * Null when there is no quote or its kit line already prices this kit.
 */
export async function requoteForKit(
  shopId: string,
  record: jobs.JobRecord,
  plan: { kitId: string; kitName: string } | null,
): Promise<{ quoteJson: string; depositAmount: number; summary: string } | null> {
  const previous = parseQuote(record.quoteJson);
  // No quote, or one the shop wrote without a kit line: nothing to re-price.
  if (!previous || (!previous.kit && !previous.kitStale)) return null;
  const kitId = plan?.kitId ?? null;
  const pricedFor = previous.kitId === undefined ? record.kitId : previous.kitId;
  if (kitId === pricedFor && !previous.kitStale) return null;
  let next: StoredQuote;
  let summary: string;
  const library = plan ? await libraryKitPrice(shopId, { ...record, kitId: plan.kitId, planJson: null }) : null;
  const label = plan?.kitName ?? library?.label ?? "";
  if (!plan) {
    next = { ...previous, kit: null, kitId: null, kitStale: null };
    summary = previous.kit ? `took the kit line (${previous.kit.label}) out of the quote with the plan` : "";
  } else if (library && library.price.currency === previous.currency) {
    next = { ...previous, kit: { label, unitMinor: library.price.amountMinor }, kitId: plan.kitId, kitStale: null };
    summary = `priced the new kit in the quote from the library: ${label} ${formatMoney(library.price)}${previous.kit ? ` (was ${previous.kit.label} ${formatMoney(money(previous.kit.unitMinor, previous.currency))})` : ""}`;
  } else {
    const reason = library
      ? `The library prices ${label} in ${library.price.currency}; the quote is in ${previous.currency}. Type the kit's price in ${previous.currency}.`
      : `The library gives no price for ${label}: type the kit's price, or add it to the kit in the library.`;
    const was = previous.kitStale?.previous ?? previous.kit?.label ?? "";
    next = { ...previous, kit: null, kitId: plan.kitId, kitStale: { previous: was, kitName: label, reason } };
    summary = `took the old kit line${was ? ` (${was})` : ""} out of the quote: ${reason}`;
  }
  const totals = quoteTotals(next);
  const depositOverride = next.depositOverride && next.depositOverride.amountMinor > totals.total.amountMinor ? null : next.depositOverride;
  if (depositOverride !== next.depositOverride) {
    next = { ...next, depositOverride };
    summary += "; the owner's deposit was more than the new total and gave way to the shop's share";
  }
  const deposit = quoteTotals(next).deposit.amountMinor;
  return { quoteJson: JSON.stringify(next), depositAmount: record.ownEngine ? 0 : deposit, summary };
}
