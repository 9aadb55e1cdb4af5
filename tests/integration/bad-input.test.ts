// Every POST and PATCH route, fed malformed bodies that fast-check builds from a valid one: each answer
// is a 4xx in the one JSON error shape, and the shop's rows are exactly as they were.
import { randomUUID } from "node:crypto";
import fc from "fast-check";
import Stripe from "stripe";
import { beforeAll, describe, expect, inject, it } from "vitest";
import type { z } from "zod";
import { OPERATIONS } from "@/app/api/v1/_lib/openapi";
import { confirmEmail, Http, signUp, testDb, uniqueEmail, waitForMail } from "../support/http";
import { insertExampleStudy, jobBody, openCheckout, PASSING_READINGS } from "./jobs-support";
import { caseData, freshShopOwner, kitData, newCase, newKit, newRig, newStudy, ok, rigData } from "./library-fixtures";

type Json = null | boolean | number | string | Json[] | { [k: string]: Json };
type Path = (string | number)[];

type Target = {
  method: "POST" | "PATCH";
  path: string;
  /** A body the route accepts; every mutation of it is malformed. */
  valid: () => Json;
  /** Paths whose removal makes the body malformed. */
  required: string[];
  /** Routes that take no body: only non-empty bodies are sent. */
  bodyless?: boolean;
  /** Who sends it, when not the shop's owner. */
  as?: () => Http;
};

const MB = 1024 * 1024;
const COORDINATE = /positionMm|pointsMm|centerMm|centerOffsetMm/;

function leaves(v: Json, at: Path = []): { path: Path; value: Json }[] {
  if (v !== null && typeof v === "object") {
    const entries = Array.isArray(v) ? v.map((x, i) => [i, x] as const) : Object.entries(v);
    return [{ path: at, value: v }, ...entries.flatMap(([k, x]) => leaves(x, [...at, k]))];
  }
  return [{ path: at, value: v }];
}

function setAt(root: Json, path: Path, value: Json | undefined): Json {
  if (path.length === 0) return value === undefined ? null : value;
  const copy = structuredClone(root) as Record<string | number, Json>;
  let at = copy as Record<string | number, Json>;
  for (const k of path.slice(0, -1)) at = at[k] as Record<string | number, Json>;
  const last = path[path.length - 1];
  if (value === undefined) {
    if (Array.isArray(at)) at.splice(Number(last), 1);
    else delete at[last];
  } else at[last] = value;
  return copy as Json;
}

function wrongTypeFor(value: Json): Json[] {
  if (typeof value === "number") return ["12", true, { n: 1 }, [1]];
  if (typeof value === "string") return [12, false, { s: "x" }, ["x"]];
  if (typeof value === "boolean") return ["true", 1, {}, [true]];
  if (Array.isArray(value)) return ["a list", 7, { length: 1 }];
  return ["an object", 7, [1, 2]];
}

/** One malformed request: a body (or raw text) built from a valid body. */
type Mutation = { label: string; body?: Json; raw?: string; checkSchema: boolean };

