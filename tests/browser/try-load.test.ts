// How /try loads: the first HTML already holds the plan drawing and the example's figures (the server evaluated
// the study), three.js is not among the page's first scripts (the 3D view loads once the page is quiet), and
// when the studio comes alive React keeps the server's elements in place rather than drawing the page again,
// and answers a click made as soon as the page has loaded.
import { readFileSync } from "node:fs";
import { type Browser, chromium } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { evaluateStudy, parseStudy } from "@/geometry";
import { CHROMIUM_ARGS } from "../support/browser";

const example = parseStudy(JSON.parse(readFileSync(new URL("../../public/examples/study.json", import.meta.url), "utf8")));
const result = evaluateStudy(example);
const firstKit = result.kits[0];

let browser: Browser;
beforeAll(async () => {
  browser = await chromium.launch({ executablePath: "/usr/bin/chromium", args: CHROMIUM_ARGS });
});
afterAll(async () => {
  await browser?.close();
});

describe("/try as it loads", () => {
  it("shows the plan drawing and the first kit's verdict and cut with no script run at all", async () => {
    const context = await browser.newContext({ javaScriptEnabled: false, viewport: { width: 390, height: 844 } });
    const page = await context.newPage();
    await page.goto(`${inject("baseURL")}/try`);
    expect(await page.locator("[data-testid=view-still] svg").count()).toBe(1);
    // On show, not held back in a hidden part of the HTML for a script to reveal.
    expect(await page.locator("[data-testid=view-still] svg").isVisible()).toBe(true);
    expect(await page.getByTestId("kit-results").isVisible()).toBe(true);
    const verdict = page.getByTestId("verdict");
    expect(await verdict.getAttribute("data-verdict")).toBe(firstKit.verdict);
    expect(await verdict.getAttribute("data-cut")).toBe(firstKit.cut ? firstKit.cut.diameterMm.toFixed(2) : "none");
    expect(await page.getByTestId("kit-results").textContent()).toContain(firstKit.name);
    await context.close();
  });

  it("does not load three.js among the page's first scripts", async () => {
    const base = inject("baseURL");
    const html = await (await fetch(`${base}/try`)).text();
    const scripts = [...html.matchAll(/<script[^>]*\ssrc="([^"]+)"/g)].map((m) => m[1]);
    expect(scripts.length).toBeGreaterThan(0);
    for (const src of scripts) {
      const code = await (await fetch(new URL(src, base))).text();
      // The mark of three.js's renderer.
      expect(code.includes("WebGLRenderer"), src).toBe(false);
    }
  });

  it("comes alive on the server's elements: the results panel is the same element before and after, and answers", async () => {
    const context = await browser.newContext({ viewport: { width: 390, height: 844 } });
    const page = await context.newPage();
    // Keep hold of the results panel the HTML parser made, before any of the page's code runs.
    await page.addInitScript(() => {
      document.addEventListener("DOMContentLoaded", () => {
        (window as unknown as { firstPanel: Element | null }).firstPanel = document.querySelector("[data-testid=kit-results]");
      });
    });
    await page.goto(`${inject("baseURL")}/try`);
    // Alive: switching the units rewrites the figures in inches.
    await page.getByTestId("units-in").check();
    await expect.poll(() => page.getByTestId("kit-results").textContent(), { timeout: 30_000 }).toMatch(/\d\.\d{3} in/);
    const same = await page.evaluate(() => (window as unknown as { firstPanel: Element | null }).firstPanel === document.querySelector("[data-testid=kit-results]"));
    expect(same).toBe(true);
    await context.close();
  });

  it("keeps a click on the studio made as soon as the page has loaded, while React may still be bringing it to life", async () => {
    const context = await browser.newContext({ viewport: { width: 390, height: 844 } });
    const page = await context.newPage();
    await page.goto(`${inject("baseURL")}/try`);
    // React brings the page to life in steps; a click on a part not yet alive is played again once it is.
    await page.getByTestId("customer-toggle").click();
    await expect.poll(() => page.getByTestId("studio").getAttribute("data-customer"), { timeout: 30_000 }).toBe("true");
    expect(await page.getByTestId("customer-toggle").getAttribute("aria-pressed")).toBe("true");
    await context.close();
  });
});
