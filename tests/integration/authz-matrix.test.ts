// Who may call what: every route under app/api × every kind of caller × a row of their own shop and a row
// of another shop. A route that exists under app/api but is missing here, or from the one route list the
// API description is generated from (app/api/v1/_lib/openapi.ts), fails the route-list test. The pages
// that show one row answer 404 for another shop's row and leave it as it was.
import { randomUUID } from "node:crypto";
import { readdirSync, statSync } from "node:fs";
import { dirname, join, relative, sep } from "node:path";
import { pathToFileURL } from "node:url";
import Stripe from "stripe";
import { beforeAll, describe, expect, inject, it } from "vitest";
import { LIBRARY_ROUTES, OPERATIONS } from "../../app/api/v1/_lib/openapi";
import { DEMO, Http, signIn, testDb, uniqueEmail } from "../support/http";
import { insertExampleStudy, jobBody, me, openCheckout, PASSING_READINGS } from "./jobs-support";
import { caseData, freshShopOwner, kitData, newCase, newKit, newRig, ok, rigData, type Row } from "./library-fixtures";

type Actor = "owner" | "builder" | "customer" | "stranger" | "anonymous";
type Side = "own" | "other" | "none";
type Entity = "cases" | "kits" | "rigs" | "studies";
const ACTORS: Actor[] = ["owner", "builder", "customer", "stranger", "anonymous"];

/** What one actor's own shop holds, for bodies that must refer to it. */
type Shop = { http: Http; caseId: string; kitId: string };
/** `params` are those the route's `row` hook made (empty without one). */
type Ctx = { actor: Actor; shop: Shop; http: Http; params: Record<string, string> };
type Expected = Record<Actor, number>;
type RouteCase = {
  method: "GET" | "POST" | "PUT" | "PATCH" | "DELETE";
  path: string;
  /** A row the path's {id} names: the actor's own shop's and another shop's are both tried. */
  entity?: Entity;
  /**
   * For rows of other domains: makes a row in the given shop (through that shop's owner, `shop.http`) and
   * returns the path's parameters ({ id, photoId, … }). Both sides are tried, as for `entity`.
   */
  row?: (shop: Shop) => Promise<Record<string, string>>;
  /** What the row is, when a route is tried on more than one kind of row. */
  as?: string;
  /** Whether the call changes the row, so every cell gets a row of its own. */
  mutates?: boolean;
  query?: string;
  body?: (ctx: Ctx) => unknown | Promise<unknown>;
  /** Extra request headers, made from the body that is sent. */
  headers?: (ctx: Ctx, body: unknown) => Record<string, string>;
  /** Runs after each actor's call: what the call must (or must not) have changed. */
  check?: (ctx: Ctx, body: unknown, status: number) => Promise<void>;
  own: Expected;
  other?: Expected;
  /** A route the matrix lists but does not call, and why. */
  skip?: string;
};

// Expected statuses by role, for a row of the caller's own shop and for another shop's row. A new route
// under app/api gets its row here (the last test fails until it has one).
const staff = (ok: number): Expected => ({ owner: ok, builder: ok, customer: 403, stranger: ok, anonymous: 401 });
const staffOther: Expected = { owner: 404, builder: 404, customer: 403, stranger: 404, anonymous: 401 };
const ownerOnly = (ok: number): Expected => ({ owner: ok, builder: 403, customer: 403, stranger: ok, anonymous: 401 });
const member = (ok: number): Expected => ({ owner: ok, builder: ok, customer: ok, stranger: ok, anonymous: 401 });
const anyone = (ok: number): Expected => ({ owner: ok, builder: ok, customer: ok, stranger: ok, anonymous: ok });

let seq = 0;
const label = (what: string) => `Matrix ${what} ${Date.now().toString(36)}-${seq++}`;

const CREATE: Record<Exclude<Entity, "studies">, () => unknown> = {
  cases: () => ({ name: label("case"), data: caseData() }),
  kits: () => ({ name: label("kit"), data: kitData(47, 53.92) }),
  rigs: () => ({ name: label("rig"), data: rigData() }),
};

