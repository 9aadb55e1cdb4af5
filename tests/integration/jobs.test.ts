import { beforeAll, describe, expect, it } from "vitest";
import { inject } from "vitest";
import Stripe from "stripe";
import { confirmEmail, countRows, DEMO, Http, signIn, signUp, testDb, uniqueEmail, waitForMail } from "../support/http";
import { FAILING_READINGS, PASSING_READINGS, insertExampleStudy, jobBody, me, readPdf } from "./jobs-support";

type Job = { id: string; status: string; reference: string; deposit: { paid: boolean; amount: number }; approval: { by: { name: string }; reason: string | null } | null };
type Err = { error: { code: string; message: string; fields?: Record<string, string> } };

let owner: Http;
let builder: Http;
let customer: Http;
let studyId: string;
let kitIds: string[];

beforeAll(async () => {
  owner = await signIn(DEMO.owner.email, DEMO.owner.password);
  builder = await signIn(DEMO.builder.email, DEMO.builder.password);
  customer = await signIn(DEMO.customer.email, DEMO.customer.password);
  const o = await me(owner);
  ({ studyId, kitIds } = await insertExampleStudy(o.shopId, o.userId, `Jobs test study ${Date.now()}`));
});

const move = (http: Http, id: string, to: string, reason?: string) => http.post(`/api/v1/jobs/${id}/move`, reason ? { to, reason } : { to });

async function plannedJob(over: Record<string, unknown> = {}): Promise<Job> {
  const res = await builder.post("/api/v1/jobs", jobBody({ studyId, ...over }));
  expect(res.status, res.text).toBe(201);
  return (res.json as { item: Job }).item;
}

