// How a study page loads: the first HTML already holds the plan drawing and the results of the kit on show (the
// server evaluated the study), and as the page comes alive React keeps the server's elements rather than drawing
// the page again, and keeps a click made on the editor as soon as the page has loaded (React brings the page to
// life in steps; a click on a part not yet alive is played again once it is).
import { readFileSync } from "node:fs";
import { type Browser, type BrowserContext, chromium } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { insertExampleStudy, me } from "../integration/jobs-support";
import { CHROMIUM_ARGS } from "../support/browser";
import { DEMO, signIn } from "../support/http";

/** The example study the test puts in the demo shop's library; its first kit is the one on show. */
const example = JSON.parse(readFileSync(new URL("../../public/examples/study.json", import.meta.url), "utf8")) as { kits: { name: string }[] };
const firstKitName = example.kits[0].name;

let browser: Browser;
let cookies: { name: string; value: string; url: string }[];
let studyId: string;

beforeAll(async () => {
  const owner = await signIn(DEMO.owner.email, DEMO.owner.password);
  const o = await me(owner);
  ({ studyId } = await insertExampleStudy(o.shopId, o.userId, `Loading study ${Date.now()}`));
  cookies = [...owner.cookies].map(([name, value]) => ({ name, value, url: inject("baseURL") }));
  browser = await chromium.launch({ executablePath: "/usr/bin/chromium", args: CHROMIUM_ARGS });
});
afterAll(async () => {
  await browser?.close();
});

async function signedIn(javaScriptEnabled: boolean): Promise<BrowserContext> {
  const context = await browser.newContext({ javaScriptEnabled, viewport: { width: 390, height: 844 } });
  await context.addCookies(cookies);
  return context;
}

describe("a study page as it loads", () => {
  it("shows the plan drawing and the first kit's results with no script run at all", async () => {
    const context = await signedIn(false);
    const page = await context.newPage();
    await page.goto(`${inject("baseURL")}/studies/${studyId}`);
    expect(await page.locator("[data-testid=view-still] svg").count()).toBe(1);
    // On show, not held back in a hidden part of the HTML for a script to reveal.
    expect(await page.locator("[data-testid=view-still] svg").isVisible()).toBe(true);
    expect(await page.getByTestId("kit-results").isVisible()).toBe(true);
    expect(["fits-as-is", "fits-after-cut", "cannot-fit"]).toContain(await page.getByTestId("verdict").getAttribute("data-verdict"));
    expect(await page.getByTestId("kit-results").textContent()).toContain(firstKitName);
    await context.close();
  });

  it("comes alive on the server's elements and keeps clicks made as soon as it has loaded", async () => {
    const context = await signedIn(true);
    const page = await context.newPage();
    const errors: string[] = [];
    page.on("pageerror", (e) => errors.push(e.message));
    // Keep hold of the results panel the HTML parser made, before any of the page's code runs.
    await page.addInitScript(() => {
      document.addEventListener("DOMContentLoaded", () => {
        (window as unknown as { firstPanel: Element | null }).firstPanel = document.querySelector("[data-testid=kit-results]");
      });
    });
    await page.goto(`${inject("baseURL")}/studies/${studyId}`);
    // A click inside the studio, which may not be alive yet: it takes effect once it is.
    await page.getByTestId("customer-toggle").click();
    await expect.poll(() => page.getByTestId("studio").getAttribute("data-customer"), { timeout: 30_000 }).toBe("true");
    const same = await page.evaluate(() => (window as unknown as { firstPanel: Element | null }).firstPanel === document.querySelector("[data-testid=kit-results]"));
    expect(same).toBe(true);
    // The tabs of the editor answer too.
    await page.getByRole("tab", { name: "Lineup" }).click();
    await expect.poll(() => page.getByRole("tab", { name: "Lineup" }).getAttribute("aria-selected")).toBe("true");
    expect(await page.getByTestId("studio").count()).toBe(0);
    expect(errors).toEqual([]);
    await context.close();
  });
});
