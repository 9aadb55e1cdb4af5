import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { confirmAndAcceptInvitation, launchBrowser, newPerson, screenshot, signedInTab, signInThroughForm, signUpThroughForm } from "../support/browser";
import { DEMO, uniqueEmail, waitForMail } from "../support/http";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

const navOf = async (page: import("playwright-core").Page) =>
  (await page.getByRole("navigation", { name: "Main" }).getByRole("link").allTextContents()).map((t) => t.trim());

/** A new person in a context of their own, signed up through the form and landed on their home page. */
async function signedUpPerson(tag: string, name: string, password: string) {
  const context = await newPerson(browser);
  const page = await context.newPage();
  const email = uniqueEmail(tag);
  await page.goto("/sign-up");
  await signUpThroughForm(page, { name, email, password });
  await page.waitForURL("**/home");
  return { context, page, email };
}

describe("in the browser", () => {
  it("a new person signs up, lands in a shop of their own and confirms the e-mail from the mail in the sink", async () => {
    const { context, page, email } = await signedUpPerson("browser-signup", "Rowan Test", "a-long-browser-password");
    expect(await page.getByTestId("who").textContent()).toContain("Rowan Test's shop");
    expect(await page.getByText("Confirm your e-mail address: the link").isVisible()).toBe(true);
    expect(await navOf(page)).toEqual(["Studies", "Library", "Jobs", "Shop settings", "Outbox"]);
    await screenshot(page, "auth-01-signed-up-workbench");

    const mail = await waitForMail(email, /confirm/i);
    await page.goto(mail.links.find((l) => l.includes("verify-email"))!);
    await page.waitForURL("**/home?verified=1");
    expect(await page.getByText("Your e-mail address is confirmed.").isVisible()).toBe(true);
    expect(await page.getByText("Confirm your e-mail address: the link").count()).toBe(0);
    await screenshot(page, "auth-02-verified");
    await context.close();
  });

  it("the sign-up form says what is wrong next to each field and keeps what was typed", async () => {
    const context = await newPerson(browser);
    const page = await context.newPage();
    await page.goto("/sign-up");
    await signUpThroughForm(page, { name: "Kept Name", email: "not-an-address", password: "short" });
    await expect.poll(() => page.getByText("That does not look like an e-mail address").count()).toBe(1);
    expect(await page.getByText("Use at least 10 characters.").count()).toBe(1);
    expect(await page.getByLabel("Your name").inputValue()).toBe("Kept Name");
    expect(await page.getByLabel("E-mail").inputValue()).toBe("not-an-address");

    // An address already taken is refused by the server, next to the e-mail field.
    await page.getByLabel("E-mail").fill(DEMO.owner.email);
    await page.getByLabel("Password").fill("a-long-enough-password");
    await page.getByRole("button", { name: "Create account" }).click();
    await expect.poll(() => page.getByText("An account with this e-mail already exists").count()).toBe(1);
    expect(await page.getByLabel("Password").inputValue()).toBe("a-long-enough-password");
    await screenshot(page, "auth-03-sign-up-errors");
    await context.close();
  });

  it.each([
    ["owner", ["Studies", "Library", "Jobs", "Shop settings", "Outbox"]],
    ["builder", ["Studies", "Library", "Jobs"]],
    ["customer", ["Consult"]],
  ] as const)("signs in as the demo %s and sees that role's navigation", async (role, nav) => {
    const { context, page } = await signedInTab(browser, DEMO[role]);
    expect(await navOf(page)).toEqual(nav);
    expect(await page.getByTestId("who").textContent()).toContain(role);
    await screenshot(page, `auth-04-${role}-navigation`);
    await context.close();
  });

  it("an owner invites a builder; the builder accepts from the mailed link and works in the shop", async () => {
    const { context: ownerContext, page: owner } = await signedInTab(browser, DEMO.owner);
    await owner.goto("/settings");
    const builderEmail = uniqueEmail("browser-builder");
    await owner.getByLabel("E-mail").fill(builderEmail);
    await owner.getByLabel("Role").selectOption("builder");
    await owner.getByRole("button", { name: "Send invitation" }).click();
    await expect.poll(() => owner.getByText(`Invitation sent to ${builderEmail}.`).count()).toBe(1);
    await owner.goto("/outbox");
    await expect.poll(() => owner.getByTestId("outbox-message").filter({ hasText: builderEmail }).count()).toBeGreaterThan(0);
    await screenshot(owner, "auth-05-outbox");

    const mail = await waitForMail(builderEmail, /invites you/i);
    const link = mail.links.find((l) => l.includes("/invite/"))!;
    const builderContext = await newPerson(browser);
    const builder = await builderContext.newPage();
    await builder.goto(link);
    await builder.getByRole("link", { name: "Create an account" }).click();
    expect(await builder.getByLabel("E-mail").inputValue()).toBe(builderEmail);
    await signUpThroughForm(builder, { name: "Invited Machinist", password: "a-long-builder-password" });
    await builder.waitForURL("**/invite/**");
    // Only a confirmed address may accept: the page asks for the link mailed at sign-up, which leads back.
    await expect.poll(() => builder.getByRole("heading", { name: /Confirm your e-mail/ }).count()).toBe(1);
    await confirmAndAcceptInvitation(builder, builderEmail);
    await builder.waitForURL("**/home");
    expect(await builder.getByTestId("who").textContent()).toContain("Quillfern Engine Works");
    expect(await navOf(builder)).toEqual(["Studies", "Library", "Jobs"]);
    await screenshot(builder, "auth-06-builder-joined");
    await ownerContext.close();
    await builderContext.close();
  });

  it("resets a forgotten password from the mailed link, then signs in with the new one and out again", async () => {
    const { context, page, email } = await signedUpPerson("browser-reset", "Forgetful Person", "the-old-password-1");
    await page.getByRole("button", { name: "Sign out" }).click();
    await page.waitForURL("**/sign-in");

    await page.getByRole("link", { name: "Forgot the password?" }).click();
    // The sign-in page has an e-mail field too: wait for the reset form before typing.
    await page.waitForURL("**/forgot-password");
    await page.getByRole("form", { name: "Reset the password" }).waitFor();
    await page.getByLabel("E-mail").fill(email);
    await page.getByRole("button", { name: "Send the link" }).click();
    await expect.poll(() => page.getByRole("main").innerText()).toContain("a link to choose a new password is on its way");
    const mail = await waitForMail(email, /reset/i);
    await page.goto(mail.links.find((l) => l.includes("reset-password"))!);
    await page.waitForURL("**/reset-password?token=**");
    await page.getByLabel("New password", { exact: true }).fill("the-new-password-2");
    await page.getByLabel("The same again").fill("the-new-password-2");
    await page.getByRole("button", { name: "Save the new password" }).click();
    await page.waitForURL("**/sign-in?reset=1");
    await screenshot(page, "auth-07-password-changed");
    await signInThroughForm(page, email, "the-new-password-2");
    expect(await page.getByTestId("who").textContent()).toContain("Forgetful Person");
    await page.getByRole("button", { name: "Sign out" }).click();
    await page.waitForURL("**/sign-in");
    await page.goto("/settings");
    await page.waitForURL("**/sign-in?next=**");
    await context.close();
  });
});
