import { createClient } from "@libsql/client";
import { drizzle } from "drizzle-orm/libsql";
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { inject } from "vitest";
import { applyMigrations } from "../../db/migrate";
import * as schema from "../../db/schema";
import { seedEverything } from "../../db/seed";
import { quoteTotals, type StoredQuote } from "../../model/quote";
import { confirmEmail, DEMO, Http, signIn, signUp, testDb, uniqueEmail, waitForMail } from "../support/http";
import { insertExampleStudy, jobBody, me } from "./jobs-support";

// The quote from the library kit's price to the paid deposit. The hand sums beside each check are the
// figures a shop works out on paper; rounding is once per figure, to the cent, halves up.

type Money = { amountMinor: number; currency: string };
type Totals = { lines: { kind: string; amount: Money }[]; subtotal: Money; tax: Money; total: Money; deposit: Money; depositShare: Money };
type QuoteView = {
  quote: { depositOverride: { amountMinor: number; reason: string } | null; kit: { label: string; unitMinor: number } | null; kitStale?: { kitName: string; reason: string } | null };
  totals: Totals;
  fingerprint: string;
};
type Job = { id: string; status: string; version: number; deposit: { amount: number; currency: string; paid: boolean }; quote: QuoteView | null; approvedQuote: QuoteView | null };
type Err = { error: { code: string; message: string; fields?: Record<string, string> } };

let owner: Http;
let shopId: string;
let studyId: string;
let kitIds: string[];

/** A fresh shop of its own (its prices are this file's to set), with the shipped example study. */
beforeAll(async () => {
  owner = await signUp("Quote Owner", uniqueEmail("quote-owner"));
  const o = await me(owner);
  shopId = o.shopId;
  ({ studyId, kitIds } = await insertExampleStudy(o.shopId, o.userId, `Quote study ${Date.now()}`));
});

async function setPricing(http: Http, pricing: Record<string, unknown>) {
  const current = (await http.get("/api/v1/settings")).json as { version: number };
  return http.send("PATCH", "/api/v1/settings", { version: current.version, pricing });
}

async function newJob(http: Http, over: Record<string, unknown> = {}): Promise<Job> {
  const res = await http.post("/api/v1/jobs", jobBody({ studyId, customerEmail: uniqueEmail("quote-customer"), ...over }));
  expect(res.status, res.text).toBe(201);
  return (res.json as { item: Job }).item;
}

const putQuote = (http: Http, job: { id: string; version: number }, body: Record<string, unknown>) => http.send("PUT", `/api/v1/jobs/${job.id}/quote`, { version: job.version, ...body });

/** Shares the job with its customer, who joins the shop from the mail; returns the customer signed in. */
async function shareWithCustomer(job: { id: string }, name: string): Promise<Http> {
  const customerEmail = ((await owner.get(`/api/v1/jobs/${job.id}`)).json as { job: { customer: { email: string } } }).job.customer.email;
  expect((await owner.post(`/api/v1/jobs/${job.id}/share`)).status).toBe(200);
  const mail = await waitForMail(customerEmail, /shares the plan/);
  const invitationId = mail.links.find((l) => l.includes("/invite/"))!.split("/invite/")[1];
  const customer = await signUp(name, customerEmail);
  await confirmEmail(customer, customerEmail);
  expect((await customer.post("/api/auth/organization/accept-invitation", { invitationId })).status).toBe(200);
  await customer.post("/api/auth/organization/set-active", { organizationId: shopId });
  return customer;
}

const jobOf = async (http: Http, id: string) => ((await http.get(`/api/v1/jobs/${id}`)).json as { job: Job }).job;

