import "server-only";
import { randomUUID } from "node:crypto";
import { and, desc, eq } from "drizzle-orm";
import Stripe from "stripe";
import { formatMoney, type CurrencyCode } from "@/model/money";
import { DataError } from "./errors";
import { AccessError, type Caller } from "./access";
import { appUrl } from "./auth";
import { getDb } from "./client";
import { isJobCustomer, jobFor } from "./jobs";
import * as jobs from "./schema-jobs";
import { PaymentsNotConfigured, stripe, verifiedEvent } from "./stripe";

// The machining deposit: the customer pays through the payment service's hosted checkout; the job is
// marked paid only when the service's signed event says the checkout completed. A replayed event (same
// id) or one whose signature does not hold changes nothing. Amounts are integers in the smallest unit.

const PAYABLE = new Set(["approved", "machined", "verified"]);

function unavailable(error: unknown): never {
  if (error instanceof PaymentsNotConfigured) throw new DataError("payments_unavailable", error.message);
  if (error instanceof Stripe.errors.StripeError) throw new DataError("payments_failed", `The payment service refused: ${error.message}`);
  throw error;
}

/** A hosted checkout for the job's deposit (reusing one still open), for the job's own customer once the plan is approved. */
export async function startDepositCheckout(caller: Caller, jobId: string): Promise<{ url: string; sessionId: string }> {
  const { record } = await jobFor(caller, jobId);
  if (!isJobCustomer(caller, record)) throw new AccessError("forbidden", "The deposit is paid by the job's customer.");
  if (record.paidAt) throw new DataError("already_paid", "The deposit is paid already. Thank you.");
  if (!PAYABLE.has(record.status)) throw new DataError("not_approved", "Approve the plan first; the deposit is paid on approval.");
  if (!Number.isInteger(record.depositAmount) || record.depositAmount <= 0) throw new DataError("no_deposit", "The shop asks no deposit for this job.");
  const db = await getDb();
  const [open] = await db
    .select()
    .from(jobs.jobPayment)
    .where(and(eq(jobs.jobPayment.jobId, jobId), eq(jobs.jobPayment.status, "open")))
    .orderBy(desc(jobs.jobPayment.createdAt))
    .limit(1);
  try {
    if (open && open.amount === record.depositAmount && open.currency === record.currency) {
      const existing = await stripe().checkout.sessions.retrieve(open.checkoutSessionId);
      if (existing.status === "open" && existing.url) return { url: existing.url, sessionId: existing.id };
    }
    const paymentId = randomUUID();
    const session = await stripe().checkout.sessions.create({
      mode: "payment",
      line_items: [
        {
          quantity: 1,
          price_data: { currency: record.currency, unit_amount: record.depositAmount, product_data: { name: `Machining deposit, ${record.reference}: ${record.title}` } },
        },
      ],
      client_reference_id: jobId,
      customer_email: caller.email,
      metadata: { jobId, shopId: record.organizationId, paymentId },
      success_url: `${appUrl()}/consult/${jobId}?checkout=done`,
      cancel_url: `${appUrl()}/consult/${jobId}?checkout=cancelled`,
    });
    if (!session.url) throw new DataError("payments_failed", "The payment service gave no checkout page.");
    await db.insert(jobs.jobPayment).values({
      id: paymentId,
      jobId,
      checkoutSessionId: session.id,
      amount: record.depositAmount,
      currency: record.currency,
      status: "open",
      createdById: caller.userId,
    });
    return { url: session.url, sessionId: session.id };
  } catch (error) {
    if (error instanceof DataError) throw error;
    return unavailable(error);
  }
}

export type WebhookOutcome = { status: number; body: { received: boolean; duplicate?: boolean; applied?: boolean; error?: { code: string; message: string } } };

/** Handles one event from the payment service: verified, applied once, in one transaction. */
export async function handlePaymentWebhook(payload: string, signature: string | null): Promise<WebhookOutcome> {
  let event: Stripe.Event;
  try {
    event = verifiedEvent(payload, signature);
  } catch (error) {
    if (error instanceof PaymentsNotConfigured) return { status: 503, body: { received: false, error: { code: "payments_unavailable", message: error.message } } };
    return { status: 400, body: { received: false, error: { code: "bad_signature", message: "The event's signature does not hold; nothing was changed." } } };
  }
  const db = await getDb();
  let outcome: WebhookOutcome = { status: 200, body: { received: true, applied: false } };
  await db.transaction(async (tx) => {
    const seen = await tx.select({ id: jobs.paymentEvent.id }).from(jobs.paymentEvent).where(eq(jobs.paymentEvent.id, event.id)).limit(1);
    if (seen.length > 0) {
      outcome = { status: 200, body: { received: true, duplicate: true, applied: false } };
      return;
    }
    await tx.insert(jobs.paymentEvent).values({ id: event.id, type: event.type, receivedAt: new Date() });
    if (event.type !== "checkout.session.completed") return;
    const session = event.data.object as Stripe.Checkout.Session;
    if (session.payment_status !== "paid") return;
    const [payment] = await tx.select().from(jobs.jobPayment).where(eq(jobs.jobPayment.checkoutSessionId, session.id)).limit(1);
    if (!payment || payment.status === "paid") return;
    // The amount and currency must be what was asked; anything else is left for the shop to look at.
    if (session.amount_total !== payment.amount || (session.currency ?? "").toLowerCase() !== payment.currency) return;
    const paidAt = new Date();
    await tx.update(jobs.jobPayment).set({ status: "paid", paidAt }).where(eq(jobs.jobPayment.id, payment.id));
    await tx.update(jobs.job).set({ paidAt, updatedAt: paidAt }).where(eq(jobs.job.id, payment.jobId));
    await tx.insert(jobs.jobEvent).values({
      id: randomUUID(),
      jobId: payment.jobId,
      at: paidAt,
      byId: null,
      byName: "payment service",
      kind: "payment",
      fromStatus: null,
      toStatus: null,
      summary: `deposit paid: ${formatMoney({ amountMinor: payment.amount, currency: payment.currency.toUpperCase() as CurrencyCode })}`,
    });
    outcome = { status: 200, body: { received: true, applied: true } };
  });
  return outcome;
}