const studyFile = () => ({
  name: label("study file"),
  case: { name: label("file case"), ...caseData() },
  kits: [{ id: "k1", name: label("file kit"), ...kitData(47, 53.92) }],
});

function library(e: Exclude<Entity, "studies">): RouteCase[] {
  const base = `/api/v1/${e}`;
  return [
    { method: "GET", path: base, own: staff(200) },
    { method: "POST", path: base, body: CREATE[e], own: staff(201) },
    { method: "GET", path: `${base}/{id}`, entity: e, own: staff(200), other: staffOther },
    { method: "PATCH", path: `${base}/{id}`, entity: e, mutates: true, body: () => ({ version: 1, name: label("renamed") }), own: staff(200), other: staffOther },
    { method: "DELETE", path: `${base}/{id}`, entity: e, mutates: true, own: staff(204), other: staffOther },
    { method: "POST", path: `${base}/{id}/archive`, entity: e, mutates: true, own: staff(200), other: staffOther },
    { method: "POST", path: `${base}/{id}/restore`, entity: e, mutates: true, own: staff(200), other: staffOther },
  ];
}

// ── Jobs, consult and payments ──────────────────────────────────────────────────────────────────
// Staff work on their shop's jobs; a customer reaches a job of their shop only once it is shared with
// them (before that, and for anyone else's job, it is a plain 404); another shop's job is a 404 for
// everyone the role lets that far. The payment webhook is public: its signature is the authority.

/** The smallest valid PNG: the 8-byte signature (PNG spec, ISO/IEC 15948 §5.2) and a 1×1 image. */
const PNG = Buffer.from("89504e470d0a1a0a0000000d4948445200000001000000010806000000" + "1f15c4890000000d49444154789c6360000002000001e221bc330000000049454e44ae426082", "hex");

const notFound: Expected = { owner: 404, builder: 404, customer: 404, stranger: 404, anonymous: 401 };
/** Staff see the row; the customer answers `customer` (200 once shared with them, else 404). */
const jobMember = (ok: number, customer: number): Expected => ({ owner: ok, builder: ok, customer, stranger: ok, anonymous: 401 });
const customerOnly = (ok: number): Expected => ({ owner: 403, builder: 403, customer: ok, stranger: 403, anonymous: 401 });
/** Approving for the customer: the owner with a reason, never a builder; the job's own customer once shared. */
const approval = (customer: number): Expected => ({ owner: 200, builder: 403, customer, stranger: 200, anonymous: 401 });

type JobSetup = { shopId: string; userId: string; studyId: string };
const jobSetups = new Map<Http, Promise<JobSetup>>();
/** The shop's study (the shipped example) that the matrix's jobs are planned from. */
function jobSetup(shop: Shop): Promise<JobSetup> {
  let setup = jobSetups.get(shop.http);
  if (!setup) {
    setup = (async () => {
      const m = await me(shop.http);
      const { studyId } = await insertExampleStudy(m.shopId, m.userId, label("jobs study"));
      return { shopId: m.shopId, userId: m.userId, studyId };
    })();
    jobSetups.set(shop.http, setup);
  }
  return setup;
}

type JobKind = { shared?: boolean; status?: "planned" | "approved" | "machined"; forSomeoneElse?: boolean };

/**
 * A planned job in the shop, made through the shop's owner. In the demo shop it is the demo customer's
 * job unless `forSomeoneElse`; a job shared in the other shop goes to someone of that shop, so the demo
 * customer is never invited elsewhere.
 */
async function newJob(shop: Shop, kind: JobKind = {}): Promise<string> {
  const { studyId } = await jobSetup(shop);
  const customerEmail = kind.forSomeoneElse || (kind.shared && shop !== shopA) ? uniqueEmail("matrix-customer") : DEMO.customer.email;
  const job = ok<{ item: { id: string; status: string } }>(await shop.http.post("/api/v1/jobs", jobBody({ studyId, customerEmail, title: label("job") })), 201).item;
  expect(job.status).toBe("planned");
  if (kind.shared) ok(await shop.http.post(`/api/v1/jobs/${job.id}/share`));
  if (kind.status === "approved" || kind.status === "machined") ok(await shop.http.post(`/api/v1/jobs/${job.id}/move`, { to: "approved", reason: "approved by phone" }));
  if (kind.status === "machined") ok(await shop.http.post(`/api/v1/jobs/${job.id}/move`, { to: "machined" }));
  return job.id;
}

