// The content security policy keeps the app working: in Chromium, the public studio (three.js on WebGL),
// the sign-in page and a signed-in study page render with no policy violation, and another site cannot
// frame the app.
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { launchBrowser, newPerson, signInThroughForm } from "../support/browser";
import { DEMO, signIn } from "../support/http";
import { newCase, newKit, ok, type Row } from "./library-fixtures";

let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

/** Every policy violation the page reports, from the console and from the DOM's securitypolicyviolation event. */
async function watch(page: Page): Promise<string[]> {
  const seen: string[] = [];
  page.on("console", (m) => {
    if (/Content Security Policy|Refused to/i.test(m.text())) seen.push(m.text());
  });
  await page.addInitScript(() => {
    document.addEventListener("securitypolicyviolation", (e) => console.error(`Refused to load: ${e.violatedDirective} ${e.blockedURI} at ${e.sourceFile}:${e.lineNumber}:${e.columnNumber}`));
  });
  return seen;
}

describe("the content security policy", () => {
  it("lets the public studio draw its 3D view (WebGL) with no violation", async () => {
    const context = await newPerson(browser);
    const page = await context.newPage();
    const violations = await watch(page);
    await page.goto("/try");
    await page.waitForSelector("[data-testid=view] canvas", { timeout: 30_000 });
    // The canvas is made by the client scripts, and marks each frame it has drawn.
    await expect.poll(() => page.evaluate(() => Boolean(document.querySelector<HTMLCanvasElement>("[data-testid=view] canvas")?.dataset.drawn)), { timeout: 30_000 }).toBe(true);
    expect(violations).toEqual([]);
    await context.close();
  });

  it("lets a person sign in and open a study page with no violation", async () => {
    const context = await newPerson(browser);
    const page = await context.newPage();
    const violations = await watch(page);
    const api = await signIn(DEMO.builder.email, DEMO.builder.password);
    const [c, k] = [await newCase(api), await newKit(api)];
    const study = ok<{ item: Row }>(await api.post("/api/v1/studies", { name: `CSP study ${Date.now()}`, caseId: c.id, kitIds: [k.id] }), 201).item;
    await signInThroughForm(page, DEMO.builder.email, DEMO.builder.password);
    await page.goto(`/studies/${study.id}`);
    await page.waitForSelector("[data-testid=view] canvas", { timeout: 30_000 });
    expect(violations).toEqual([]);
    await context.close();
  });

  it("another site cannot show the app in a frame", async () => {
    const context = await newPerson(browser);
    const page = await context.newPage();
    const blocked: string[] = [];
    page.on("console", (m) => {
      if (/frame-ancestors|Refused to (display|frame)/i.test(m.text())) blocked.push(m.text());
    });
    await page.setContent(`<iframe src="${inject("baseURL")}/sign-in" title="framed"></iframe>`);
    await expect.poll(() => blocked.length).toBeGreaterThan(0);
    const framed = page.frames().find((f) => f.url().includes("/sign-in"));
    const text = framed ? await framed.evaluate(() => document.body?.innerText ?? "").catch(() => "") : "";
    expect(text).not.toContain("Sign in");
    await context.close();
  });
});