function mutations(t: Target): fc.Arbitrary<Mutation> {
  const base = t.valid();
  const all = leaves(base);
  const numbers = all.filter((l) => typeof l.value === "number");
  const strings = all.filter((l) => typeof l.value === "string");
  const objects = all.filter((l) => l.value !== null && typeof l.value === "object" && !Array.isArray(l.value));
  const nonRoot = all.filter((l) => l.path.length > 0);
  const name = (p: Path) => p.join(".") || "(body)";
  const pick = <T,>(xs: T[]) => fc.constantFrom(...xs);

  const extra = pick(objects).chain((o) =>
    fc.tuple(fc.string({ minLength: 1, maxLength: 12 }), fc.jsonValue()).map(([k, v]): Mutation => ({
      label: `extra field at ${name(o.path)}`,
      body: setAt(base, [...o.path, `x_${k}`], v as Json),
      checkSchema: true,
    })),
  );
  const notAnObject = fc.constantFrom<Json>([], [base], "a string", 42, null, true).map((b): Mutation => ({ label: `body ${JSON.stringify(b).slice(0, 20)}`, body: b, checkSchema: true }));
  const badJson = fc.constantFrom("{", '{"name": }', "not json at all", "{'single': 1}", '{"a":1}}').map((raw): Mutation => ({ label: `text ${raw}`, raw, checkSchema: false }));
  if (t.bodyless) return fc.oneof(extra, notAnObject, badJson);

  const kinds: fc.Arbitrary<Mutation>[] = [extra, notAnObject, badJson];
  if (nonRoot.length) {
    kinds.push(
      pick(nonRoot).chain((l) => pick(wrongTypeFor(l.value)).map((v): Mutation => ({ label: `wrong type at ${name(l.path)}`, body: setAt(base, l.path, v), checkSchema: true }))),
    );
  }
  if (t.required.length) {
    kinds.push(pick(t.required).map((p): Mutation => ({ label: `missing ${p}`, body: setAt(base, p.split(".").map((k) => (/^\d+$/.test(k) ? Number(k) : k)), undefined), checkSchema: true })));
  }
  if (numbers.length) {
    kinds.push(
      pick(numbers).chain((l) =>
        pick(["NaN", "1e999", "-1e999"]).map((token): Mutation => ({
          label: `${token} at ${name(l.path)}`,
          raw: JSON.stringify(setAt(base, l.path, "@@TOKEN@@")).replace('"@@TOKEN@@"', token),
          checkSchema: false,
        })),
      ),
    );
    const signed = numbers.filter((l) => !COORDINATE.test(name(l.path)));
    if (signed.length) {
      kinds.push(
        fc.tuple(pick(signed), fc.double({ min: 0.001, max: 1e6, noNaN: true })).map(([l, d]): Mutation => ({ label: `negative at ${name(l.path)}`, body: setAt(base, l.path, -d), checkSchema: true })),
      );
    }
    const bounded = numbers.filter((l) => !/price|version/.test(name(l.path)));
    if (bounded.length) {
      kinds.push(
        fc.tuple(pick(bounded), fc.double({ min: 1e9, max: 1e300, noNaN: true })).map(([l, d]): Mutation => ({ label: `huge at ${name(l.path)}`, body: setAt(base, l.path, d), checkSchema: true })),
      );
    }
  }
  if (strings.length) {
    kinds.push(pick(strings).map((l): Mutation => ({ label: `1 MB string at ${name(l.path)}`, body: setAt(base, l.path, "x".repeat(MB)), checkSchema: true })));
  }
  return fc.oneof(...kinds);
}

let http: Http;
let shopId: string;
let userId: string;
let ids: { caseId: string; kitId: string; rigId: string; studyId: string };
/** The shop's own customer (invited through a shared job), and the jobs the targets below work on. */
let customer: Http;
let job: { studyId: string; intake: string; shared: string; approved: string; machined: string; photoId: string; unpaid: string; sessionId: string };

/** Everything of the test shop that a request could change, as one string. */
async function fingerprint(): Promise<string> {
  const db = testDb();
  try {
    const rows = (table: string) => `(select group_concat(id || ':' || version || ':' || updated_at || ':' || ifnull(archived_at, ''), ',') from (select * from ${table} where organization_id = ?1 order by id))`;
    const r = await db.execute({
      sql: `select ${rows("case_profile")} as cases, ${rows("cylinder_kit")} as kits, ${rows("boring_rig")} as rigs, ${rows("study")} as studies,
              (select count(*) from study_kit where study_id in (select id from study where organization_id = ?1)) as studyKits,
              (select count(*) from study_event where study_id in (select id from study where organization_id = ?1)) as events,
              (select version || ':' || units || ':' || limits_json from shop_settings where organization_id = ?1) as settings,
              (select units || ':' || updated_at from user where id = ?2) as me,
              (select count(*) from member where user_id = ?2) as memberships,
              (select group_concat(id || ':' || version || ':' || updated_at || ':' || status || ':' || ifnull(shared_at, '') || ':' || ifnull(approved_at, '') || ':' || ifnull(paid_at, '') || ':' || deposit_amount, ',')
                 from (select * from job where organization_id = ?1 order by id)) as jobs,
              (select count(*) from job_event where job_id in (select id from job where organization_id = ?1)) as jobEvents,
              (select count(*) from job_reading where job_id in (select id from job where organization_id = ?1)) as jobReadings,
              (select count(*) from job_question where job_id in (select id from job where organization_id = ?1)) as jobQuestions,
              (select group_concat(id || ':' || state || ':' || shared || ':' || caption, ',') from (select * from job_photo where organization_id = ?1 order by id)) as photos,
              (select group_concat(id || ':' || status || ':' || ifnull(paid_at, ''), ',') from (select * from job_payment where job_id in (select id from job where organization_id = ?1) order by id)) as payments,
              (select count(*) from payment_event where id like 'evt_bad_input_%') as paymentEvents,
              (select group_concat(id || ':' || status, ',') from (select * from invitation where organization_id = ?1 order by id)) as invitations`,
      args: [shopId, userId],
    });
    return JSON.stringify(r.rows[0]);
  } finally {
    db.close();
  }
}