/** A checked photo on the job, uploaded straight to the object store. */
async function newPhoto(shop: Shop, jobId: string, shared: boolean): Promise<string> {
  const start = ok<{ id: string; uploadUrl: string }>(await shop.http.post(`/api/v1/jobs/${jobId}/photos`, { contentType: "image/png", sizeBytes: PNG.length, kind: "after", shared }), 201);
  const put = await fetch(start.uploadUrl, { method: "PUT", headers: { "content-type": "image/png" }, body: PNG });
  expect(put.status).toBe(200);
  ok(await shop.http.post(`/api/v1/jobs/${jobId}/photos/${start.id}/complete`));
  return start.id;
}

/** A fresh job for every call (for calls that change it). */
const jobRow = (kind: JobKind) => async (shop: Shop) => ({ id: await newJob(shop, kind) });
const photoRow = (kind: JobKind, sharedPhoto: boolean) => async (shop: Shop) => {
  const id = await newJob(shop, kind);
  return { id, photoId: await newPhoto(shop, id, sharedPhoto) };
};
const rowsMade = new Map<string, Promise<Record<string, string>>>();
/** One row per shop, made on first use and shared by the calls that leave it as it is. */
const once = (key: string, make: (shop: Shop) => Promise<Record<string, string>>) => (shop: Shop) => {
  const k = `${key}:${shop === shopA ? "A" : "B"}`;
  let made = rowsMade.get(k);
  if (!made) {
    made = make(shop);
    rowsMade.set(k, made);
  }
  return made;
};

const HIDDEN = "the demo customer's job, not shared yet";
const SHARED = "shared with the demo customer";
const hiddenJob = once("hidden", jobRow({}));
const sharedJob = once("shared", jobRow({ shared: true }));
const someoneElsesJob = once("someone else's", jobRow({ shared: true, forSomeoneElse: true }));
const machinedJob = once("machined", jobRow({ status: "machined" }));
const approvedShared = once("approved shared", jobRow({ shared: true, status: "approved" }));
const approvedHidden = once("approved hidden", jobRow({ status: "approved" }));
const sharedPhoto = once("shared photo", photoRow({ shared: true }, true));

/** A checked deck photo on a fresh case profile of the shop. */
async function newCasePhoto(shop: Shop): Promise<Record<string, string>> {
  const c = await newCase(shop.http);
  const start = ok<{ id: string; uploadUrl: string }>(await shop.http.post(`/api/v1/cases/${c.id}/photos`, { contentType: "image/png", sizeBytes: PNG.length }), 201);
  const put = await fetch(start.uploadUrl, { method: "PUT", headers: { "content-type": "image/png" }, body: PNG });
  expect(put.status).toBe(200);
  ok(await shop.http.post(`/api/v1/cases/${c.id}/photos/${start.id}/complete`));
  return { id: c.id, photoId: start.id };
}
const casePhoto = once("case photo", newCasePhoto);

type PaymentFixture = { jobId: string; sessionId: string };
let paymentFixture: Promise<PaymentFixture> | undefined;
/** A job of the demo shop with an open deposit checkout, which a genuine completed event would mark paid. */
function openPayment(): Promise<PaymentFixture> {
  paymentFixture ??= (async () => {
    const jobId = await newJob(shopA, { status: "approved" });
    const { userId } = await jobSetup(shopA);
    return { jobId, sessionId: await openCheckout(jobId, userId, "matrix") };
  })();
  return paymentFixture;
}

/** A "checkout completed, paid" event for the open checkout, as raw text. */
const completedEvent = async () => {
  const { sessionId } = await openPayment();
  return JSON.stringify({
    id: `evt_matrix_${randomUUID()}`,
    object: "event",
    type: "checkout.session.completed",
    data: { object: { id: sessionId, object: "checkout.session", payment_status: "paid", amount_total: 5000, currency: "eur" } },
  });
};

