import { NextResponse } from "next/server";
import { handle } from "@/app/api/_lib/respond";
import { handlePaymentWebhook } from "@/db/payments";

/**
 * Events from the payment service. Not signed in and from any origin: the signature over the raw body is
 * the authority (checked against the install's own STRIPE_WEBHOOK_SECRET).
 */
export const POST = handle(async (req: Request) => {
  const payload = await req.text();
  if (payload.length > 512 * 1024) return NextResponse.json({ received: false, error: { code: "too_large", message: "The event is too large." } }, { status: 413 });
  const outcome = await handlePaymentWebhook(payload, req.headers.get("stripe-signature"));
  return NextResponse.json(outcome.body, { status: outcome.status });
}, { callers: "signed" });