/** The smallest valid PNG: the 8-byte signature (PNG spec, ISO/IEC 15948 §5.2) and a 1×1 image. */
const PNG = Buffer.from("89504e470d0a1a0a0000000d4948445200000001000000010806000000" + "1f15c4890000000d49444154789c6360000002000001e221bc330000000049454e44ae426082", "hex");

/** A "checkout completed, paid" event for the unpaid job's open checkout (sent unsigned, it must change nothing). */
const completedEvent = (id = "evt_bad_input_completed"): Json => ({
  id,
  object: "event",
  type: "checkout.session.completed",
  data: { object: { id: job.sessionId, object: "checkout.session", payment_status: "paid", amount_total: 5000, currency: "eur" } },
});

/** The job, consult and payment routes, each tried on its own (one route's failure does not hide another's). */
const jobTargets: { name: string; target: () => Target }[] = [
  {
    name: "POST /api/v1/jobs",
    target: () => ({ method: "POST", path: "/api/v1/jobs", valid: () => jobBody({ studyId: job.studyId, customerEmail: "walk-in@example.test", verifyToleranceMm: 0.05, notes: "n" }) as Json, required: ["title", "customerName", "customerEmail"] }),
  },
  {
    name: "PATCH /api/v1/jobs/{id}",
    target: () => ({ method: "PATCH", path: `/api/v1/jobs/${job.intake}`, valid: () => ({ version: 1, title: "Renamed", depositAmount: 4000, currency: "usd", verifyToleranceMm: 0.08, notes: "n" }), required: ["version"] }),
  },
  {
    name: "POST /api/v1/jobs/{id}/move",
    target: () => ({ method: "POST", path: `/api/v1/jobs/${job.shared}/move`, valid: () => ({ to: "approved", reason: "approved by phone" }), required: ["to"] }),
  },
  {
    name: "POST /api/v1/jobs/{id}/readings",
    target: () => ({
      method: "POST",
      path: `/api/v1/jobs/${job.machined}/readings`,
      valid: () => ({ ...PASSING_READINGS, notes: "measured twice" }) as Json,
      required: ["cutDiameterMm", "cutDepthMm", "sealingLandMm", "sealingLandMm.0.stud", "sealingLandMm.0.valueMm", "gasketStackMm", "chipsCleaned", "trialFit"],
    }),
  },
  { name: "POST /api/v1/jobs/{id}/share", target: () => ({ method: "POST", path: `/api/v1/jobs/${job.shared}/share`, valid: () => ({}), required: [], bodyless: true }) },
  {
    name: "POST /api/v1/jobs/{id}/questions",
    target: () => ({ method: "POST", path: `/api/v1/jobs/${job.shared}/questions`, valid: () => ({ text: "Does the cut leave enough wall at the studs?" }), required: ["text"] }),
  },
  {
    name: "POST /api/v1/jobs/{id}/photos",
    target: () => ({ method: "POST", path: `/api/v1/jobs/${job.shared}/photos`, valid: () => ({ contentType: "image/png", sizeBytes: PNG.length, caption: "c", kind: "after", shared: false }), required: ["contentType", "sizeBytes"] }),
  },
  {
    name: "PATCH /api/v1/jobs/{id}/photos/{photoId}",
    target: () => ({ method: "PATCH", path: `/api/v1/jobs/${job.shared}/photos/${job.photoId}`, valid: () => ({ shared: true, caption: "after the cut" }), required: [] }),
  },
  { name: "POST /api/v1/jobs/{id}/photos/{photoId}/complete", target: () => ({ method: "POST", path: `/api/v1/jobs/${job.shared}/photos/${job.photoId}/complete`, valid: () => ({}), required: [], bodyless: true }) },
  { name: "POST /api/v1/consult/{id}/approve", target: () => ({ method: "POST", path: `/api/v1/consult/${job.shared}/approve`, valid: () => ({}), required: [], bodyless: true, as: () => customer }) },
  { name: "POST /api/v1/payments/checkout", target: () => ({ method: "POST", path: "/api/v1/payments/checkout", valid: () => ({ jobId: job.approved }), required: ["jobId"], as: () => customer }) },
  {
    name: "POST /api/v1/payments/webhook (unsigned)",
    target: () => ({ method: "POST", path: "/api/v1/payments/webhook", valid: () => completedEvent(), required: ["id", "type", "data", "data.object.id", "data.object.payment_status"], as: () => new Http() }),
  },
];