async function paymentState(eventId: string) {
  const { jobId, sessionId } = await openPayment();
  const db = testDb();
  try {
    const r = await db.execute({
      sql: `select (select paid_at from job where id = ?1) as paidAt,
                   (select status from job_payment where checkout_session_id = ?2) as payment,
                   (select count(*) from job_event where job_id = ?1 and kind = 'payment') as paymentEvents,
                   (select count(*) from payment_event where id = ?3) as recorded`,
      args: [jobId, sessionId, eventId],
    });
    return { paidAt: r.rows[0]?.paidAt ?? null, payment: r.rows[0]?.payment, paymentEvents: Number(r.rows[0]?.paymentEvents), recorded: Number(r.rows[0]?.recorded) };
  } finally {
    db.close();
  }
}

const eventId = (body: unknown) => (JSON.parse(String(body)) as { id: string }).id;
/** A refused event leaves the deposit unpaid, the checkout open and the event unrecorded. */
const changesNothing = async (_ctx: Ctx, body: unknown) => {
  expect(await paymentState(eventId(body))).toEqual({ paidAt: null, payment: "open", paymentEvents: 0, recorded: 0 });
};

const JOBS: RouteCase[] = [
  { method: "GET", path: "/api/v1/jobs", own: member(200) },
  { method: "POST", path: "/api/v1/jobs", body: () => jobBody({ customerEmail: uniqueEmail("matrix-walk-in"), title: label("walk-in job") }), own: staff(201) },
  { method: "GET", path: "/api/v1/jobs/{id}", row: hiddenJob, as: HIDDEN, own: jobMember(200, 404), other: notFound },
  { method: "GET", path: "/api/v1/jobs/{id}", row: sharedJob, as: SHARED, own: member(200), other: notFound },
  { method: "GET", path: "/api/v1/jobs/{id}", row: someoneElsesJob, as: "shared with another customer", own: jobMember(200, 404), other: notFound },
  { method: "PATCH", path: "/api/v1/jobs/{id}", row: jobRow({}), mutates: true, body: () => ({ version: 1, title: label("renamed job") }), own: staff(200), other: staffOther },
  { method: "POST", path: "/api/v1/jobs/{id}/move", row: jobRow({}), as: `${HIDDEN}, back to intake`, mutates: true, body: () => ({ to: "intake", reason: "re-measure the case" }), own: jobMember(200, 404), other: notFound },
  { method: "POST", path: "/api/v1/jobs/{id}/move", row: jobRow({ shared: true }), as: `${SHARED}, to approved`, mutates: true, body: () => ({ to: "approved", reason: "approved by phone" }), own: approval(200), other: notFound },
  { method: "POST", path: "/api/v1/jobs/{id}/move", row: jobRow({}), as: `${HIDDEN}, to approved`, mutates: true, body: () => ({ to: "approved", reason: "approved by phone" }), own: approval(404), other: notFound },
  { method: "POST", path: "/api/v1/jobs/{id}/readings", row: machinedJob, as: "machined", body: () => PASSING_READINGS, own: staff(201), other: staffOther },
  { method: "GET", path: "/api/v1/jobs/{id}/quote", row: hiddenJob, as: HIDDEN, own: jobMember(200, 404), other: notFound },
  { method: "GET", path: "/api/v1/jobs/{id}/quote", row: sharedJob, as: SHARED, own: member(200), other: notFound },
  { method: "PUT", path: "/api/v1/jobs/{id}/quote", row: jobRow({}), mutates: true, body: () => ({ version: 1, kit: null, parts: [{ label: "Base gasket", quantity: 2, unitMinor: 1250 }] }), own: staff(200), other: staffOther },
  { method: "POST", path: "/api/v1/jobs/{id}/share", row: once("to share", jobRow({})), own: staff(200), other: staffOther },
  { method: "POST", path: "/api/v1/jobs/{id}/questions", row: hiddenJob, as: HIDDEN, body: () => ({ text: "Will the kit clear the transfer ports?" }), own: jobMember(201, 404), other: notFound },
  { method: "POST", path: "/api/v1/jobs/{id}/questions", row: sharedJob, as: SHARED, body: () => ({ text: "Will the kit clear the transfer ports?" }), own: member(201), other: notFound },
  { method: "GET", path: "/api/v1/jobs/{id}/photos", row: hiddenJob, as: HIDDEN, own: jobMember(200, 404), other: notFound },
  { method: "GET", path: "/api/v1/jobs/{id}/photos", row: sharedJob, as: SHARED, own: member(200), other: notFound },
  { method: "POST", path: "/api/v1/jobs/{id}/photos", row: hiddenJob, body: () => ({ contentType: "image/png", sizeBytes: PNG.length, kind: "before" }), own: staff(201), other: staffOther },
  { method: "GET", path: "/api/v1/jobs/{id}/photos/{photoId}", row: sharedPhoto, as: `a shared photo, ${SHARED}`, own: member(303), other: notFound },
  { method: "GET", path: "/api/v1/jobs/{id}/photos/{photoId}", row: once("unshared photo", photoRow({ shared: true }, false)), as: `an unshared photo, ${SHARED}`, own: jobMember(303, 404), other: notFound },
  { method: "GET", path: "/api/v1/jobs/{id}/photos/{photoId}", row: once("photo of hidden", photoRow({}, true)), as: `a shared photo, ${HIDDEN}`, own: jobMember(303, 404), other: notFound },
  { method: "PATCH", path: "/api/v1/jobs/{id}/photos/{photoId}", row: sharedPhoto, body: () => ({ caption: label("caption") }), own: staff(200), other: staffOther },
  { method: "POST", path: "/api/v1/jobs/{id}/photos/{photoId}/complete", row: sharedPhoto, own: staff(200), other: staffOther },
  { method: "GET", path: "/api/v1/jobs/{id}/setup-card.pdf", row: hiddenJob, own: staff(200), other: staffOther },
  { method: "GET", path: "/api/v1/consult", own: customerOnly(200) },
  { method: "POST", path: "/api/v1/consult/{id}/approve", row: jobRow({ shared: true }), as: SHARED, mutates: true, own: customerOnly(200), other: customerOnly(404) },
  { method: "POST", path: "/api/v1/consult/{id}/approve", row: jobRow({}), as: HIDDEN, mutates: true, own: customerOnly(404), other: customerOnly(404) },
  { method: "POST", path: "/api/v1/payments/checkout", row: approvedShared, as: `approved, ${SHARED}`, body: ({ params }) => ({ jobId: params.id }), own: customerOnly(201), other: customerOnly(404) },
  { method: "POST", path: "/api/v1/payments/checkout", row: approvedHidden, as: `approved, ${HIDDEN}`, body: ({ params }) => ({ jobId: params.id }), own: customerOnly(404), other: customerOnly(404) },
  { method: "POST", path: "/api/v1/payments/webhook", as: "an unsigned completed event", body: completedEvent, check: changesNothing, own: anyone(400) },
  {
    method: "POST",
    path: "/api/v1/payments/webhook",
    as: "a completed event signed with another secret",
    body: completedEvent,
    headers: (_ctx, body) => ({ "stripe-signature": Stripe.webhooks.generateTestHeaderString({ payload: String(body), secret: "whsec_not_the_shops_secret" }) }),
    check: changesNothing,
    own: anyone(400),
  },
  {
    method: "POST",
    path: "/api/v1/payments/webhook",
    as: "a genuine event of a kind that changes no job",
    body: () => JSON.stringify({ id: `evt_matrix_${randomUUID()}`, object: "event", type: "payment_intent.created", data: { object: { id: `pi_${randomUUID()}`, object: "payment_intent" } } }),
    headers: (_ctx, body) => ({ "stripe-signature": Stripe.webhooks.generateTestHeaderString({ payload: String(body), secret: inject("jobFakes").webhookSecret }) }),
    check: async (_ctx, body) => expect((await paymentState(eventId(body))).recorded).toBe(1),
    own: anyone(200),
  },
];

