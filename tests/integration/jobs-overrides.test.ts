// The owner's overrides, through the API: a kit the study calls cannot-fit is planned only by the owner with
// a recorded reason (and then marked on every page of its setup card); readings outside the plan are verified
// only by the owner with a recorded reason; a job for the shop's own engine needs no customer.
import { beforeAll, describe, expect, it } from "vitest";
import { countRows, DEMO, Http, signIn } from "../support/http";
import { FAILING_READINGS, insertExampleStudy, jobBody, me } from "./jobs-support";
import { measurePdf } from "./jobs-pdf-measure";

type Override = { by: { name: string }; reason: string; at: string };
type Job = {
  id: string;
  status: string;
  ownEngine: boolean;
  customer: { email: string };
  plan: { verdict: string; override: Override | null } | null;
  verification: { verdict: string; override: Override | null } | null;
  moves: string[];
  movesNeedingReason: string[];
};
type Err = { error: { code: string; message: string; fields?: Record<string, string> } };

let owner: Http;
let builder: Http;
let customer: Http;
/** A study whose planned cut (75 mm on the example's case) breaks into the transfer passages: its kit cannot fit. */
let cannotFitStudy: string;
/** The example study as shipped: its first kit fits after the cut. */
let fitStudy: string;

const move = (http: Http, id: string, to: string, reason?: string) => http.post(`/api/v1/jobs/${id}/move`, reason ? { to, reason } : { to });
const item = (r: { json: unknown }) => (r.json as { item: Job }).item;

beforeAll(async () => {
  owner = await signIn(DEMO.owner.email, DEMO.owner.password);
  builder = await signIn(DEMO.builder.email, DEMO.builder.password);
  customer = await signIn(DEMO.customer.email, DEMO.customer.password);
  const o = await me(owner);
  ({ studyId: fitStudy } = await insertExampleStudy(o.shopId, o.userId, `Override test fits ${Date.now()}`));
  ({ studyId: cannotFitStudy } = await insertExampleStudy(o.shopId, o.userId, `Override test cannot fit ${Date.now()}`));
  const study = (await owner.get(`/api/v1/studies/${cannotFitStudy}`)).json as { item: { version: number } };
  const patched = await owner.send("PATCH", `/api/v1/studies/${cannotFitStudy}`, { version: study.item.version, cut: { diameterMm: 75 } });
  expect(patched.status, patched.text).toBe(200);
  const results = (await owner.get(`/api/v1/studies/${cannotFitStudy}/results`)).json as { result: { kits: { verdict: string }[] } };
  expect(results.result.kits[0].verdict).toBe("cannot-fit");
});