const studyFile = (): Json => ({ name: "Bad input file", case: { name: "File case", ...caseData() }, kits: [{ id: "k", name: "File kit", ...kitData(47, 53.92) }] }) as Json;

const targets = (): Target[] => [
  { method: "POST", path: "/api/v1/cases", valid: () => ({ name: "Case", notes: "n", data: caseData(), mouthReadingsMm: [46] }) as Json, required: ["name", "data", "data.deck", "data.mouth", "data.studs", "data.stockBoreMm", "data.strokeMm", "data.studHoleDiameterMm"] },
  { method: "PATCH", path: `/api/v1/cases/${ids.caseId}`, valid: () => ({ version: 1, name: "Case", data: caseData() }) as Json, required: ["version", "data.deck", "data.mouth.depthMm"] },
  { method: "POST", path: "/api/v1/kits", valid: () => ({ name: "Kit", data: kitData(47, 53.92) }) as Json, required: ["name", "data", "data.boreMm", "data.skirtDiameterReadingsMm", "data.skirtLengthReadingsMm", "data.studs"] },
  { method: "PATCH", path: `/api/v1/kits/${ids.kitId}`, valid: () => ({ version: 1, notes: "x", data: kitData(47, 53.92) }) as Json, required: ["version", "data.boreMm"] },
  { method: "POST", path: "/api/v1/rigs", valid: () => ({ name: "Rig", data: rigData() }) as Json, required: ["name", "data", "data.headDiameterMm", "data.calibration", "data.grooves", "data.drillTopRpm"] },
  { method: "PATCH", path: `/api/v1/rigs/${ids.rigId}`, valid: () => ({ version: 1, data: rigData() }) as Json, required: ["version", "data.calibration.maxCutDiameterMm"] },
  { method: "POST", path: "/api/v1/studies", valid: () => ({ name: "Study", caseId: ids.caseId, kitIds: [ids.kitId], rigId: ids.rigId, cut: { diameterMm: 55, depthMm: 25 }, limits: { minWallMm: 2 } }) as Json, required: ["name", "caseId", "kitIds"] },
  { method: "PATCH", path: `/api/v1/studies/${ids.studyId}`, valid: () => ({ version: 1, name: "Study", cut: { diameterMm: 55 }, readings: { holderHeights: [{ stud: "front left", heightMm: 10 }] }, limits: { minWallMm: 2, displacementClassesCc: [50] } }) as Json, required: ["version", "readings.holderHeights"] },
  { method: "POST", path: "/api/v1/studies/import", valid: studyFile, required: ["case", "kits", "case.deck", "kits.0.boreMm", "kits.0.id"] },
  { method: "POST", path: "/api/v1/fit", valid: studyFile, required: ["case", "kits", "case.mouth", "kits.0.skirtLengthReadingsMm"] },
  { method: "POST", path: "/api/v1/library/import?kind=kits", valid: () => ({ csv: "name,bore_mm\nA,47\n", confirm: true }), required: ["csv", "confirm"] },
  { method: "POST", path: "/api/v1/library/import?kind=cases", valid: () => ({ csv: "name\nA\n", confirm: true }), required: ["csv", "confirm"] },
  { method: "PATCH", path: "/api/v1/settings", valid: () => ({ version: 1, units: "in", limits: { minWallMm: 2.5 } }), required: ["version"] },
  { method: "POST", path: "/api/v1/me", valid: () => ({ units: "in" }), required: ["units"] },
  { method: "POST", path: "/api/v1/shops", valid: () => ({ name: "Another shop" }), required: [] },
  ...["cases", "kits", "rigs"].flatMap((e) =>
    ["archive", "restore"].map((a): Target => ({ method: "POST", path: `/api/v1/${e}/${e === "cases" ? ids.caseId : e === "kits" ? ids.kitId : ids.rigId}/${a}`, valid: () => ({}), required: [], bodyless: true })),
  ),
  ...["archive", "restore", "duplicate"].map((a): Target => ({ method: "POST", path: `/api/v1/studies/${ids.studyId}/${a}`, valid: () => ({}), required: [], bodyless: true })),
];

