// The local stand-ins for hosted services, started together by the demo and dev scripts:
// the mail sink (SMTP), the payment fake (Checkout Sessions and signed webhooks) and the object store (S3).
import { startFakeStripe } from "./fake-stripe.mjs";
import { startMailSink } from "./mail-sink.mjs";
import { startObjectStore } from "./object-store.mjs";

/** The environment the app reads to reach the payment fake and the object store. */
export function fakesEnv({ payments, store, secretKey, webhookSecret }) {
  return {
    STRIPE_SECRET_KEY: secretKey,
    STRIPE_WEBHOOK_SECRET: webhookSecret,
    STRIPE_API_HOST: payments.host,
    STRIPE_API_PORT: String(payments.port),
    STRIPE_API_PROTOCOL: "http",
    ...store.env,
    AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED: "true",
  };
}

/** Starts every local service; resolves with the environment the app needs and a stop function. */
export async function startLocalServices() {
  const sink = await startMailSink({
    smtpPort: Number(process.env.MAIL_SINK_SMTP_PORT ?? 2525),
    httpPort: Number(process.env.MAIL_SINK_HTTP_PORT ?? 2526),
  });
  // The install's own secrets (scripts/lib.mjs ensureSecrets() puts them into the environment).
  const secretKey = process.env.STRIPE_SECRET_KEY;
  const webhookSecret = process.env.STRIPE_WEBHOOK_SECRET;
  if (!secretKey || !webhookSecret) throw new Error("startLocalServices needs STRIPE_SECRET_KEY and STRIPE_WEBHOOK_SECRET in the environment (ensureSecrets() makes them)");
  const payments = await startFakeStripe({ port: Number(process.env.FAKE_STRIPE_PORT ?? 12111), webhookSecret, secretKey });
  const store = await startObjectStore({ port: Number(process.env.OBJECT_STORE_PORT ?? 4569), directory: "data/objects" });
  console.log(`mail sink: SMTP ${sink.host}:${sink.smtpPort} (the owner's Outbox page lists what it catches)`);
  console.log(`payment fake: ${payments.url}   object store: ${store.env.S3_ENDPOINT ?? `port ${store.port}`}`);
  const env = {
    SMTP_HOST: sink.host,
    SMTP_PORT: String(sink.smtpPort),
    SMTP_IGNORE_TLS: "true",
    MAIL_SINK_URL: sink.url,
    ...fakesEnv({ payments, store, secretKey, webhookSecret }),
  };
  return { env, stop: () => Promise.allSettled([sink.stop(), payments.stop(), store.stop()]) };
}