const MATRIX: RouteCase[] = [
  ...library("cases"),
  { method: "GET", path: "/api/v1/cases/{id}/photos", entity: "cases", own: staff(200), other: staffOther },
  { method: "POST", path: "/api/v1/cases/{id}/photos", entity: "cases", body: () => ({ contentType: "image/png", sizeBytes: PNG.length }), own: staff(201), other: staffOther },
  { method: "GET", path: "/api/v1/cases/{id}/photos/{photoId}", row: casePhoto, own: staff(303), other: staffOther },
  { method: "POST", path: "/api/v1/cases/{id}/photos/{photoId}/complete", row: casePhoto, own: staff(200), other: staffOther },
  { method: "PATCH", path: "/api/v1/cases/{id}/photos/{photoId}", row: casePhoto, body: () => ({ reference: null }), own: staff(200), other: staffOther },
  { method: "DELETE", path: "/api/v1/cases/{id}/photos/{photoId}", row: newCasePhoto, mutates: true, own: staff(204), other: staffOther },
  ...library("kits"),
  ...library("rigs"),
  { method: "GET", path: "/api/v1/studies", own: staff(200) },
  { method: "POST", path: "/api/v1/studies", body: ({ shop }) => ({ name: label("study"), caseId: shop.caseId, kitIds: [shop.kitId] }), own: staff(201) },
  { method: "GET", path: "/api/v1/studies/{id}", entity: "studies", own: staff(200), other: staffOther },
  { method: "PATCH", path: "/api/v1/studies/{id}", entity: "studies", mutates: true, body: () => ({ version: 1, name: label("renamed study") }), own: staff(200), other: staffOther },
  { method: "POST", path: "/api/v1/studies/{id}/archive", entity: "studies", mutates: true, own: staff(200), other: staffOther },
  { method: "POST", path: "/api/v1/studies/{id}/restore", entity: "studies", mutates: true, own: staff(200), other: staffOther },
  { method: "POST", path: "/api/v1/studies/{id}/duplicate", entity: "studies", own: staff(201), other: staffOther },
  { method: "GET", path: "/api/v1/studies/{id}/results", entity: "studies", own: staff(200), other: staffOther },
  { method: "GET", path: "/api/v1/studies/{id}/history", entity: "studies", own: staff(200), other: staffOther },
  { method: "GET", path: "/api/v1/studies/{id}/export", entity: "studies", own: staff(200), other: staffOther },
  { method: "POST", path: "/api/v1/studies/import", body: studyFile, own: staff(201) },
  { method: "GET", path: "/api/v1/library/template", query: "?kind=cases", own: staff(200) },
  { method: "GET", path: "/api/v1/library/export", query: "?kind=kits", own: staff(200) },
  { method: "POST", path: "/api/v1/library/import", query: "?kind=kits", body: () => ({ csv: "name,bore_mm\n", confirm: false }), own: staff(200) },
  { method: "GET", path: "/api/v1/settings", own: staff(200) },
  {
    method: "PATCH",
    path: "/api/v1/settings",
    body: async ({ http }) => {
      const r = await http.get("/api/v1/settings");
      return { version: r.status === 200 ? (r.json as { version: number }).version : 1, units: "mm" };
    },
    own: ownerOnly(200),
  },
  { method: "POST", path: "/api/v1/fit", body: studyFile, own: member(200) },
  { method: "GET", path: "/api/v1/openapi.json", own: anyone(200) },
  { method: "GET", path: "/api/v1/me", own: member(200) },
  { method: "POST", path: "/api/v1/me", body: () => ({ units: "mm" }), own: member(200) },
  { method: "GET", path: "/api/v1/shops", own: member(200) },
  { method: "POST", path: "/api/v1/shops", body: () => ({ name: label("shop") }), own: member(201) },
  ...JOBS,
  { method: "GET", path: "/api/auth/{...all}", own: anyone(200), skip: "the sign-in library's own endpoints, covered by the sign-in tests" },
  { method: "POST", path: "/api/auth/{...all}", own: anyone(200), skip: "the sign-in library's own endpoints, covered by the sign-in tests" },
];

