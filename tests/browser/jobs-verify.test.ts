import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launchBrowser, screenshot, signedInTab } from "../support/browser";
import { DEMO, signIn, uniqueEmail, type Http } from "../support/http";
import { FAILING_READINGS, insertExampleStudy, jobBody, me } from "../integration/jobs-support";

// Readings outside the plan: verifying the job as it stands is the owner's, with a reason. The owner is
// offered a reason field right under the readings; the reason is refused empty and kept once given.

let browser: Browser;
let owner: Http;
let jobId: string;

beforeAll(async () => {
  browser = await launchBrowser();
  owner = await signIn(DEMO.owner.email, DEMO.owner.password);
  const o = await me(owner);
  const { studyId } = await insertExampleStudy(o.shopId, o.userId, `Verify study ${Date.now()}`);
  const created = await owner.post("/api/v1/jobs", jobBody({ studyId, customerEmail: uniqueEmail("verify-customer") }));
  jobId = (created.json as { item: { id: string } }).item.id;
  expect((await owner.post(`/api/v1/jobs/${jobId}/move`, { to: "approved", reason: "approved by phone" })).status).toBe(200);
  expect((await owner.post(`/api/v1/jobs/${jobId}/move`, { to: "machined" })).status).toBe(200);
  expect((await owner.post(`/api/v1/jobs/${jobId}/readings`, FAILING_READINGS)).status).toBe(201);
});
afterAll(async () => {
  await browser?.close();
});

describe("verifying readings outside the plan", () => {
  it("the owner is offered a reason field under the readings, not a plain 'Mark verified'; an empty reason is refused at the field", async () => {
    const { context: person, page } = await signedInTab(browser, DEMO.owner, { width: 1280, height: 900 });
    await page.goto(`/jobs/${jobId}`);
    await expect.poll(() => page.getByTestId("verdict").textContent(), { timeout: 10_000 }).toMatch(/^Outside the plan/);
    expect(await page.getByRole("button", { name: "Mark verified" }).count()).toBe(0);
    const decide = page.getByRole("form", { name: "Verify as it stands" });
    await decide.getByRole("button", { name: "Verify as it stands (owner's override)" }).click();
    await expect.poll(() => decide.getByText(/Say why the job is verified/).count(), { timeout: 10_000 }).toBe(1);
    await decide.getByLabel("Why verify readings outside the plan").fill("trial fit checked by hand, clearance accepted");
    await decide.getByRole("button", { name: "Verify as it stands (owner's override)" }).click();
    await expect.poll(() => page.getByTestId("job-status").textContent(), { timeout: 10_000 }).toBe("Verified");
    expect(await page.getByTestId("verify-override").textContent()).toContain("trial fit checked by hand, clearance accepted");
    await screenshot(page, "jobs-verify-owner-override");
    await person.close();
  }, 120_000);
});
