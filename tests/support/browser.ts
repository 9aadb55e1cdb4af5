// Debian's Chromium driven by playwright-core, for the browser tests. Never downloads a browser.
import { mkdirSync } from "node:fs";
import { join } from "node:path";
import { chromium, type Browser, type BrowserContext, type Page } from "playwright-core";
import { expect, inject } from "vitest";
import { freshAddress, waitForMail } from "./http";

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

/** Collects the page's script errors into `into` as they happen, so a test can fail on them rather than on a timeout. */
export function collectPageErrors(page: Page, into: string[]): void {
  page.on("pageerror", (e) => into.push(e.message));
}

/**
 * A new person's tab signed in through the form, at the given window size; with `pageErrors`, the tab's script
 * errors are collected into it from the sign-in page on.
 */
export async function signedInTab(
  browser: Browser,
  who: { email: string; password: string },
  opts: { width?: number; height?: number; pageErrors?: string[] } = {},
): Promise<{ context: BrowserContext; page: Page }> {
  const context = await newPerson(browser, opts);
  const page = await context.newPage();
  if (opts.pageErrors) collectPageErrors(page, opts.pageErrors);
  await signInThroughForm(page, who.email, who.password);
  return { context, page };
}

/** Starts Chromium with one person's tab signed in (see {@link signedInTab}), for a test file's `beforeAll`. */
export async function launchSignedIn(
  who: { email: string; password: string },
  opts: { width?: number; height?: number; pageErrors?: string[] } = {},
): Promise<{ browser: Browser; context: BrowserContext; page: Page }> {
  const browser = await launchBrowser();
  return { browser, ...(await signedInTab(browser, who, opts)) };
}

/** Closes the browser after a test file; with `pageErrors`, the file fails on any script error its pages had. */
export async function closeBrowser(browser: Browser | undefined, pageErrors?: string[]): Promise<void> {
  await browser?.close();
  if (pageErrors) expect(pageErrors).toEqual([]);
}

/** Signs in through the form, as a person would. */
export async function signInThroughForm(page: Page, email: string, password: string): Promise<void> {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));
}

/** Fills the sign-up form on show (the e-mail only where given: an invitation fills it in) and sends it. */
export async function signUpThroughForm(page: Page, who: { name: string; email?: string; password: string }): Promise<void> {
  await page.getByLabel("Your name").fill(who.name);
  if (who.email !== undefined) await page.getByLabel("E-mail").fill(who.email);
  await page.getByLabel("Password").fill(who.password);
  await page.getByRole("button", { name: "Create account" }).click();
}

/**
 * On an invitation's page after signing up from it: follows the confirmation link mailed to `email` (only a
 * confirmed address may accept), which leads back to the invitation, and accepts it.
 */
export async function confirmAndAcceptInvitation(page: Page, email: string): Promise<void> {
  const confirmation = new URL((await waitForMail(email, /confirm/i)).links.find((l) => l.includes("/verify-email"))!);
  await page.goto(confirmation.pathname + confirmation.search);
  await page.waitForURL(/\/invite\//);
  await page.getByRole("button", { name: "Accept the invitation" }).click();
}

/** Waits until the 3D view's canvas has drawn the frame the studio asks for (its last frame key matches the view's). */
export async function waitUntilDrawn(page: Page, timeout = 10_000): Promise<void> {
  await page.waitForFunction(
    () => {
      const view = document.querySelector<HTMLElement>("[data-testid=view]");
      const canvas = view?.querySelector("canvas");
      return Boolean(view && canvas && canvas.dataset.drawn === view.dataset.wanted);
    },
    undefined,
    { timeout },
  );
}