beforeAll(async () => {
  http = await freshShopOwner("Bad Input Owner");
  const me = ok<{ me: { shopId: string; userId: string } }>(await http.get("/api/v1/me")).me;
  shopId = me.shopId;
  userId = me.userId;
  const { study, caseRow, kits, rig } = await newStudy(http);
  // Rows the PATCH targets edit (version 1, in no study, so nothing else refers to them).
  const [c, k, r] = [await newCase(http), await newKit(http), await newRig(http)];
  void caseRow;
  void kits;
  void rig;
  ids = { caseId: c.id, kitId: k.id, rigId: r.id, studyId: study.id };

  // Jobs of every status the job routes act on, each of which a well-formed request would change.
  const { studyId } = await insertExampleStudy(shopId, userId, "Bad input example study");
  const customerEmail = uniqueEmail("bad-input-customer");
  const newJob = async (over: Record<string, unknown> = { studyId }) => ok<{ item: { id: string } }>(await http.post("/api/v1/jobs", jobBody({ customerEmail, ...over })), 201).item.id;
  const move = async (id: string, to: string, reason?: string) => ok(await http.post(`/api/v1/jobs/${id}/move`, reason ? { to, reason } : { to }));
  const shared = await newJob();
  ok(await http.post(`/api/v1/jobs/${shared}/share`));
  const mail = await waitForMail(customerEmail, /shares the plan/);
  const invitationId = mail.links.find((l) => l.includes("/invite/"))!.split("/invite/")[1];
  customer = await signUp("Wren Tallow", customerEmail);
  await confirmEmail(customer, customerEmail);
  ok(await customer.post("/api/auth/organization/accept-invitation", { invitationId }));
  ok(await customer.post("/api/auth/organization/set-active", { organizationId: shopId }));
  expect(ok<{ me: { role: string; shopId: string } }>(await customer.get("/api/v1/me")).me).toMatchObject({ role: "customer", shopId });
  const intake = await newJob({});
  const approved = await newJob();
  ok(await http.post(`/api/v1/jobs/${approved}/share`));
  await move(approved, "approved", "approved by phone");
  const machined = await newJob();
  await move(machined, "approved", "approved by phone");
  await move(machined, "machined");
  const start = ok<{ id: string; uploadUrl: string }>(await http.post(`/api/v1/jobs/${shared}/photos`, { contentType: "image/png", sizeBytes: PNG.length, kind: "after" }), 201);
  expect((await fetch(start.uploadUrl, { method: "PUT", headers: { "content-type": "image/png" }, body: PNG })).status).toBe(200);
  ok(await http.post(`/api/v1/jobs/${shared}/photos/${start.id}/complete`));
  // An approved job with an open deposit checkout that a genuine completed event would mark paid.
  const unpaid = await newJob();
  await move(unpaid, "approved", "approved by phone");
  const sessionId = await openCheckout(unpaid, userId, "bad_input");
  job = { studyId, intake, shared, approved, machined, photoId: start.id, unpaid, sessionId };
});

/**
 * The schema the route's documented operation parses its body with, which must refuse every mutated body (a
 * check that the mutation really is malformed); none for a route that takes no body, or whose caller is
 * checked by a signature over the raw body rather than by the body's shape.
 */
function schemaOf(t: Target): z.ZodType | undefined {
  const path = t.path.split("?")[0];
  const matching = OPERATIONS.filter((o) => o.method === t.method.toLowerCase() && new RegExp(`^${o.path.replace(/\{[^}]+\}/g, "[^/]+")}$`).test(path));
  // A literal path ("/studies/import") before a template that also matches it ("/studies/{id}").
  const op = matching.sort((a, b) => a.path.split("{").length - b.path.split("{").length)[0];
  if (!op) throw new Error(`${t.method} ${path} is no documented operation`);
  return op.roles === "signed" ? undefined : op.body;
}

