// Every page on a 390 px phone screen, for each role: nothing wider than the screen, so the page never
// scrolls sideways (document.scrollingElement.scrollWidth ≤ innerWidth).
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launchBrowser, newPerson, signInThroughForm } from "../support/browser";
import { DEMO } from "../support/http";

const PHONE = { width: 390, height: 844 };
let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
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
    for (const el of Array.from(document.body.querySelectorAll("*"))) {
      const r = el.getBoundingClientRect();
      if (r.right > widest + 0.5) {
        widest = r.right;
        culprit = `${el.tagName.toLowerCase()}${el.id ? `#${el.id}` : ""}.${String(el.getAttribute("class") ?? "").split(" ").slice(0, 3).join(".")} → ${Math.round(r.right)} px`;
      }
    }
    return { scrollWidth: root.scrollWidth, innerWidth: window.innerWidth, culprit };
  });
}

/** The first link on a page whose address matches, as a path (to reach a row's own page). */
async function firstHref(page: Page, pattern: RegExp): Promise<string | null> {
  const hrefs = await page.locator("a[href]").evaluateAll((as) => as.map((a) => a.getAttribute("href") ?? ""));
  return hrefs.find((h) => pattern.test(h)) ?? null;
}

async function checkPages(page: Page, paths: string[]) {
  const wide: string[] = [];
  for (const path of paths) {
    await page.goto(path);
    await page.waitForLoadState("load");
    await page.locator("h1").first().waitFor();
    const o = await overflow(page);
    if (o.scrollWidth > o.innerWidth) wide.push(`${path}: ${o.scrollWidth} px > ${o.innerWidth} px (${o.culprit})`);
  }
  expect(wide).toEqual([]);
}

async function staffPages(page: Page, role: "owner" | "builder"): Promise<string[]> {
  const paths = ["/home", "/studies", "/library", "/library?kind=kits", "/library?kind=rigs", "/library/cases/new", "/library/kits/new", "/library/rigs/new", "/jobs", "/jobs/new"];
  await page.goto("/studies");
  const study = await firstHref(page, /^\/studies\/[^/?]+$/);
  await page.goto("/library");
  const caseRow = await firstHref(page, /^\/library\/cases\/(?!new)[^/?]+$/);
  await page.goto("/jobs");
  const job = await firstHref(page, /^\/jobs\/(?!new)[^/?]+$/);
  for (const p of [study, caseRow, job, job ? job.replace("/jobs/", "/setup-card/") : null]) if (p) paths.push(p);
  if (role === "owner") paths.push("/settings", "/outbox");
  expect(study && caseRow && job, "the demo has a study, a case profile and a job to open").toBeTruthy();
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
      const person = await newPerson(browser, PHONE);
      const page = await person.newPage();
      await signInThroughForm(page, DEMO[role].email, DEMO[role].password);
      await checkPages(page, await staffPages(page, role));
      await person.close();
    });
  }

  it("the customer's pages", async () => {
    const person = await newPerson(browser, PHONE);
    const page = await person.newPage();
    await signInThroughForm(page, DEMO.customer.email, DEMO.customer.password);
    await page.goto("/consult");
    const consult = await firstHref(page, /^\/consult\/[^/?]+$/);
    expect(consult, "the demo customer has a shared job").toBeTruthy();
    await checkPages(page, ["/consult", consult!]);
    await person.close();
  });
});