let clients: Record<Actor, Http>;
let shopA: Shop;
let shopB: Shop;

async function shopOf(http: Http): Promise<Shop> {
  const c = await newCase(http);
  const k = await newKit(http);
  return { http, caseId: c.id, kitId: k.id };
}

/** A row of an entity in the shop that `shop.http` owns. */
async function makeRow(shop: Shop, e: Entity): Promise<Row> {
  if (e === "cases") return newCase(shop.http);
  if (e === "kits") return newKit(shop.http);
  if (e === "rigs") return newRig(shop.http);
  const res = await shop.http.post("/api/v1/studies", { name: label("matrix study"), caseId: shop.caseId, kitIds: [shop.kitId] });
  return ok<{ item: Row }>(res, 201).item;
}

beforeAll(async () => {
  const [owner, builder, customer, stranger] = await Promise.all([
    signIn(DEMO.owner.email, DEMO.owner.password),
    signIn(DEMO.builder.email, DEMO.builder.password),
    signIn(DEMO.customer.email, DEMO.customer.password),
    freshShopOwner("Matrix Stranger"),
  ]);
  clients = { owner, builder, customer, stranger, anonymous: new Http() };
  [shopA, shopB] = await Promise.all([shopOf(owner), shopOf(stranger)]);
});

/** The actor's own shop, and the other one. */
const shopsFor = (actor: Actor): { own: Shop; other: Shop } => (actor === "stranger" ? { own: shopB, other: shopA } : { own: shopA, other: shopB });