describe("the job status machine through the API", () => {
  it("a job without a study opens at intake and cannot be planned until a study is attached", async () => {
    const res = await builder.post("/api/v1/jobs", jobBody({ customerEmail: uniqueEmail("walk-in") }));
    expect(res.status).toBe(201);
    const job = (res.json as { item: Job }).item;
    expect(job.status).toBe("intake");
    expect(job.reference).toMatch(/^J-\d{4}$/);
    const refused = await move(builder, job.id, "planned");
    expect(refused.status).toBe(409);
    expect((refused.json as Err).error.message).toMatch(/Attach a study/);
  });

  it("a job created from a study is planned with the study's chosen kit; the plan is kept as taken", async () => {
    const job = await plannedJob();
    expect(job.status).toBe("planned");
    const detail = (await builder.get(`/api/v1/jobs/${job.id}`)).json as { plan: { kitId: string; result: { kits: { kitId: string; cut: { diameterMm: number } }[] } }; history: { summary: string }[] };
    expect(detail.plan.kitId).toBe(kitIds[0]);
    expect(detail.plan.result.kits[0].cut.diameterMm).toBeCloseTo(55.1, 6);
    expect(detail.history.map((h) => h.summary).join(" | ")).toMatch(/planned with/);
  });

  it("walks intake → planned → approved → machined → verified → closed, refusing every move out of order with a reason", async () => {
    const job = await plannedJob();
    // Cannot be verified before it is machined.
    const early = await move(builder, job.id, "verified");
    expect(early.status).toBe(409);
    expect((early.json as Err).error.message).toBe("A job cannot be verified before it is machined.");
    // A builder cannot approve; an owner only with a reason.
    expect((await move(builder, job.id, "approved")).status).toBe(403);
    const noReason = await move(owner, job.id, "approved");
    expect(noReason.status).toBe(400);
    expect((noReason.json as Err).error.fields?.reason).toMatch(/record why/);
    const approved = await move(owner, job.id, "approved", "approved by phone, 2 March");
    expect(approved.status).toBe(200);
    expect((approved.json as { item: Job }).item.approval).toMatchObject({ by: { name: "Nell Varga" }, reason: "approved by phone, 2 March" });
    // Closing now is out of order.
    expect((await move(builder, job.id, "closed")).status).toBe(409);
    expect((await move(builder, job.id, "machined")).status).toBe(200);
    // Verifying needs readings; failing readings keep it from verifying, by how much.
    const noReadings = await move(builder, job.id, "verified");
    expect((noReadings.json as Err).error.message).toMatch(/Record the after-cut readings/);
    const failing = await builder.post(`/api/v1/jobs/${job.id}/readings`, FAILING_READINGS);
    expect(failing.status).toBe(201);
    const fv = (failing.json as { verification: { verdict: string; checks: { key: string; state: string; byMm: number | null }[] } }).verification;
    expect(fv.verdict).toBe("fail");
    // 55.10 − 0.05 − 54.90 = 0.15 mm under; (54.90 − 53.96) / 2 = 0.47 mm clearance, 0.03 short of 0.5.
    expect(fv.checks.find((c) => c.key === "cut-diameter")).toMatchObject({ state: "fail" });
    expect(fv.checks.find((c) => c.key === "cut-diameter")!.byMm).toBeCloseTo(0.15, 6);
    expect(fv.checks.find((c) => c.key === "radial-clearance")!.byMm).toBeCloseTo(0.03, 6);
    // Readings outside the plan are verified only by the owner with a reason (see jobs-overrides.test.ts).
    const refused = await move(builder, job.id, "verified");
    expect(refused.status).toBe(403);
    expect((refused.json as Err).error.message).toMatch(/outside the plan's tolerance/);
    // Re-cut and measured again: within the plan.
    const passing = await builder.post(`/api/v1/jobs/${job.id}/readings`, PASSING_READINGS);
    expect((passing.json as { verification: { verdict: string } }).verification.verdict).toBe("pass");
    expect((await move(builder, job.id, "verified")).status).toBe(200);
    // Back a step needs a reason; forward to closed is allowed.
    expect((await move(builder, job.id, "machined")).status).toBe(400);
    const closed = await move(owner, job.id, "closed");
    expect((closed.json as { item: Job }).item.status).toBe("closed");
    const final = await move(owner, job.id, "verified", "reopen");
    expect((final.json as Err).error.message).toMatch(/closed job is final/);
    const history = (await builder.get(`/api/v1/jobs/${job.id}`)).json as { history: { from: string | null; to: string | null; by: { name: string } }[] };
    const moves = history.history.filter((h) => h.to).map((h) => `${h.from}>${h.to}`).reverse();
    expect(moves).toEqual(["intake>planned", "planned>approved", "approved>machined", "machined>verified", "verified>closed"]);
  });

  it("readings are refused until the job is machined, and bad readings say what is wrong per field", async () => {
    const job = await plannedJob();
    const early = await builder.post(`/api/v1/jobs/${job.id}/readings`, PASSING_READINGS);
    expect(early.status).toBe(409);
    const bad = await builder.post(`/api/v1/jobs/${job.id}/readings`, { ...PASSING_READINGS, cutDiameterMm: [-1], gasketStackMm: "thin" });
    expect(bad.status).toBe(400);
    expect((bad.json as Err).error.fields).toMatchObject({ "cutDiameterMm.0": expect.stringMatching(/above zero/), gasketStackMm: expect.any(String) });
    // The job was just made with no readings; neither refused post may have written one (counted for this job only,
    // so other files' readings in the shared database do not count).
    const db = testDb();
    try {
      const r = await db.execute({ sql: "select count(*) as n from job_reading where job_id = ?", args: [job.id] });
      expect(Number(r.rows[0]?.n)).toBe(0);
    } finally {
      db.close();
    }
  });

  it("a bad job body is a 400 naming the fields, and nothing is written", async () => {
    const title = `Refused job ${Date.now()}`;
    const before = await countRows("job", { title });
    const res = await builder.post("/api/v1/jobs", { ...jobBody({ title }), customerEmail: "nope", depositAmount: 12.5 });
    expect(res.status).toBe(400);
    expect((res.json as Err).error.fields).toMatchObject({ customerEmail: expect.any(String), depositAmount: expect.stringMatching(/whole number of cents/) });
    expect(await countRows("job", { title })).toBe(before);
  });
});

describe("sharing, the consult page and the deposit", () => {
  it("the customer approves a shared plan and pays the deposit; only the signed event marks it paid; a replay or a forged event changes nothing", async () => {
    const job = await plannedJob();
    // Not shared yet: the customer cannot see it.
    expect((await customer.get(`/api/v1/jobs/${job.id}`)).status).toBe(404);
    const shared = await builder.post(`/api/v1/jobs/${job.id}/share`);
    expect(shared.status).toBe(200);
    expect((shared.json as { invited: boolean }).invited).toBe(false);
    const mail = await waitForMail(DEMO.customer.email, /shares the plan/);
    expect(mail.links.some((l) => l.endsWith(`/consult/${job.id}`))).toBe(true);
    expect((await customer.get(`/api/v1/jobs/${job.id}`)).status).toBe(200);

    // No deposit before approval.
    expect((await customer.post("/api/v1/payments/checkout", { jobId: job.id })).status).toBe(409);
    const approved = await customer.post(`/api/v1/consult/${job.id}/approve`);
    expect(approved.status).toBe(200);
    expect((approved.json as { item: Job }).item.approval?.by.name).toBe("Ivy Harrow");

    const checkout = await customer.post("/api/v1/payments/checkout", { jobId: job.id });
    expect(checkout.status).toBe(201);
    const { url, sessionId } = checkout.json as { url: string; sessionId: string };
    expect(url).toContain(inject("jobFakes").stripeURL);
    // Returning from the checkout without paying marks nothing.
    expect(((await customer.get(`/api/v1/jobs/${job.id}`)).json as { job: Job }).job.deposit.paid).toBe(false);

    // A forged event (signed with another secret) and an unsigned one are refused, and change nothing.
    const forgedPayload = JSON.stringify({ id: "evt_forged", type: "checkout.session.completed", data: { object: { id: sessionId, payment_status: "paid", amount_total: 5000, currency: "eur" } } });
    const forged = await new Http().post("/api/v1/payments/webhook", forgedPayload, {
      "stripe-signature": Stripe.webhooks.generateTestHeaderString({ payload: forgedPayload, secret: "whsec_not_the_shops" }),
    });
    expect(forged.status).toBe(400);
    const unsigned = await new Http().post("/api/v1/payments/webhook", forgedPayload);
    expect(unsigned.status).toBe(400);
    expect(((await customer.get(`/api/v1/jobs/${job.id}`)).json as { job: Job }).job.deposit.paid).toBe(false);

    // Pay on the fake's checkout page with the test card: the fake posts the signed event to the app.
    const paid = await fetch(`${inject("jobFakes").stripeURL}/pay/${sessionId}`, { method: "POST", body: new URLSearchParams({ card: "4242 4242 4242 4242" }), redirect: "manual" });
    expect(paid.status).toBe(303);
    expect(paid.headers.get("location")).toContain(`/consult/${job.id}?checkout=done`);
    await expect.poll(async () => ((await customer.get(`/api/v1/jobs/${job.id}`)).json as { job: Job }).job.deposit.paid).toBe(true);

    // Replaying the very same signed event is acknowledged and changes nothing.
    const events = (await (await fetch(`${inject("jobFakes").stripeURL}/events`)).json()) as { events: { event: { data: { object: { id: string } } }; payload: string; signature: string }[] };
    const sent = events.events.find((e) => e.event.data.object.id === sessionId)!;
    const paymentsBefore = await countPaymentEvents(job.id);
    const replay = await new Http().post("/api/v1/payments/webhook", sent.payload, { "stripe-signature": sent.signature });
    expect(replay.status).toBe(200);
    expect(replay.json).toMatchObject({ duplicate: true, applied: false });
    expect(await countPaymentEvents(job.id)).toBe(paymentsBefore);
    expect(paymentsBefore).toBe(1);
    // Paying again is refused.
    expect((await customer.post("/api/v1/payments/checkout", { jobId: job.id })).status).toBe(409);
  });

  it("a question from the customer is kept on the job and mailed to the shop", async () => {
    const job = await plannedJob();
    await builder.post(`/api/v1/jobs/${job.id}/share`);
    const asked = await customer.post(`/api/v1/jobs/${job.id}/questions`, { text: "Will the new kit still pass the moped class?" });
    expect(asked.status).toBe(201);
    const detail = (await builder.get(`/api/v1/jobs/${job.id}`)).json as { questions: { text: string; by: { name: string } }[] };
    expect(detail.questions.at(-1)).toMatchObject({ text: "Will the new kit still pass the moped class?", by: { name: "Ivy Harrow" } });
    await waitForMail(DEMO.owner.email, /a question from Ivy Harrow/);
  });

  it("sharing with someone who has no account invites them into the shop as a customer; once joined they see that job only", async () => {
    const email = uniqueEmail("new-customer");
    const job = await plannedJob({ customerName: "Rook Ambler", customerEmail: email });
    const shared = await builder.post(`/api/v1/jobs/${job.id}/share`);
    expect((shared.json as { invited: boolean }).invited).toBe(true);
    const mail = await waitForMail(email, /shares the plan/);
    const invite = mail.links.find((l) => l.includes("/invite/"))!;
    const invitationId = invite.split("/invite/")[1];
    const newcomer = await signUp("Rook Ambler", email);
    await confirmEmail(newcomer, email);
    const accepted = await newcomer.post("/api/auth/organization/accept-invitation", { invitationId });
    expect(accepted.status, accepted.text).toBe(200);
    const o = await me(owner);
    await newcomer.post("/api/auth/organization/set-active", { organizationId: o.shopId });
    expect((await me(newcomer)).role).toBe("customer");
    const list = (await newcomer.get("/api/v1/jobs")).json as { items: Job[] };
    expect(list.items.map((j) => j.id)).toEqual([job.id]);
  });
});

describe("authorization", () => {
  let otherJobId: string;
  beforeAll(async () => {
    // A job of the demo shop for someone else, shared: the demo customer must not see it.
    const job = await plannedJob({ customerName: "Someone Else", customerEmail: uniqueEmail("someone") });
    await builder.post(`/api/v1/jobs/${job.id}/share`);
    otherJobId = job.id;
  });

  it("a customer sees only their own shared jobs, and another customer's job is a 404", async () => {
    const list = (await customer.get("/api/v1/jobs?pageSize=100")).json as { items: { id: string; customer: { email: string } }[] };
    expect(list.items.length).toBeGreaterThan(0);
    expect(list.items.every((j) => j.customer.email === DEMO.customer.email)).toBe(true);
    expect(list.items.some((j) => j.id === otherJobId)).toBe(false);
    expect((await customer.get(`/api/v1/jobs/${otherJobId}`)).status).toBe(404);
    expect((await customer.get(`/api/v1/jobs/${otherJobId}/photos`)).status).toBe(404);
    expect((await customer.post(`/api/v1/consult/${otherJobId}/approve`)).status).toBe(404);
  });

  it("a customer cannot open, change or print the shop's jobs", async () => {
    expect((await customer.post("/api/v1/jobs", jobBody({ studyId }))).status).toBe(403);
    expect((await customer.post(`/api/v1/jobs/${otherJobId}/readings`, PASSING_READINGS)).status).toBe(403);
    expect((await customer.get(`/api/v1/jobs/${otherJobId}/setup-card.pdf`)).status).toBe(403);
    expect((await customer.post(`/api/v1/jobs/${otherJobId}/share`)).status).toBe(403);
  });

  it("signed out is 401; another shop's staff and customers get 404 for this shop's job and see none of its jobs", async () => {
    expect((await new Http().get(`/api/v1/jobs/${otherJobId}`)).status).toBe(401);
    expect((await new Http().get("/api/v1/jobs")).status).toBe(401);
    const ownerB = await signUp("Other Shop Owner", uniqueEmail("shop-b"));
    expect((await ownerB.get(`/api/v1/jobs/${otherJobId}`)).status).toBe(404);
    expect((await ownerB.post(`/api/v1/jobs/${otherJobId}/move`, { to: "approved", reason: "x" })).status).toBe(404);
    expect((await ownerB.get(`/api/v1/jobs/${otherJobId}/setup-card.pdf`)).status).toBe(404);
    expect(((await ownerB.get("/api/v1/jobs")).json as { items: unknown[] }).items).toEqual([]);
    // Shop B's own customer, invited through a shared job of shop B, sees nothing of shop A.
    const b = await me(ownerB);
    const { studyId: studyB } = await insertExampleStudy(b.shopId, b.userId, "Shop B study");
    const emailB = uniqueEmail("customer-b");
    const jobB = (await ownerB.post("/api/v1/jobs", jobBody({ studyId: studyB, customerEmail: emailB, customerName: "Bea Customer" }))).json as { item: Job };
    await ownerB.post(`/api/v1/jobs/${jobB.item.id}/share`);
    const mail = await waitForMail(emailB, /shares the plan/);
    const customerB = await signUp("Bea Customer", emailB);
    await confirmEmail(customerB, emailB);
    await customerB.post("/api/auth/organization/accept-invitation", { invitationId: mail.links.find((l) => l.includes("/invite/"))!.split("/invite/")[1] });
    await customerB.post("/api/auth/organization/set-active", { organizationId: b.shopId });
    expect((await me(customerB)).role).toBe("customer");
    expect((await customerB.get(`/api/v1/jobs/${otherJobId}`)).status).toBe(404);
    expect((await customerB.get(`/api/v1/jobs/${jobB.item.id}`)).status).toBe(200);
    const listB = (await customerB.get("/api/v1/jobs")).json as { items: { id: string }[] };
    expect(listB.items.map((j) => j.id)).toEqual([jobB.item.id]);
  });
});

// The smallest valid PNG: the 8-byte signature (PNG spec, ISO/IEC 15948 §5.2) and a 1×1 image.
const PNG = Buffer.from("89504e470d0a1a0a0000000d4948445200000001000000010806000000" + "1f15c4890000000d49444154789c6360000002000001e221bc330000000049454e44ae426082", "hex");

describe("photos through presigned URLs against the object store", () => {
  it("uploads straight to storage, checks the type by content and the size, and shows a customer only the shared ones", async () => {
    const job = await plannedJob();
    await builder.post(`/api/v1/jobs/${job.id}/share`);
    const start = await builder.post(`/api/v1/jobs/${job.id}/photos`, { contentType: "image/png", sizeBytes: PNG.length, caption: "case after the cut", kind: "after", shared: true });
    expect(start.status, start.text).toBe(201);
    const { id, uploadUrl } = start.json as { id: string; uploadUrl: string };
    expect(uploadUrl).toContain(inject("jobFakes").s3.S3_ENDPOINT);
    expect(uploadUrl).toMatch(/X-Amz-Signature=/);
    // Completing before the file is there is refused in words.
    expect((await builder.post(`/api/v1/jobs/${job.id}/photos/${id}/complete`)).status).toBe(409);
    const put = await fetch(uploadUrl, { method: "PUT", headers: { "content-type": "image/png" }, body: PNG });
    expect(put.status).toBe(200);
    const done = await builder.post(`/api/v1/jobs/${job.id}/photos/${id}/complete`);
    expect(done.status, done.text).toBe(200);
    expect(done.json).toMatchObject({ item: { state: "ready", sizeBytes: PNG.length, shared: true } });

    // A text file declared as PNG is refused by its bytes and removed from storage.
    const fakeStart = (await builder.post(`/api/v1/jobs/${job.id}/photos`, { contentType: "image/png", sizeBytes: 20, kind: "other" })).json as { id: string; uploadUrl: string };
    await fetch(fakeStart.uploadUrl, { method: "PUT", headers: { "content-type": "image/png" }, body: "this is not an image" });
    const refused = await builder.post(`/api/v1/jobs/${job.id}/photos/${fakeStart.id}/complete`);
    expect(refused.status).toBe(422);
    expect((refused.json as Err).error.message).toMatch(/not a JPEG, PNG or WebP image/);
    expect((await fetch(fakeStart.uploadUrl.split("?")[0])).status).not.toBe(200);
    // A type or size outside the limits is refused before any URL is issued.
    const tooBig = await builder.post(`/api/v1/jobs/${job.id}/photos`, { contentType: "image/png", sizeBytes: 50 * 1024 * 1024 });
    expect((tooBig.json as Err).error.fields?.sizeBytes).toMatch(/limited to 8 MB/);
    const gif = await builder.post(`/api/v1/jobs/${job.id}/photos`, { contentType: "image/gif", sizeBytes: 100 });
    expect((gif.json as Err).error.fields?.contentType).toMatch(/Only JPEG, PNG or WebP/);

    // A second, unshared photo: the shop sees both, the customer only the shared one, and can download it.
    const hidden = (await builder.post(`/api/v1/jobs/${job.id}/photos`, { contentType: "image/png", sizeBytes: PNG.length, kind: "readings" })).json as { id: string; uploadUrl: string };
    await fetch(hidden.uploadUrl, { method: "PUT", headers: { "content-type": "image/png" }, body: PNG });
    await builder.post(`/api/v1/jobs/${job.id}/photos/${hidden.id}/complete`);
    const staffList = (await builder.get(`/api/v1/jobs/${job.id}/photos`)).json as { items: { id: string; state: string }[] };
    expect(staffList.items.filter((p) => p.state === "ready").map((p) => p.id).sort()).toEqual([id, hidden.id].sort());
    const customerList = (await customer.get(`/api/v1/jobs/${job.id}/photos`)).json as { items: { id: string; url: string }[] };
    expect(customerList.items.map((p) => p.id)).toEqual([id]);
    const got = await fetch(customerList.items[0].url);
    expect(Buffer.from(await got.arrayBuffer()).equals(PNG)).toBe(true);
    expect((await customer.get(`/api/v1/jobs/${job.id}/photos/${hidden.id}`)).status).toBe(404);
    expect((await customer.post(`/api/v1/jobs/${job.id}/photos`, { contentType: "image/png", sizeBytes: 10 })).status).toBe(403);
    // Unsharing hides it from the customer again.
    await builder.send("PATCH", `/api/v1/jobs/${job.id}/photos/${id}`, { shared: false });
    expect(((await customer.get(`/api/v1/jobs/${job.id}/photos`)).json as { items: unknown[] }).items).toEqual([]);
  });
});

describe("the setup card PDF", () => {
  it("is the figures on one A4 page and each drawing on a page of its own, with the fonts embedded, the rig settings and cautions", async () => {
    const job = await plannedJob();
    const res = await fetch(`${builder.base}/api/v1/jobs/${job.id}/setup-card.pdf`, {
      headers: { cookie: [...builder.cookies].map(([k, v]) => `${k}=${v}`).join("; "), "x-forwarded-for": builder.address },
    });
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("application/pdf");
    const pdf = Buffer.from(await res.arrayBuffer());
    const { pages, fontsEmbedded, text, content } = readPdf(pdf);
    expect(pages).toBe(3);
    // Only the app's two faces: the drawings' text is set in the body face, not in a standard PDF font.
    expect(fontsEmbedded).toBe(2);
    expect(pdf.toString("latin1")).not.toMatch(/\/BaseFont \/(Helvetica|Times|Courier)/);
    // Figures from the core's result for the example's first kit: cutter setting 44.80 mm, groove 2 with 2 × 0.10 + 1 × 0.50 mm of shims.
    expect(text).toContain("44.80 mm");
    expect(text).toContain("ring in groove 2 with 0.70 mm of shims: stops at");
    expect(text).toContain("shims: 2 × 0.10 + 1 × 0.50 mm");
    expect(text).toMatch(/Wear eye protection/);
    expect(text).toMatch(/without crushing it/);
    expect(text).toMatch(/Remove every chip from the crankcase/);
    expect(text).toMatch(/legal class;\s+local\s+rules\s+decide/);
    expect(text).toMatch(/qualified machinist/);
    // The drawings, by their titles and dimension labels (the example's first kit: cut 55.10 mm, mouth 46.00 mm, skirt 53.96 mm).
    expect(text).toContain("Plan at the deck — Example 47 mm five-port kit");
    expect(text).toContain("Section through the axis along x — Example 47 mm five-port kit");
    expect(text.match(/cut Ø 55\.10 mm/g)?.length).toBe(2);
    expect(text).toContain("mouth Ø 46.00 mm");
    expect(text).toContain("skirt Ø 53.96 mm");
    expect(text).toMatch(/Scale 1:1 — full size when printed at 100 %/);
    expect(text).not.toMatch(/shown at \d+ % of full size/);
    // Drawn as vector paths: the circles of the plan are Bézier curves (the text blocks draw none), the
    // section's case material a hatch pattern.
    expect((content.match(/^[-\d.e ]+ c$/gm) ?? []).length).toBeGreaterThan(20);
    expect(content).toMatch(/\/Pattern cs/);
  });
});

const countPaymentEvents = (jobId: string) => countRows("job_event", { job_id: jobId, kind: "payment" });
