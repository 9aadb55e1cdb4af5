import AxeBuilder from "@axe-core/playwright";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launchBrowser, newPerson, signInThroughForm } from "../support/browser";
import { me, insertExampleStudy, jobBody } from "../integration/jobs-support";
import { DEMO, signIn, uniqueEmail } from "../support/http";
import { cssVariables } from "@/model/palette";

// Every page each role can reach, walked mostly by clicking, checked by axe-core's rules
// (WCAG 2.1 A and AA), in the light and in the dark colour scheme. Any serious or critical finding fails
// the walk, with what and where.

let browser: Browser;
/** The shop's planned job, shared with the demo customer, and the study it was planned from. */
let planned: { id: string; reference: string };
beforeAll(async () => {
  browser = await launchBrowser();
  const owner = await signIn(DEMO.owner.email, DEMO.owner.password);
  const who = await me(owner);
  const { studyId } = await insertExampleStudy(who.shopId, who.userId, "Accessibility walk study");
  const made = await owner.post("/api/v1/jobs", jobBody({ studyId, title: "Accessibility walk job" }));
  if (made.status !== 201) throw new Error(`job not opened: ${made.text}`);
  planned = (made.json as { item: { id: string; reference: string } }).item;
  const shared = await owner.post(`/api/v1/jobs/${planned.id}/share`);
  if (shared.status !== 200) throw new Error(`plan not shared: ${shared.text}`);
  // A job at intake, with no plan yet.
  await owner.post("/api/v1/jobs", jobBody({ customerEmail: uniqueEmail("axe-walk-in") }));
});
afterAll(async () => {
  await browser?.close();
});

type Scheme = "light" | "dark";

/** A #rrggbb colour as the browser's computed style writes it, `rgb(r, g, b)`. */
const rgbOf = (hex: string) => `rgb(${[1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16)).join(", ")})`;

/** The palette's colour properties of a scheme, each as the browser paints it. */
const paletteColours = (scheme: Scheme) => Object.fromEntries(Object.entries(cssVariables(scheme)).map(([k, hex]) => [k, rgbOf(hex)]));

/** What an element inside `within` paints with each of the palette's colour properties. */
async function painted(page: Page, within: string): Promise<Record<string, string>> {
  const names = Object.keys(cssVariables("light"));
  const colours = await page.evaluate(
    ([selector, props]) => {
      const probe = document.querySelector(selector)!.appendChild(document.createElement("span"));
      const out = props.map((n) => ((probe.style.color = `var(${n})`), getComputedStyle(probe).color));
      probe.remove();
      return out;
    },
    [within, names] as const,
  );
  return Object.fromEntries(names.map((n, i) => [n, colours[i]]));
}
type Finding = { page: string; rule: string; impact: string; help: string; targets: string[] };

type Walk = {
  page: Page;
  /** Checks the page on show, naming it `name` in the findings. */
  check: (name: string) => Promise<void>;
  /** Follows a link of the main navigation and checks the page it leads to. */
  visit: (link: string, path: string, name: string) => Promise<void>;
  /** Ends the walk: fails on any finding, with what and where. */
  done: () => Promise<void>;
};

/** One person's walk: one context, one tab, the findings of every page it opens. */
async function walker(scheme: Scheme, role?: keyof typeof DEMO): Promise<Walk> {
  const context = await newPerson(browser);
  const page = await context.newPage();
  await page.emulateMedia({ colorScheme: scheme });
  if (role) await signInThroughForm(page, DEMO[role].email, DEMO[role].password);
  const findings: Finding[] = [];
  const check = async (name: string) => {
    await page.waitForLoadState("networkidle");
    const result = await new AxeBuilder({ page }).withTags(["wcag2a", "wcag2aa", "wcag21a", "wcag21aa", "best-practice"]).analyze();
    for (const v of result.violations) {
      if (v.impact !== "serious" && v.impact !== "critical") continue;
      findings.push({ page: `${name}, ${scheme} (${new URL(page.url()).pathname})`, rule: v.id, impact: v.impact, help: v.help, targets: v.nodes.slice(0, 5).map((n) => n.target.join(" ")) });
    }
  };
  const visit = async (link: string, path: string, name: string) => {
    await nav(page, link, path);
    await check(name);
  };
  const done = async () => {
    await context.close();
    expect(findings, report(findings)).toEqual([]);
  };
  return { page, check, visit, done };
}

function report(findings: Finding[]): string {
  return findings.map((f) => `${f.page}: ${f.impact} ${f.rule} — ${f.help}\n    ${f.targets.join("\n    ")}`).join("\n");
}

/** Follows a link of the main navigation and waits for its page. */
async function nav(page: Page, name: string, path: string) {
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name, exact: true }).click();
  await page.waitForURL(`**${path}`);
}

/** Opens the first link on the page whose address starts with the prefix (and is not a "new" form). */
async function openFirst(page: Page, prefix: string) {
  const link = page.locator(`main a[href^="${prefix}"]:not([href$="/new"])`).filter({ visible: true }).first();
  await link.waitFor();
  await link.click();
  await page.waitForURL((url) => url.pathname.startsWith(prefix) && url.pathname.length > prefix.length);
}

