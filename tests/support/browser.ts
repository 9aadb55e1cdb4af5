// Debian's Chromium driven by playwright-core, for the browser tests. Never downloads a browser.
import { mkdirSync } from "node:fs";
import { join } from "node:path";
import { chromium, type Browser, type BrowserContext, type Page } from "playwright-core";
import { inject } from "vitest";
import { freshAddress } from "./http";

export const CHROMIUM_ARGS = [
  "--headless",
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
  "--use-angle=swiftshader",
  "--enable-unsafe-swiftshader",
];

/** Starts Chromium; playwright gives every launch a fresh, empty profile of its own. */
export async function launchBrowser(): Promise<Browser> {
  return chromium.launch({ executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium", args: CHROMIUM_ARGS });
}

/** A new browsing context as one person: its own cookies and its own client address for the sign-in limiter. */
export async function newPerson(browser: Browser, opts: { width?: number; height?: number } = {}): Promise<BrowserContext> {
  return browser.newContext({
    baseURL: inject("baseURL"),
    viewport: { width: opts.width ?? 1280, height: opts.height ?? 860 },
    extraHTTPHeaders: { "x-forwarded-for": freshAddress() },
    acceptDownloads: true,
  });
}

const shots = join(process.cwd(), "test-results", "screenshots");

/** Saves a full-page screenshot as a test artifact (git-ignored). */
export async function screenshot(page: Page, name: string): Promise<string> {
  mkdirSync(shots, { recursive: true });
  const path = join(shots, `${name}.png`);
  await page.screenshot({ path, fullPage: true });
  return path;
}

/** Signs in through the form, as a person would. */
export async function signInThroughForm(page: Page, email: string, password: string): Promise<void> {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));
}
