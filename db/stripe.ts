import "server-only";
import Stripe from "stripe";
import { KNOWN_SECRETS } from "./env";

// The payments SDK, configured from the environment: STRIPE_SECRET_KEY and STRIPE_WEBHOOK_SECRET (never
// committed), and for the local fake STRIPE_API_HOST, STRIPE_API_PORT, STRIPE_API_PROTOCOL.

export class PaymentsNotConfigured extends Error {
  constructor(what: string) {
    super(`Card payments are not set up on this server (${what} is missing).`);
    this.name = "PaymentsNotConfigured";
  }
}

let client: Stripe | undefined;

export function paymentsConfigured(): boolean {
  const secret = process.env.STRIPE_WEBHOOK_SECRET;
  return Boolean(process.env.STRIPE_SECRET_KEY && secret && !KNOWN_SECRETS.has(secret));
}

/** The one payments client of this process; pointed at the local fake when STRIPE_API_HOST is set. */
export function stripe(): Stripe {
  const key = process.env.STRIPE_SECRET_KEY;
  if (!key) throw new PaymentsNotConfigured("STRIPE_SECRET_KEY");
  const host = process.env.STRIPE_API_HOST;
  const protocol = process.env.STRIPE_API_PROTOCOL === "http" ? "http" : "https";
  client ??= new Stripe(key, {
    ...(host ? { host, port: Number(process.env.STRIPE_API_PORT || (protocol === "http" ? 80 : 443)), protocol } : {}),
    maxNetworkRetries: 1,
    timeout: 15_000,
    telemetry: false,
  });
  return client;
}

export function webhookSecret(): string {
  const secret = process.env.STRIPE_WEBHOOK_SECRET;
  // A secret published in the source code would let anyone sign a "paid" event: treat it as none.
  if (!secret || KNOWN_SECRETS.has(secret)) throw new PaymentsNotConfigured("STRIPE_WEBHOOK_SECRET");
  return secret;
}

export class MissingSignature extends Error {
  constructor() {
    super("The event carries no signature header.");
    this.name = "MissingSignature";
  }
}

/** Verifies a webhook's signature and timestamp (default tolerance: 300 s) and returns the event; throws when it does not hold. */
export function verifiedEvent(payload: string, signature: string | null): Stripe.Event {
  if (!signature) throw new MissingSignature();
  return stripe().webhooks.constructEvent(payload, signature, webhookSecret());
}