describe("the shop's prices", () => {
  it("are kept as money and percentages, and a bad value is refused at its field with nothing changed", async () => {
    const set = await setPricing(owner, { currency: "EUR", labourRateMinor: 6000, taxPercent: 20, depositPercent: 30 });
    expect(set.status, set.text).toBe(200);
    expect((set.json as { settings: { pricing: unknown } }).settings.pricing).toEqual({ currency: "EUR", labourRateMinor: 6000, taxPercent: 20, depositPercent: 30 });
    const bad = await setPricing(owner, { currency: "XYZ", labourRateMinor: 12.5, taxPercent: 101, depositPercent: 30 });
    expect(bad.status).toBe(400);
    expect(Object.keys((bad.json as Err).error.fields ?? {}).sort()).toEqual(["pricing.currency", "pricing.labourRateMinor", "pricing.taxPercent"]);
    const after = (await owner.get("/api/v1/settings")).json as { settings: { pricing: unknown } };
    expect(after.settings.pricing).toEqual({ currency: "EUR", labourRateMinor: 6000, taxPercent: 20, depositPercent: 30 });
  });

  it("are the owner's: a builder of the demo shop may read them but not change them", async () => {
    const builder = await signIn(DEMO.builder.email, DEMO.builder.password);
    expect((await builder.get("/api/v1/settings")).status).toBe(200);
    expect((await setPricing(builder, { currency: "EUR", labourRateMinor: 1, taxPercent: 0, depositPercent: 0 })).status).toBe(403);
  });
});

