// A local stand-in for the few payment endpoints the app uses, for development, the demo and the tests:
// create and retrieve a Checkout Session (POST/GET /v1/checkout/sessions), and a hosted checkout page
// (GET /pay/:id) whose card form completes the session and posts a signed `checkout.session.completed`
// event to the app's webhook, as the real service does. Listens on 127.0.0.1 only; keeps everything in memory.
import { randomBytes } from "node:crypto";
import { createServer } from "node:http";
import { fileURLToPath } from "node:url";
import Stripe from "stripe";

/** Card numbers the fake checkout understands: the first pays, the second is declined. */
export const FAKE_CARDS = { pays: "4242 4242 4242 4242", declined: "4000 0000 0000 0002" };

const id = (prefix) => `${prefix}_test_${randomBytes(12).toString("hex")}`;

/** Reads a form-encoded body with bracketed keys (line_items[0][price_data][currency]) into nested objects. */
function parseForm(text) {
  const out = {};
  for (const [key, value] of new URLSearchParams(text)) {
    const path = key.replace(/\]/g, "").split("[");
    let node = out;
    path.forEach((part, i) => {
      if (i === path.length - 1) node[part] = value;
      else node = node[part] ??= {};
    });
  }
  return out;
}

const escape = (s) => String(s).replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;");