describe("planning a kit the study calls cannot-fit", () => {
  it("an owner without a reason is refused and nothing is written; with a reason the job is planned and the override kept", async () => {
    const before = await countRows("job", { study_id: cannotFitStudy });
    const refused = await owner.post("/api/v1/jobs", jobBody({ studyId: cannotFitStudy }));
    expect(refused.status).toBe(400);
    expect((refused.json as Err).error.code).toBe("reason_required");
    expect((refused.json as Err).error.fields?.planOverrideReason).toMatch(/cannot fit safely/);
    expect(await countRows("job", { study_id: cannotFitStudy })).toBe(before);

    const res = await owner.post("/api/v1/jobs", jobBody({ studyId: cannotFitStudy, planOverrideReason: "passages to be welded and re-cut first" }));
    expect(res.status, res.text).toBe(201);
    const job = item(res);
    expect(job.status).toBe("planned");
    expect(job.plan).toMatchObject({ verdict: "cannot-fit", override: { by: { name: "Nell Varga" }, reason: "passages to be welded and re-cut first" } });
    const detail = (await owner.get(`/api/v1/jobs/${job.id}`)).json as { history: { summary: string }[] };
    expect(detail.history.map((h) => h.summary).join(" | ")).toMatch(/cannot fit safely, on the owner's override: passages to be welded/);
  });

  it("a builder's job opens at intake with the plan attached; the builder cannot plan it, the owner only with a reason", async () => {
    const res = await builder.post("/api/v1/jobs", jobBody({ studyId: cannotFitStudy }));
    expect(res.status, res.text).toBe(201);
    const job = item(res);
    expect(job.status).toBe("intake");
    expect(job.plan).toMatchObject({ verdict: "cannot-fit", override: null });
    expect(job.moves).not.toContain("planned");
    // A reason sent by a builder does not make an override.
    const byBuilder = await builder.post("/api/v1/jobs", jobBody({ studyId: cannotFitStudy, planOverrideReason: "looks fine to me" }));
    expect(item(byBuilder).status).toBe("intake");

    const builderMove = await move(builder, job.id, "planned", "looks fine to me");
    expect(builderMove.status).toBe(403);
    expect((builderMove.json as Err).error.message).toMatch(/only the shop's owner can plan it/);
    const ownerView = ((await owner.get(`/api/v1/jobs/${job.id}`)).json as { job: Job }).job;
    expect(ownerView.movesNeedingReason).toContain("planned");
    const noReason = await move(owner, job.id, "planned");
    expect(noReason.status).toBe(400);
    expect((noReason.json as Err).error.fields?.reason).toMatch(/record why/);
    const planned = await move(owner, job.id, "planned", "customer accepts a sleeve repair");
    expect(planned.status, planned.text).toBe(200);
    expect(item(planned)).toMatchObject({ status: "planned", plan: { override: { reason: "customer accepts a sleeve repair", by: { name: "Nell Varga" } } } });
  });

  it("a builder re-planning a planned job onto a cannot-fit kit sends it back to intake for the owner", async () => {
    const job = item(await builder.post("/api/v1/jobs", jobBody({ studyId: fitStudy })));
    expect(job).toMatchObject({ status: "planned", plan: { verdict: "fits-after-cut", override: null } });
    const detail = (await builder.get(`/api/v1/jobs/${job.id}`)).json as { job: { version: number } };
    const replanned = await builder.send("PATCH", `/api/v1/jobs/${job.id}`, { version: detail.job.version, studyId: cannotFitStudy });
    expect(replanned.status, replanned.text).toBe(200);
    expect(item(replanned)).toMatchObject({ status: "intake", plan: { verdict: "cannot-fit", override: null } });
  });

  it("the setup card of an overridden plan states the verdict at the top and marks every page, the PDF and the printable page alike", async () => {
    const job = item(await owner.post("/api/v1/jobs", jobBody({ studyId: cannotFitStudy, planOverrideReason: "passages to be welded and re-cut first" })));
    const res = await fetch(`${owner.base}/api/v1/jobs/${job.id}/setup-card.pdf`, {
      headers: { cookie: [...owner.cookies].map(([k, v]) => `${k}=${v}`).join("; "), "x-forwarded-for": owner.address },
    });
    expect(res.status).toBe(200);
    const pages = await measurePdf(new Uint8Array(await res.arrayBuffer()));
    expect(pages.length).toBeGreaterThanOrEqual(2);
    for (const p of pages) expect(p.text.replace(/\s+/g, " ")).toMatch(/CANNOT FIT SAFELY — planned on Nell Varga's override \(\d{1,2} [A-Z][a-z]{2} \d{4}\): passages to be welded/);
    expect(pages[0].text).toMatch(/Cannot fit safely — /);
    const html = (await owner.get(`/setup-card/${job.id}`)).text;
    expect(html).toMatch(/data-testid="card-verdict" data-verdict="cannot-fit"/);
    // Page 1 and each drawing page of the printable card carry the line too.
    const drawingPages = html.match(/data-testid="drawing-page"/g)?.length ?? 0;
    expect(drawingPages).toBe(2);
    expect(html.match(/data-testid="every-page"/g)?.length).toBe(1 + drawingPages);
  }, 60_000);
});

describe("verifying readings outside the plan", () => {
  it("only the owner verifies them, with a reason that is kept; going back to machined clears it", async () => {
    const job = item(await builder.post("/api/v1/jobs", jobBody({ studyId: fitStudy })));
    expect((await move(owner, job.id, "approved", "approved at the counter")).status).toBe(200);
    expect((await move(builder, job.id, "machined")).status).toBe(200);
    expect((await builder.post(`/api/v1/jobs/${job.id}/readings`, FAILING_READINGS)).status).toBe(201);

    const byBuilder = await move(builder, job.id, "verified", "close enough");
    expect(byBuilder.status).toBe(403);
    const noReason = await move(owner, job.id, "verified");
    expect(noReason.status).toBe(400);
    expect((noReason.json as Err).error).toMatchObject({ code: "reason_required", fields: { reason: expect.stringMatching(/outside the plan's tolerance/) } });
    const verified = await move(owner, job.id, "verified", "trial fit goes home; 0.03 mm short accepted");
    expect(verified.status, verified.text).toBe(200);
    expect(item(verified)).toMatchObject({ status: "verified", verification: { verdict: "fail", override: { by: { name: "Nell Varga" }, reason: "trial fit goes home; 0.03 mm short accepted" } } });

    const back = await move(builder, job.id, "machined", "measure again");
    expect(item(back)).toMatchObject({ status: "machined", verification: { override: null } });
  });
});

describe("a job for the shop's own engine", () => {
  it("needs no customer, is approved by the owner without a reason, is never shared and no customer sees it", async () => {
    const missing = await owner.post("/api/v1/jobs", { title: "My own 50 cc", studyId: fitStudy });
    expect(missing.status).toBe(400);
    expect((missing.json as Err).error.fields).toMatchObject({ customerName: expect.stringMatching(/own engine/), customerEmail: expect.any(String) });

    const res = await owner.post("/api/v1/jobs", { title: "My own 50 cc", ownEngine: true, studyId: fitStudy });
    expect(res.status, res.text).toBe(201);
    const job = item(res);
    expect(job).toMatchObject({ ownEngine: true, status: "planned", customer: { email: "" } });
    const share = await owner.post(`/api/v1/jobs/${job.id}/share`, {});
    expect(share.status).toBe(409);
    expect((share.json as Err).error.message).toMatch(/own engine/);
    const approved = await move(owner, job.id, "approved");
    expect(approved.status, approved.text).toBe(200);
    expect((await customer.get(`/api/v1/jobs/${job.id}`)).status).toBe(404);
  });
});