describe("a job's quote", () => {
  it("goes from the library kit's price to the paid deposit: approved with the plan, fixed after, paid through the checkout", async () => {
    const job = await newJob(owner);
    const start = (await owner.get(`/api/v1/jobs/${job.id}/quote`)).json as { quote: null; libraryKit: { price: Money } };
    // The example's chosen kit is priced 289 in the study file; the library keeps it as 28 900 cents in EUR.
    expect(start.libraryKit.price).toEqual({ amountMinor: 28_900, currency: "EUR" });

    // Kit left out: the library's price. Two base gaskets at 12.50, 1.5 h of machining at the shop's 60.00.
    const saved = await putQuote(owner, job, { parts: [{ label: "Base gasket", quantity: 2, unitMinor: 1250 }], machiningHours: 1.5 });
    expect(saved.status, saved.text).toBe(200);
    const { job: afterSave, quote } = saved.json as { job: Job; quote: QuoteView };
    // 289.00 + 2 × 12.50 + 1.5 h × 60.00 = 289.00 + 25.00 + 90.00 = 404.00
    expect(quote.totals.lines.map((l) => l.amount.amountMinor)).toEqual([28_900, 2500, 9000]);
    expect(quote.totals.subtotal).toEqual({ amountMinor: 40_400, currency: "EUR" });
    // tax 20 % of 404.00 = 80.80; total 404.00 + 80.80 = 484.80
    expect(quote.totals.tax.amountMinor).toBe(8080);
    expect(quote.totals.total.amountMinor).toBe(48_480);
    // deposit 30 % of 484.80 = 145.44
    expect(quote.totals.deposit.amountMinor).toBe(14_544);
    // The job's deposit follows the quote, replacing the 50.00 typed when the job was opened.
    expect(afterSave.deposit).toMatchObject({ amount: 14_544, currency: "eur", paid: false });
    // The deposit typed by hand no longer applies once a quote sets it.
    const typed = await owner.send("PATCH", `/api/v1/jobs/${job.id}`, { version: afterSave.version, depositAmount: 9900 });
    expect(typed.status).toBe(400);
    expect((typed.json as Err).error.fields).toHaveProperty("depositAmount");

    // Shared with a customer who joins the shop from the mail.
    const customerEmail = ((await owner.get(`/api/v1/jobs/${job.id}`)).json as { job: { customer: { email: string } } }).job.customer.email;
    expect((await owner.post(`/api/v1/jobs/${job.id}/share`)).status).toBe(200);
    const mail = await waitForMail(customerEmail, /shares the plan/);
    const invitationId = mail.links.find((l) => l.includes("/invite/"))!.split("/invite/")[1];
    const customer = await signUp("Ivy Harrow", customerEmail);
    await confirmEmail(customer, customerEmail);
    expect((await customer.post("/api/auth/organization/accept-invitation", { invitationId })).status).toBe(200);
    await customer.post("/api/auth/organization/set-active", { organizationId: shopId });

    const seen = ((await customer.get(`/api/v1/jobs/${job.id}`)).json as { job: Job }).job;
    expect(seen.quote?.totals.total.amountMinor).toBe(48_480);
    expect(seen.approvedQuote).toBeNull();
    // One approval takes the plan and the quote together; both are recorded.
    const approved = await customer.post(`/api/v1/consult/${job.id}/approve`, { quoteFingerprint: seen.quote?.fingerprint });
    expect(approved.status, approved.text).toBe(200);
    const item = (approved.json as { item: Job }).item;
    expect(item.status).toBe("approved");
    expect(item.approvedQuote?.totals.total.amountMinor).toBe(48_480);
    const history = ((await owner.get(`/api/v1/jobs/${job.id}`)).json as { history: { summary: string }[] }).history.map((h) => h.summary);
    expect(history.some((s) => /approved the plan and the quote \(total EUR\s484\.80, deposit EUR\s145\.44\)/.test(s))).toBe(true);

    // Fixed once approved.
    const late = await putQuote(owner, item, { parts: [], machiningHours: 0 });
    expect(late.status).toBe(409);
    expect((late.json as Err).error.code).toBe("quote_fixed");

    // The deposit paid through the local payment fake: 145.44 EUR asked, the signed event marks it paid.
    const checkout = await customer.post("/api/v1/payments/checkout", { jobId: job.id });
    expect(checkout.status, checkout.text).toBe(201);
    const { sessionId } = checkout.json as { sessionId: string };
    const db = testDb();
    try {
      const row = await db.execute({ sql: "select amount, currency from job_payment where checkout_session_id = ?", args: [sessionId] });
      expect(row.rows[0]).toMatchObject({ amount: 14_544, currency: "eur" });
    } finally {
      db.close();
    }
    const paid = await fetch(`${inject("jobFakes").stripeURL}/pay/${sessionId}`, { method: "POST", body: new URLSearchParams({ card: "4242 4242 4242 4242" }), redirect: "manual" });
    expect(paid.status).toBe(303);
    await expect.poll(async () => ((await customer.get(`/api/v1/jobs/${job.id}`)).json as { job: Job }).job.deposit.paid).toBe(true);
  });

  it("asks the owner's deposit instead of the share only with a reason, and never more than the total", async () => {
    const job = await newJob(owner);
    const noReason = await putQuote(owner, job, { parts: [], depositOverride: { amountMinor: 10_000, reason: "" } });
    expect(noReason.status).toBe(400);
    expect((noReason.json as Err).error.fields).toHaveProperty(["depositOverride.reason"]);
    const tooMuch = await putQuote(owner, job, { depositOverride: { amountMinor: 99_999_00, reason: "all up front" } });
    expect(tooMuch.status).toBe(400);
    expect((tooMuch.json as Err).error.fields).toHaveProperty(["depositOverride.amountMinor"]);
    const res = await putQuote(owner, job, { depositOverride: { amountMinor: 10_000, reason: "a regular customer of the shop" } });
    expect(res.status, res.text).toBe(200);
    const { job: saved, quote } = res.json as { job: Job; quote: QuoteView };
    // 289.00 kit only: tax 20 % = 57.80, total 346.80, share 30 % = 104.04; the owner asks 100.00 instead.
    expect(quote.totals.total.amountMinor).toBe(34_680);
    expect(quote.totals.depositShare.amountMinor).toBe(10_404);
    expect(saved.deposit.amount).toBe(10_000);
    expect(quote.quote.depositOverride).toMatchObject({ amountMinor: 10_000, reason: "a regular customer of the shop" });
  });

  it("refuses what it cannot price, at the field: hours off the quarter, machining without a labour rate, a stale version", async () => {
    const job = await newJob(owner);
    const quarter = await putQuote(owner, job, { machiningHours: 1.3 });
    expect(quarter.status).toBe(400);
    expect((quarter.json as Err).error.fields?.machiningHours).toMatch(/quarter hour/);
    const stale = await putQuote(owner, { id: job.id, version: job.version + 5 }, { parts: [] });
    expect(stale.status).toBe(409);

    // Another shop that has set no labour rate yet.
    const other = await signUp("Quote Owner Two", uniqueEmail("quote-owner-two"));
    const o = await me(other);
    const study = await insertExampleStudy(o.shopId, o.userId, "Quote study two");
    const created = await other.post("/api/v1/jobs", jobBody({ studyId: study.studyId, customerEmail: uniqueEmail("quote-customer-two") }));
    const otherJob = (created.json as { item: Job }).item;
    const noRate = await putQuote(other, otherJob, { machiningHours: 1 });
    expect(noRate.status).toBe(400);
    expect((noRate.json as Err).error.fields?.machiningHours).toMatch(/labour rate is not set/);
    // Nothing was written.
    expect(((await other.get(`/api/v1/jobs/${otherJob.id}`)).json as { job: Job }).job.quote).toBeNull();
    // And another shop's job is not there at all.
    expect((await putQuote(other, job, { parts: [] })).status).toBe(404);
    expect((await other.get(`/api/v1/jobs/${job.id}/quote`)).status).toBe(404);
  });

  it("a builder may draft the quote but not set a deposit of their own, and the setup card shows no prices", async () => {
    const builder = await signIn(DEMO.builder.email, DEMO.builder.password);
    const demo = await me(builder);
    const study = await insertExampleStudy(demo.shopId, demo.userId, `Builder quote study ${Date.now()}`);
    const created = await builder.post("/api/v1/jobs", jobBody({ studyId: study.studyId, customerEmail: uniqueEmail("builder-quote") }));
    const job = (created.json as { item: Job }).item;
    const drafted = await putQuote(builder, job, { kit: { label: "Kit as sold", unitMinor: 30_000 }, parts: [{ label: "Gasket set", quantity: 1, unitMinor: 1999 }] });
    expect(drafted.status, drafted.text).toBe(200);
    const saved = (drafted.json as { job: Job }).job;
    // 300.00 + 19.99 = 319.99 before tax.
    expect(saved.quote?.totals.subtotal.amountMinor).toBe(31_999);
    const own = await putQuote(builder, saved, { parts: [], depositOverride: { amountMinor: 100, reason: "my own call" } });
    expect(own.status).toBe(403);

    const card = await builder.get(`/setup-card/${job.id}`);
    expect(card.status).toBe(200);
    const text = card.text.replace(/<[^>]+>/g, " ");
    expect(text).not.toMatch(/EUR|€|319[.,]99|300[.,]00|deposit/i);
  });

  it("is approved only as the customer read it: a quote changed after the page was opened is refused with 409 and nothing is approved", async () => {
    const job = await newJob(owner);
    const first = await putQuote(owner, job, { parts: [{ label: "Base gasket", quantity: 1, unitMinor: 1250 }], machiningHours: 1 });
    expect(first.status, first.text).toBe(200);
    const customer = await shareWithCustomer(job, "Rowan Pike");
    // The customer opens the page: the quote they read, with its fingerprint.
    const read = await jobOf(customer, job.id);
    expect(read.quote?.fingerprint).toMatch(/^[0-9a-f]{16}$/);

    // The shop changes the machining time meanwhile: 1 h → 2 h at 60.00 moves the total.
    const shop = await jobOf(owner, job.id);
    const edited = await putQuote(owner, shop, { parts: [{ label: "Base gasket", quantity: 1, unitMinor: 1250 }], machiningHours: 2 });
    expect(edited.status, edited.text).toBe(200);
    const now = (edited.json as { quote: QuoteView }).quote;
    expect(now.fingerprint).not.toBe(read.quote?.fingerprint);

    const stale = await customer.post(`/api/v1/consult/${job.id}/approve`, { quoteFingerprint: read.quote?.fingerprint });
    expect(stale.status, stale.text).toBe(409);
    expect((stale.json as Err).error).toMatchObject({ code: "quote_changed", message: "The price changed since you opened this page — read it again." });
    // Without naming the quote read, a job with a quote is not approved either.
    const bare = await customer.post(`/api/v1/consult/${job.id}/approve`);
    expect(bare.status).toBe(400);
    expect((bare.json as Err).error.fields).toHaveProperty("quoteFingerprint");
    const after = await jobOf(owner, job.id);
    expect(after.status).toBe("planned");
    expect(after.approvedQuote).toBeNull();
    const history = ((await owner.get(`/api/v1/jobs/${job.id}`)).json as { history: { summary: string }[] }).history.map((h) => h.summary);
    expect(history.some((s) => s.startsWith("approved"))).toBe(false);

    // Read again, approved: the quote approved is the one the customer read the second time.
    const again = await jobOf(customer, job.id);
    const ok = await customer.post(`/api/v1/consult/${job.id}/approve`, { quoteFingerprint: again.quote?.fingerprint });
    expect(ok.status, ok.text).toBe(200);
    // 289.00 + 12.50 + 2 h × 60.00 = 421.50; tax 20 % = 84.30; total 505.80
    expect((ok.json as { item: Job }).item.approvedQuote?.totals.total.amountMinor).toBe(50_580);
  });

  it("follows a re-plan with another kit: the kit line takes the library's price, or is taken out and marked until the shop prices it", async () => {
    const job = await newJob(owner, { kitId: kitIds[0] });
    const saved = await putQuote(owner, job, { parts: [{ label: "Base gasket", quantity: 2, unitMinor: 1250 }] });
    expect(saved.status, saved.text).toBe(200);
    const before = (saved.json as { job: Job }).job;
    // 289.00 + 25.00 = 314.00 before tax
    expect(before.quote?.totals.subtotal.amountMinor).toBe(31_400);

    // The other kit of the example study: priced 349 in the study file, 34 900 cents in EUR in the library.
    const replanned = await owner.send("PATCH", `/api/v1/jobs/${job.id}`, { version: before.version, kitId: kitIds[1], planOverrideReason: "the customer asks for the long-skirt kit" });
    expect(replanned.status, replanned.text).toBe(200);
    const moved = (replanned.json as { item: Job }).item;
    const line = moved.quote?.totals.lines.find((l) => l.kind === "kit");
    expect(line?.amount).toEqual({ amountMinor: 34_900, currency: "EUR" });
    expect(moved.quote?.quote.kit?.label).toMatch(/50 mm/);
    // 349.00 + 25.00 = 374.00; tax 20 % = 74.80; total 448.80; deposit 30 % = 134.64, and the job's deposit follows.
    expect(moved.quote?.totals.total.amountMinor).toBe(44_880);
    expect(moved.quote?.totals.deposit.amountMinor).toBe(13_464);
    expect(moved.deposit.amount).toBe(13_464);

    // The first kit loses its library price; planning it again takes the old kit line out and says why.
    const db = testDb();
    try {
      const row = await db.execute({ sql: "select data_json from cylinder_kit where id = ?", args: [kitIds[0]] });
      const data = JSON.parse(String(row.rows[0].data_json));
      delete data.price;
      await db.execute({ sql: "update cylinder_kit set data_json = ? where id = ?", args: [JSON.stringify(data), kitIds[0]] });
    } finally {
      db.close();
    }
    const back = await owner.send("PATCH", `/api/v1/jobs/${job.id}`, { version: moved.version, kitId: kitIds[0] });
    expect(back.status, back.text).toBe(200);
    const unpriced = (back.json as { item: Job }).item;
    expect(unpriced.quote?.totals.lines.some((l) => l.kind === "kit")).toBe(false);
    expect(unpriced.quote?.quote.kitStale?.reason).toMatch(/no price/);
    // 25.00 left; the customer cannot approve a quote that waits for the kit's price.
    expect(unpriced.quote?.totals.subtotal.amountMinor).toBe(2500);
    const customer = await shareWithCustomer(job, "Sorrel Quince");
    const read = await jobOf(customer, job.id);
    const refused = await customer.post(`/api/v1/consult/${job.id}/approve`, { quoteFingerprint: read.quote?.fingerprint });
    expect(refused.status).toBe(409);
    expect((refused.json as Err).error.code).toBe("quote_stale");
    const history = ((await owner.get(`/api/v1/jobs/${job.id}`)).json as { history: { summary: string }[] }).history.map((h) => h.summary);
    expect(history.some((s) => /took the old kit line .* out of the quote/.test(s))).toBe(true);

    // The shop types the kit's price: the mark is gone and the customer may approve.
    const typed = await putQuote(owner, await jobOf(owner, job.id), { kit: { label: "Example 47 mm five-port kit", unitMinor: 29_500 }, parts: [{ label: "Base gasket", quantity: 2, unitMinor: 1250 }] });
    expect(typed.status, typed.text).toBe(200);
    expect((typed.json as { quote: QuoteView }).quote.quote.kitStale ?? null).toBeNull();
    const fresh = await jobOf(customer, job.id);
    expect((await customer.post(`/api/v1/consult/${job.id}/approve`, { quoteFingerprint: fresh.quote?.fingerprint })).status).toBe(200);
  });
});