/** Sends `numRuns` malformed versions of a target's body: each is answered 4xx in the one error shape, and the database is unchanged. */
async function expectEveryMutationRefused(t: Target, numRuns: number) {
  const before = await fingerprint();
  const schema = schemaOf(t);
  await fc.assert(
    fc.asyncProperty(mutations(t), async (m) => {
      if (m.checkSchema && schema && m.body !== undefined) {
        expect(schema.safeParse(m.body).success, `${m.label} must be malformed`).toBe(false);
      }
      const text = m.raw ?? JSON.stringify(m.body);
      const res = await (t.as?.() ?? http).send(t.method, t.path, text, { "content-type": "application/json" });
      expect(res.status, `${t.method} ${t.path} with ${m.label}: ${res.text.slice(0, 200)}`).toBeGreaterThanOrEqual(400);
      expect(res.status, `${t.method} ${t.path} with ${m.label}`).toBeLessThan(500);
      expect(res.json, `${t.method} ${t.path} with ${m.label}`).toMatchObject({ error: { code: expect.any(String), message: expect.any(String) } });
      expect(await fingerprint(), `${t.method} ${t.path} with ${m.label} changed the database`).toBe(before);
    }),
    { numRuns, seed: Number(process.env.FC_SEED ?? Date.now() % 100_000), endOnFailure: true },
  );
}

describe("malformed bodies", () => {
  it("start from bodies the schemas accept", () => {
    for (const t of targets()) expect(schemaOf(t)?.safeParse(t.valid()).success ?? true, `${t.method} ${t.path}`).toBe(true);
  });

  it("are answered with a 4xx in the one error shape on every POST and PATCH route, and change nothing", async () => {
    for (const t of targets()) await expectEveryMutationRefused(t, 25);
  }, 240_000);

  for (const { name, target } of jobTargets) {
    it(`are answered with a 4xx in the one error shape, changing nothing: ${name}`, async () => {
      const t = target();
      expect(schemaOf(t)?.safeParse(t.valid()).success ?? true, "the starting body is accepted").toBe(true);
      await expectEveryMutationRefused(t, 40);
    }, 60_000);
  }

  it("refuse an after-cut reading whose stud label is longer than any stud label a plan can have, and write nothing", async () => {
    // The core names a stud in at most 80 characters; a reading names one of the plan's studs.
    const before = await fingerprint();
    const sealingLandMm = PASSING_READINGS.sealingLandMm.map((s, i) => (i === 0 ? { ...s, stud: "x".repeat(100_000) } : s));
    const res = await http.post(`/api/v1/jobs/${job.machined}/readings`, { ...PASSING_READINGS, sealingLandMm });
    expect(res.status, res.text.slice(0, 200)).toBe(400);
    expect(res.json).toMatchObject({ error: { code: expect.any(String), message: expect.any(String), fields: { "sealingLandMm.0.stud": expect.any(String) } } });
    expect(await fingerprint()).toBe(before);
  });

  it("leave the open checkout live: the same completed event, signed by the payment service, marks the deposit paid", async () => {
    const payload = JSON.stringify(completedEvent(`evt_bad_input_${randomUUID()}`));
    const signature = Stripe.webhooks.generateTestHeaderString({ payload, secret: inject("jobFakes").webhookSecret });
    const res = await new Http().post("/api/v1/payments/webhook", payload, { "stripe-signature": signature });
    expect(res.status, res.text).toBe(200);
    expect(res.json).toMatchObject({ received: true, applied: true });
    const detail = ok<{ job: { deposit: { paid: boolean } } }>(await http.get(`/api/v1/jobs/${job.unpaid}`));
    expect(detail.job.deposit.paid).toBe(true);
  });

  it("answer an oversize body with 413", async () => {
    const res = await http.send("POST", "/api/v1/cases", JSON.stringify({ name: "Big", notes: "x".repeat(2 * MB), data: caseData() }));
    expect(res.status).toBe(413);
    expect(res.json).toMatchObject({ error: { code: "too_large" } });
  });
});