/** Tabs forward until the element with the test id has the focus; the focus ring must show on it. */
async function tabTo(page: Page, testId: string) {
  for (let i = 0; i < 80; i++) {
    await page.keyboard.press("Tab");
    const here = await page.evaluate(() => document.activeElement?.getAttribute("data-testid") ?? null);
    if (here === testId) {
      const ring = await page.evaluate(() => {
        const s = getComputedStyle(document.activeElement!);
        return { style: s.outlineStyle, width: parseFloat(s.outlineWidth) };
      });
      expect(ring.style, `focus ring on ${testId}`).not.toBe("none");
      expect(ring.width, `focus ring on ${testId}`).toBeGreaterThanOrEqual(2);
      return;
    }
  }
  throw new Error(`${testId} is not reachable with the Tab key`);
}

/** Tabs to a slider and moves it one step with an arrow key (back from its top end). */
async function stepByKey(page: Page, testId: string) {
  await tabTo(page, testId);
  const range = page.getByTestId(testId);
  const [value, max] = await range.evaluate((el: HTMLInputElement) => [el.value, el.max]);
  await page.keyboard.press(Number(value) >= Number(max) ? "ArrowLeft" : "ArrowRight");
  await expect.poll(() => range.inputValue()).not.toBe(value);
}

/** The studio's section plane and cut sliders, by keyboard alone. */
async function keyboardThroughStudio(page: Page) {
  const view = page.getByTestId("view");
  await page.getByRole("heading", { level: 1 }).click();
  await tabTo(page, "section-toggle");
  const before = await view.getAttribute("data-section");
  await page.keyboard.press("Space");
  await expect.poll(() => view.getAttribute("data-section")).not.toBe(before);
  if (before !== "off") {
    await page.keyboard.press("Space");
    await expect.poll(() => view.getAttribute("data-section")).toBe(before);
  }
  const angle = await view.getAttribute("data-section");
  await stepByKey(page, "section-angle");
  await expect.poll(() => view.getAttribute("data-section")).not.toBe(angle);
  await stepByKey(page, "cut-diameter");
  await stepByKey(page, "cut-depth");
}

describe.each<Scheme>(["light", "dark"])("accessibility of every page, by role, in the %s colour scheme", (scheme) => {
  it("a visitor: the front page, the example studio (its section plane and cut sliders by keyboard) and the account forms", async () => {
    const { page, check, done } = await walker(scheme);
    await page.goto("/");
    await check("front page");
    await page.goto("/try");
    await page.getByTestId("view").waitFor();
    await check("example studio");
    // Every colour of the palette reaches the page in this scheme (the legend's swatches paint with them): an
    // element painted with each property shows the scheme's colour of it.
    expect(await painted(page, "body")).toEqual(paletteColours(scheme));
    await keyboardThroughStudio(page);
    await page.goto("/sign-in");
    await check("sign in");
    await page.getByRole("link", { name: "Forgot the password?" }).click();
    await page.waitForURL("**/forgot-password");
    await check("forgot password");
    await page.goto("/sign-up");
    await check("sign up");
    await done();
  });

  // The longest walk: fifteen pages, each checked in full (about three minutes on a busy two-core machine).
  it("the owner: home, the library's shelves and forms, studies, a study, jobs, a new job, a job, settings and outbox", { timeout: 360_000 }, async () => {
    const { page, check, visit, done } = await walker(scheme, "owner");
    await check("home");
    await nav(page, "Library", "/library");
    for (const [tab, kind] of [["Cylinder kits", "kits"], ["Boring rigs", "rigs"], ["Case profiles", "cases"]] as const) {
      await page.getByRole("navigation", { name: "Library sections" }).getByRole("link", { name: tab }).click();
      await page.waitForURL(`**/library?kind=${kind}`);
      await check(`library: ${kind}`);
      await openFirst(page, `/library/${kind}/`);
      await check(`library: one of ${kind}`);
      await page.goBack();
      await page.locator(`main a[href="/library/${kind}/new"]`).first().click();
      await page.waitForURL(`**/library/${kind}/new`);
      await check(`library: new ${kind}`);
      await page.goBack();
    }
    await visit("Studies", "/studies", "studies");
    await openFirst(page, "/studies/");
    await page.getByTestId("view").waitFor();
    await check("a study");
    await visit("Jobs", "/jobs", "jobs");
    await page.getByRole("link", { name: "New job" }).click();
    await page.waitForURL("**/jobs/new");
    await check("new job");
    await page.goBack();
    await openFirst(page, "/jobs/");
    await check("a job from the list");
    await visit("Shop settings", "/settings", "shop settings");
    await visit("Outbox", "/outbox", "outbox");
    await done();
  });

  it("the builder: home, jobs, a job and its setup card", async () => {
    const { page, check, visit, done } = await walker(scheme, "builder");
    await check("home");
    await visit("Jobs", "/jobs", "jobs");
    await page.goto(`/jobs/${planned.id}`);
    await check("a planned job");
    await page.getByRole("link", { name: "Setup card" }).click();
    await page.waitForURL("**/setup-card/**");
    await check("setup card");
    // The printed card keeps the light theme's colours on a dark screen too.
    expect(await painted(page, ".setup-card")).toEqual(paletteColours("light"));
    await done();
  });

  it("the customer: the consult list and a consult page", async () => {
    const { page, check, visit, done } = await walker(scheme, "customer");
    await check("landing");
    await visit("Consult", "/consult", "consult list");
    await openFirst(page, "/consult/");
    await check("a consult");
    await done();
  });
});