describe("the demo's jobs", () => {
  it("carry a quote once planned (kit, gaskets and parts, machining, tax, deposit), approved ones keep it as approved, and a second seed writes nothing", async () => {
    // A database of its own: the shared test database has the demo shop but not its library and jobs.
    const dir = mkdtempSync(join(tmpdir(), "borewright-quote-seed-"));
    const url = `file:${join(dir, "seed.db")}`;
    const client = createClient({ url });
    try {
      await applyMigrations({ ...process.env, DATABASE_URL: url });
      const db = drizzle(client, { schema });
      expect(await seedEverything(db)).toBeGreaterThan(0);
      const rows = await client.execute("select id, status, quote_json, approved_quote_json, deposit_amount from job where id like 'demo-job-%' order by id");
      const byId = new Map(rows.rows.map((r) => [String(r.id), r]));
      expect(byId.get("demo-job-intake")?.quote_json).toBeNull();

      const planned = byId.get("demo-job-planned")!;
      const q = JSON.parse(String(planned.quote_json)) as StoredQuote;
      const t = quoteTotals(q);
      expect(t.lines.map((l) => l.kind)).toEqual(["kit", "part", "part", "machining"]);
      // The demo's chosen kit is priced 289.00 EUR in the demo library (db/seed-library.ts).
      expect(t.lines[0].amount).toEqual({ amountMinor: 28_900, currency: "EUR" });
      // 289.00 + 2 × 12.50 + 8.40 + 1.5 h × 60.00 = 289.00 + 25.00 + 8.40 + 90.00 = 412.40
      expect(t.subtotal.amountMinor).toBe(41_240);
      // tax 20 % of 412.40 = 82.48; total 494.88; deposit 30 % of 494.88 = 148.464 → 148.46
      expect(t.tax.amountMinor).toBe(8248);
      expect(t.total.amountMinor).toBe(49_488);
      expect(t.deposit.amountMinor).toBe(14_846);
      expect(Number(planned.deposit_amount)).toBe(14_846);
      expect(planned.approved_quote_json).toBeNull();

      for (const id of ["demo-job-approved", "demo-job-machined", "demo-job-verified", "demo-job-closed"]) {
        const r = byId.get(id)!;
        expect(r.approved_quote_json, id).toBe(r.quote_json);
        expect(Number(r.deposit_amount), id).toBe(14_846);
      }
      const paid = await client.execute("select amount from job_payment where job_id = 'demo-job-approved'");
      expect(Number(paid.rows[0].amount)).toBe(14_846);

      // Only missing rows are seeded: the second run changes nothing.
      expect(await seedEverything(db)).toBe(0);
    } finally {
      client.close();
      rmSync(dir, { recursive: true, force: true });
    }
  }, 60_000);
});
