// Every page on a 390 px phone screen, for each role: nothing wider than the screen, so the page never
// scrolls sideways (document.scrollingElement.scrollWidth ≤ innerWidth).
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launchBrowser, newPerson, signedInTab, waitUntilDrawn } from "../support/browser";
import { DEMO, signIn } from "../support/http";
import { insertExampleStudy, jobBody, me } from "../integration/jobs-support";

const PHONE = { width: 390, height: 844 };
let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
  // Rows for every kind of page: the example's case, kits, rig and study, and a job shared with the demo customer.
  const owner = await signIn(DEMO.owner.email, DEMO.owner.password);
  const o = await me(owner);
  const { studyId } = await insertExampleStudy(o.shopId, o.userId, `Phone study ${Date.now()}`);
  const job = await owner.post("/api/v1/jobs", jobBody({ studyId, customerEmail: DEMO.customer.email }));
  expect(job.status, job.text).toBe(201);
  const shared = await owner.post(`/api/v1/jobs/${(job.json as { item: { id: string } }).item.id}/share`, {});
  expect(shared.status, shared.text).toBe(200);
});
afterAll(async () => {
  await browser?.close();
});

/** How far the page is wider than the screen, and the widest element that makes it so (for the message). */
async function overflow(page: Page): Promise<{ scrollWidth: number; innerWidth: number; culprit: string }> {
  return page.evaluate(() => {
    const root = document.scrollingElement ?? document.documentElement;
    let culprit = "";
    let widest = window.innerWidth;
    // An element inside a box that scrolls or clips sideways does not widen the page, unless it is positioned
    // out of that box (an absolutely placed label escapes a scroll box that is not its containing block).
    const clipped = (el: Element) => {
      if (["absolute", "fixed"].includes(getComputedStyle(el).position)) return false;
      for (let p = el.parentElement; p && p !== document.body; p = p.parentElement) if (getComputedStyle(p).overflowX !== "visible") return true;
      return false;
    };
    for (const el of Array.from(document.body.querySelectorAll("*"))) {
      if (clipped(el)) continue;
      const r = el.getBoundingClientRect();
      if (r.right > widest + 0.5) {
        widest = r.right;
        culprit = `${el.tagName.toLowerCase()}${el.id ? `#${el.id}` : ""}.${String(el.getAttribute("class") ?? "").split(" ").slice(0, 3).join(".")} → ${Math.round(r.right)} px`;
      }
    }
    return { scrollWidth: root.scrollWidth, innerWidth: window.innerWidth, culprit };
  });
}

/** The address of the first link a CSS selector finds, once the list has loaded (to reach a row's own page). */
async function firstHref(page: Page, selector: string): Promise<string | null> {
  const link = page.locator(selector).first();
  await link.waitFor({ state: "attached", timeout: 20_000 }).catch(() => undefined);
  return (await link.count()) ? link.getAttribute("href") : null;
}

async function checkPages(page: Page, paths: string[]) {
  const wide: string[] = [];
  for (const path of paths) {
    await page.goto(path);
    await page.waitForLoadState("load");
    // The page's own content is there and no table is still loading its rows.
    await page.locator("main").first().waitFor();
    await expect.poll(() => page.locator('[aria-busy="true"]').count(), { message: path }).toBe(0);
    const o = await overflow(page);
    if (o.scrollWidth > o.innerWidth) wide.push(`${path}: ${o.scrollWidth} px > ${o.innerWidth} px (${o.culprit})`);
  }
  expect(wide).toEqual([]);
}

async function staffPages(page: Page, role: "owner" | "builder"): Promise<string[]> {
  const paths = ["/home", "/studies", "/library", "/library?kind=kits", "/library?kind=rigs", "/library/cases/new", "/library/kits/new", "/library/rigs/new", "/jobs", "/jobs/new"];
  await page.goto("/studies");
  const study = await firstHref(page, 'table a[href^="/studies/"]');
  await page.goto("/library");
  const caseRow = await firstHref(page, 'table a[href^="/library/cases/"]');
  await page.goto("/jobs");
  const job = await firstHref(page, 'table a[href^="/jobs/"]');
  for (const p of [study, caseRow, job, job ? job.replace("/jobs/", "/setup-card/") : null]) if (p) paths.push(p);
  if (role === "owner") paths.push("/settings", "/outbox");
  expect(study && caseRow && job, "a study, a case profile and a job to open").toBeTruthy();
  return paths;
}

describe("every page at 390 px, by role", () => {
  it("signed out: the sign-in and sign-up pages", async () => {
    const person = await newPerson(browser, PHONE);
    const page = await person.newPage();
    await checkPages(page, ["/sign-in", "/sign-up"]);
    await person.close();
  });

  for (const role of ["owner", "builder"] as const) {
    it(`the ${role}'s pages`, async () => {
      const { context: person, page } = await signedInTab(browser, DEMO[role], PHONE);
      await checkPages(page, await staffPages(page, role));
      await person.close();
    });
  }

  it("the customer's pages", async () => {
    const { context: person, page } = await signedInTab(browser, DEMO.customer, PHONE);
    await page.goto("/consult");
    const consult = await firstHref(page, 'main a[href^="/consult/"]');
    expect(consult, "the customer has a shared job").toBeTruthy();
    await checkPages(page, ["/consult", consult!]);
    // The 3D view's labels stand wholly inside the view box, not cut off at its edges, on this small screen.
    await page.getByTestId("view").first().scrollIntoViewIfNeeded();
    await waitUntilDrawn(page, 30_000);
    const labels = () =>
      page.evaluate(() => {
        const view = document.querySelector("[data-testid=view]")!.getBoundingClientRect();
        return Array.from(document.querySelectorAll<HTMLElement>("[data-testid=fit-labels] [data-label]"))
          .filter((e) => getComputedStyle(e).visibility === "visible")
          .map((e) => {
            const r = e.getBoundingClientRect();
            return { text: e.textContent, out: r.left < view.left - 0.5 || r.right > view.right + 0.5 || r.top < view.top - 0.5 || r.bottom > view.bottom + 0.5 };
          });
      });
    await expect.poll(async () => (await labels()).length).toBeGreaterThan(0);
    expect((await labels()).filter((l) => l.out)).toEqual([]);
    await person.close();
  });
});