function checkoutPage(session, problem = "") {
  const amount = (session.amount_total / 100).toFixed(2);
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>Test checkout</title>
<style>body{font:16px system-ui,sans-serif;background:#f3f1ec;color:#222;margin:0}main{max-width:420px;margin:48px auto;background:#fff;padding:28px;border-radius:10px;box-shadow:0 1px 4px #0002}
label{display:block;margin:14px 0 4px;font-size:14px}input{width:100%;padding:9px;font-size:16px;box-sizing:border-box}button{margin-top:20px;width:100%;padding:11px;font-size:16px;background:#1d5c5a;color:#fff;border:0;border-radius:6px}
.note{font-size:13px;color:#666}.problem{color:#a32020;margin-top:10px}</style></head><body><main>
<p class="note">Local test checkout — no real card is charged.</p>
<h1>${escape(session.line_items_summary)}</h1>
<p>Amount due: <strong data-testid="amount">${escape(session.currency.toUpperCase())} ${amount}</strong></p>
<form method="post" action="/pay/${escape(session.id)}">
<label for="card">Card number</label><input id="card" name="card" autocomplete="off" placeholder="${FAKE_CARDS.pays}">
<label for="name">Name on card</label><input id="name" name="name" autocomplete="off">
${problem ? `<p class="problem" role="alert">${escape(problem)}</p>` : ""}
<button type="submit">Pay ${escape(session.currency.toUpperCase())} ${amount}</button></form>
<p class="note"><a href="${escape(session.cancel_url ?? "/")}">Cancel and go back</a></p></main></body></html>`;
}

/**
 * Starts the fake; resolves with its address and a stop function. Port 0 picks a free port.
 * `webhookUrl` is where completed sessions are posted; when absent, the origin of each session's
 * success_url + `/api/v1/payments/webhook` is used. `secretKey`, when given, must be the bearer of every API call.
 * Both secrets default to the environment's STRIPE_WEBHOOK_SECRET and STRIPE_SECRET_KEY; none is written in the code.
 */
export async function startFakeStripe({
  host = "127.0.0.1",
  port = 12111,
  webhookSecret = process.env.STRIPE_WEBHOOK_SECRET,
  webhookUrl,
  secretKey = process.env.STRIPE_SECRET_KEY,
  quiet = false,
} = {}) {
  if (!webhookSecret) throw new Error("the payment fake signs events with STRIPE_WEBHOOK_SECRET: set it (the demo and dev scripts generate one)");
  const sessions = new Map();
  const events = [];
  let address = "";

  async function deliver(session) {
    const event = {
      id: id("evt"),
      object: "event",
      api_version: "2025-01-01",
      created: Math.floor(Date.now() / 1000),
      type: "checkout.session.completed",
      livemode: false,
      data: { object: session },
    };
    const payload = JSON.stringify(event);
    const signature = Stripe.webhooks.generateTestHeaderString({ payload, secret: webhookSecret });
    const target = webhookUrl ?? `${new URL(session.success_url).origin}/api/v1/payments/webhook`;
    events.push({ event, payload, signature, target });
    const res = await fetch(target, { method: "POST", headers: { "content-type": "application/json", "stripe-signature": signature }, body: payload });
    if (!quiet) console.log(`[payments] ${event.type} ${session.id} → ${target}: ${res.status}`);
    return res.status;
  }

  const server = createServer(async (req, res) => {
    const url = new URL(req.url ?? "/", "http://fake");
    const chunks = [];
    for await (const c of req) chunks.push(c);
    const body = Buffer.concat(chunks).toString("utf8");
    const json = (status, value) => {
      res.writeHead(status, { "content-type": "application/json" });
      res.end(JSON.stringify(value));
    };
    const apiError = (status, message, type = "invalid_request_error") => json(status, { error: { type, message } });

    if (url.pathname.startsWith("/v1/")) {
      if (secretKey && req.headers.authorization !== `Bearer ${secretKey}`) return apiError(401, "Invalid API Key provided.", "authentication_error");
      if (url.pathname === "/v1/checkout/sessions" && req.method === "POST") {
        const form = parseForm(body);
        const items = Object.values(form.line_items ?? {});
        if (!form.success_url || !form.cancel_url) return apiError(400, "Missing required param: success_url and cancel_url.");
        if (items.length === 0) return apiError(400, "Missing required param: line_items.");
        let amount = 0;
        let currency = "";
        const names = [];
        for (const item of items) {
          const unit = Number(item.price_data?.unit_amount);
          const quantity = Number(item.quantity ?? 1);
          if (!Number.isInteger(unit) || unit < 0) return apiError(400, "Invalid integer: line_items[0][price_data][unit_amount].");
          amount += unit * quantity;
          currency = item.price_data?.currency ?? currency;
          names.push(item.price_data?.product_data?.name ?? "Item");
        }
        const session = {
          id: id("cs"),
          object: "checkout.session",
          mode: form.mode ?? "payment",
          status: "open",
          payment_status: "unpaid",
          amount_total: amount,
          currency,
          client_reference_id: form.client_reference_id ?? null,
          customer_email: form.customer_email ?? null,
          metadata: form.metadata ?? {},
          success_url: form.success_url,
          cancel_url: form.cancel_url,
          payment_intent: null,
          created: Math.floor(Date.now() / 1000),
          livemode: false,
          line_items_summary: names.join(", "),
        };
        session.url = `${address}/pay/${session.id}`;
        sessions.set(session.id, session);
        return json(200, session);
      }
      const one = url.pathname.match(/^\/v1\/checkout\/sessions\/([\w-]+)$/);
      if (one && req.method === "GET") {
        const session = sessions.get(one[1]);
        return session ? json(200, session) : apiError(404, `No such checkout.session: '${one[1]}'`);
      }
      return apiError(404, `Unrecognized request URL (${req.method}: ${url.pathname}).`);
    }

    const pay = url.pathname.match(/^\/pay\/([\w-]+)$/);
    if (pay) {
      const session = sessions.get(pay[1]);
      if (!session) {
        res.writeHead(404, { "content-type": "text/html" });
        return res.end("<!doctype html><p>This checkout does not exist.</p>");
      }
      if (req.method === "GET") {
        res.writeHead(200, { "content-type": "text/html; charset=utf-8" });
        return res.end(checkoutPage(session));
      }
      if (req.method === "POST") {
        const card = (new URLSearchParams(body).get("card") ?? "").replace(/\s+/g, "");
        if (session.status === "complete") {
          res.writeHead(303, { location: session.success_url.replace("{CHECKOUT_SESSION_ID}", session.id) });
          return res.end();
        }
        if (card !== FAKE_CARDS.pays.replace(/\s+/g, "")) {
          res.writeHead(200, { "content-type": "text/html; charset=utf-8" });
          return res.end(checkoutPage(session, card === FAKE_CARDS.declined.replace(/\s+/g, "") ? "Your card was declined." : `Use the test card ${FAKE_CARDS.pays}.`));
        }
        session.status = "complete";
        session.payment_status = "paid";
        session.payment_intent = id("pi");
        try {
          await deliver(session);
        } catch (error) {
          if (!quiet) console.error(`[payments] webhook delivery failed: ${error instanceof Error ? error.message : error}`);
        }
        res.writeHead(303, { location: session.success_url.replace("{CHECKOUT_SESSION_ID}", session.id) });
        return res.end();
      }
    }
    if (url.pathname === "/events" && req.method === "GET") return json(200, { events });
    apiError(404, "Not found.");
  });

  await new Promise((resolve, reject) => {
    server.once("error", reject);
    server.listen(port, host, resolve);
  });
  const actual = server.address().port;
  address = `http://${host}:${actual}`;
  return {
    host,
    port: actual,
    url: address,
    /** Every event sent, with its exact payload and signature (the tests replay them). */
    events,
    sessions,
    stop: () => new Promise((r) => server.close(r)),
  };
}

if (process.argv[1] === fileURLToPath(import.meta.url)) {
  const fake = await startFakeStripe({
    port: Number(process.env.FAKE_STRIPE_PORT ?? 12111),
    webhookSecret: process.env.STRIPE_WEBHOOK_SECRET,
    webhookUrl: process.env.FAKE_STRIPE_WEBHOOK_URL,
    secretKey: process.env.STRIPE_SECRET_KEY,
  });
  console.log(`payments fake: ${fake.url} (checkout pages at ${fake.url}/pay/<session id>)`);
}
