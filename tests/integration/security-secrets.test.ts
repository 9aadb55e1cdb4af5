// Secrets: no install signs with a secret written in the source code. The runners generate their own, the
// payment fake takes its secret from the environment, a production server with a published or missing
// secret refuses to start, and an event signed with the old published secret changes nothing.
import { randomUUID } from "node:crypto";
import { mkdtempSync, readFileSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import Stripe from "stripe";
import { afterEach, describe, expect, inject, it } from "vitest";
import { KNOWN_SECRETS, productionSecretProblems } from "../../db/env";
import { startFakeStripe } from "../../scripts/fake-stripe.mjs";
import { ensureSecrets } from "../../scripts/lib.mjs";
import { Http, testDb } from "../support/http";
import { freshSecrets, startExtraServer } from "../setup/extra-server";

const NAMES = ["BETTER_AUTH_SECRET", "STRIPE_SECRET_KEY", "STRIPE_WEBHOOK_SECRET"] as const;

/** Runs `fn` with the three secrets removed from the environment, and puts them back after. */
async function withoutSecrets<T>(fn: () => Promise<T> | T): Promise<T> {
  const saved = Object.fromEntries(NAMES.map((n) => [n, process.env[n]]));
  for (const n of NAMES) delete process.env[n];
  try {
    return await fn();
  } finally {
    for (const n of NAMES) {
      if (saved[n] === undefined) delete process.env[n];
      else process.env[n] = saved[n];
    }
  }
}

describe("the runners' secrets", () => {
  const dirs: string[] = [];
  afterEach(() => {
    for (const d of dirs.splice(0)) rmSync(d, { recursive: true, force: true });
  });

  it("generates each secret once per install into the env file, random and never a published one", async () => {
    const dir = mkdtempSync(join(tmpdir(), "borewright-secrets-"));
    dirs.push(dir);
    const file = join(dir, ".env.local");
    const first = await withoutSecrets(() => {
      ensureSecrets(file);
      return Object.fromEntries(NAMES.map((n) => [n, process.env[n]]));
    });
    for (const n of NAMES) {
      expect(first[n], n).toBeTruthy();
      expect(KNOWN_SECRETS.has(first[n]!), n).toBe(false);
      expect(readFileSync(file, "utf8")).toContain(`${n}=${first[n]}`);
    }
    expect(first.STRIPE_WEBHOOK_SECRET).toMatch(/^whsec_[0-9a-f]{48}$/);
    // A second run reads the same secrets back; another install gets others.
    const again = await withoutSecrets(() => {
      ensureSecrets(file);
      return Object.fromEntries(NAMES.map((n) => [n, process.env[n]]));
    });
    expect(again).toEqual(first);
    const otherDir = mkdtempSync(join(tmpdir(), "borewright-secrets-"));
    dirs.push(otherDir);
    const other = await withoutSecrets(() => {
      ensureSecrets(join(otherDir, ".env.local"));
      return Object.fromEntries(NAMES.map((n) => [n, process.env[n]]));
    });
    for (const n of NAMES) expect(other[n]).not.toBe(first[n]);
  });

  it("the payment fake signs with the environment's secret and refuses to start without one", async () => {
    await withoutSecrets(async () => {
      await expect(startFakeStripe({ port: 0, quiet: true })).rejects.toThrow(/STRIPE_WEBHOOK_SECRET/);
      process.env.STRIPE_WEBHOOK_SECRET = `whsec_${randomUUID().replace(/-/g, "")}`;
      const fake = await startFakeStripe({ port: 0, quiet: true });
      await fake.stop();
    });
  });

  it.each([
    [{}, []],
    [{ BETTER_AUTH_SECRET: undefined }, ["BETTER_AUTH_SECRET"]],
    [{ BETTER_AUTH_SECRET: "test-secret-for-the-test-server-only-0123456789" }, ["BETTER_AUTH_SECRET"]],
    [{ BETTER_AUTH_SECRET: "short" }, ["BETTER_AUTH_SECRET"]],
    [{ STRIPE_WEBHOOK_SECRET: "whsec_local_demo" }, ["STRIPE_WEBHOOK_SECRET"]],
    [{ STRIPE_SECRET_KEY: "sk_test_local_demo" }, ["STRIPE_SECRET_KEY"]],
    [{ STRIPE_SECRET_KEY: undefined, STRIPE_WEBHOOK_SECRET: undefined }, ["STRIPE_SECRET_KEY", "STRIPE_WEBHOOK_SECRET"]],
    [{ STRIPE_SECRET_KEY: undefined, STRIPE_WEBHOOK_SECRET: undefined, PAYMENTS: "off" }, []],
  ] as const)("in production, %o is refused for %o", (change, refused) => {
    const env: Record<string, string | undefined> = { NODE_ENV: "production", ...freshSecrets(), ...change };
    const problems = productionSecretProblems(env as NodeJS.ProcessEnv);
    expect(problems.map((p) => p.split(" ")[0])).toEqual(refused);
    // Outside production nothing is refused (development and the unit tests have no secrets to protect).
    expect(productionSecretProblems({ ...env, NODE_ENV: "development" } as NodeJS.ProcessEnv)).toEqual([]);
  });
});

describe("a production server", () => {
  it.each([
    ["the test runner's old auth secret", { BETTER_AUTH_SECRET: "test-secret-for-the-test-server-only-0123456789" }],
    ["the payment fake's old webhook secret", { STRIPE_WEBHOOK_SECRET: "whsec_local_demo" }],
  ])("refuses to start with %s", async (_what, env) => {
    const server = await startExtraServer(env);
    try {
      expect(await server.exited).toBe(1);
      expect(server.log()).toMatch(/refuses to start in production/);
    } finally {
      await server.stop();
    }
  });
});

/** Whether the webhook recorded the event with this id. */
async function recorded(eventId: string): Promise<boolean> {
  const db = testDb();
  try {
    const r = await db.execute({ sql: "select count(*) as n from payment_event where id = ?", args: [eventId] });
    return Number(r.rows[0]?.n ?? 0) > 0;
  } finally {
    db.close();
  }
}

describe("the payment webhook", () => {
  it("refuses an event signed with the old published secret, and changes nothing", async () => {
    const eventId = `evt_forged_${randomUUID()}`;
    const payload = JSON.stringify({
      id: eventId,
      object: "event",
      type: "checkout.session.completed",
      data: { object: { id: `cs_test_${randomUUID()}`, object: "checkout.session", payment_status: "paid", amount_total: 5000, currency: "eur" } },
    });
    const forged = Stripe.webhooks.generateTestHeaderString({ payload, secret: "whsec_local_demo" });
    const res = await new Http().post("/api/v1/payments/webhook", payload, { "stripe-signature": forged });
    expect(res.status).toBe(400);
    expect(res.json).toMatchObject({ error: { code: "bad_signature" } });
    expect(await recorded(eventId)).toBe(false);
    // The same event signed with the install's own secret is taken: the refusal is the signature's.
    const genuine = Stripe.webhooks.generateTestHeaderString({ payload, secret: inject("jobFakes").webhookSecret });
    expect((await new Http().post("/api/v1/payments/webhook", payload, { "stripe-signature": genuine })).status).toBe(200);
    expect(await recorded(eventId)).toBe(true);
  });
});