describe("authorization matrix", () => {
  const shared = new Map<string, Row>();
  for (const route of MATRIX.filter((r) => !r.skip)) {
    const sides: Side[] = route.entity || route.row ? ["own", "other"] : ["none"];
    for (const side of sides) {
      const expected = side === "other" ? route.other : route.own;
      it(`${route.method} ${route.path}${side === "none" ? "" : ` on ${side === "own" ? "a row of the caller's shop" : "another shop's row"}`}${route.as ? ` (${route.as})` : ""}: ${JSON.stringify(expected)}`, async () => {
        expect(expected, "the matrix gives an expectation for each side").toBeDefined();
        const actual: Partial<Expected> = {};
        for (const actor of ACTORS) {
          const http = clients[actor];
          const shops = shopsFor(actor);
          const rowShop = side === "other" ? shops.other : shops.own;
          let path = route.path;
          let params: Record<string, string> = {};
          if (route.entity) {
            const key = `${route.entity}:${rowShop === shopA ? "A" : "B"}`;
            let row = route.mutates ? undefined : shared.get(key);
            if (!row) row = await makeRow(rowShop, route.entity);
            if (!route.mutates) shared.set(key, row);
            path = path.replace("{id}", row.id);
          } else if (route.row) {
            params = await route.row(rowShop);
            for (const [k, v] of Object.entries(params)) path = path.replace(`{${k}}`, encodeURIComponent(v));
          }
          const ctx: Ctx = { actor, shop: shops.own, http, params };
          const body = route.body ? await route.body(ctx) : route.method === "POST" ? {} : undefined;
          const res = await http.send(route.method, path + (route.query ?? ""), body, route.headers?.(ctx, body));
          actual[actor] = res.status;
          await route.check?.(ctx, body, res.status);
          if (res.status >= 400) {
            expect(res.json, `${actor}: ${res.text.slice(0, 200)}`).toMatchObject({ error: { code: expect.any(String), message: expect.any(String) } });
            // A refusal never tells whether another shop's row exists.
            expect(res.text).not.toMatch(/another shop|other shop/i);
          }
        }
        expect(actual).toEqual(expected);
      });
    }
  }

  it("lists every route that exists under app/api, and so does the API description", async () => {
    const found = await discoverRoutes();
    const listed = new Set(MATRIX.map((r) => `${r.method} ${r.path}`));
    const described = new Set([...OPERATIONS, ...LIBRARY_ROUTES].map((op) => `${op.method.toUpperCase()} ${op.path}`));
    expect(found.length).toBeGreaterThan(30);
    expect(found.filter((f) => !listed.has(f)), "routes missing from the matrix").toEqual([]);
    expect([...listed].filter((l) => !found.includes(l)), "matrix rows without a route").toEqual([]);
    expect(found.filter((f) => !described.has(f)), "routes missing from the API description").toEqual([]);
    expect([...described].filter((d) => !found.includes(d)), "described routes that do not exist").toEqual([]);
  });
});

const HTTP_METHODS = ["GET", "HEAD", "OPTIONS", "POST", "PUT", "PATCH", "DELETE"];

/**
 * Every method of every route module under app/api, read from the module's exports by importing it (so
 * `export { h as GET }`, re-exports and OPTIONS or HEAD handlers count), as "METHOD /api/path/{param}".
 */
async function discoverRoutes(): Promise<string[]> {
  // The modules reach the database and the sign-in library on import: point them at the test server's.
  process.env.DATABASE_URL = inject("databaseURL");
  process.env.BETTER_AUTH_SECRET ??= "a-secret-for-this-worker-only-0123456789abcdef";
  const root = join(process.cwd(), "app", "api");
  const files: string[] = [];
  const walk = (dir: string) => {
    for (const name of readdirSync(dir)) {
      const full = join(dir, name);
      if (statSync(full).isDirectory()) walk(full);
      else if (/^route\.(ts|tsx|js|mjs)$/.test(name)) files.push(full);
    }
  };
  walk(root);
  const found: string[] = [];
  for (const full of files) {
    const path = `/api/${relative(root, dirname(full)).split(sep).join("/")}`.replace(/\[([^\]]+)\]/g, "{$1}");
    const mod = (await import(pathToFileURL(full).href)) as Record<string, unknown>;
    for (const method of HTTP_METHODS) if (typeof mod[method] === "function") found.push(`${method} ${path}`);
  }
  return found;
}

// ── Pages that show one row ─────────────────────────────────────────────────────────────────────

type PageCase = { path: string; table: "study" | "job"; row: (shop: Shop) => Promise<string>; viewer: "staff" | "customer" };

/** The row's version and last change, to check that opening a page changed nothing. */
async function rowState(table: "study" | "job", id: string) {
  const db = testDb();
  try {
    const r = await db.execute({ sql: `select * from ${table} where id = ?`, args: [id] });
    return r.rows[0] ? JSON.stringify(r.rows[0]) : null;
  } finally {
    db.close();
  }
}

const PAGES: PageCase[] = [
  { path: "/studies/{id}", table: "study", row: async (shop) => (await makeRow(shop, "studies")).id, viewer: "staff" },
  { path: "/jobs/{id}", table: "job", row: (shop) => newJob(shop), viewer: "staff" },
  { path: "/setup-card/{id}", table: "job", row: (shop) => newJob(shop), viewer: "staff" },
  { path: "/consult/{id}", table: "job", row: (shop) => newJob(shop, { shared: true }), viewer: "customer" },
];

describe("pages of one row", () => {
  it.each(PAGES.map((p) => [p.path, p] as const))("%s answers 404 for another shop's row and leaves it unchanged", async (_path, page) => {
    // The viewer of shop A: its owner (staff pages) or its customer (consult); the row of shop B is never theirs.
    const viewer = page.viewer === "staff" ? clients.owner : clients.customer;
    const own = await page.row(shopA);
    const others = await page.row(shopB);
    const before = await rowState(page.table, others);
    expect(before).not.toBeNull();
    const res = await viewer.get(page.path.replace("{id}", others));
    expect(res.status).toBe(404);
    expect(await rowState(page.table, others)).toBe(before);
    // The stranger (owner of shop B) cannot open shop A's row either, through the staff pages.
    if (page.viewer === "staff") {
      const ownBefore = await rowState(page.table, own);
      expect((await clients.stranger.get(page.path.replace("{id}", own))).status).toBe(404);
      expect(await rowState(page.table, own)).toBe(ownBefore);
    }
    // The page itself works for its own shop's row: the 404 is the shop check, not a broken page.
    expect((await viewer.get(page.path.replace("{id}", own))).status).toBe(200);
  });
});
