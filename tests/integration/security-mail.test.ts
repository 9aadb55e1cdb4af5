// The outbox shows a shop's owner only the mail meant for them or their shop: another shop's owner never
// sees a password-reset link (with one, they could take the account over), on the page or through any API.
import { describe, expect, it } from "vitest";
import { DEMO, Http, signIn, signUp, uniqueEmail, waitForMail } from "../support/http";

/** The reset token of a reset mail's link. */
async function resetLinkFor(email: string): Promise<string> {
  const anon = new Http();
  expect((await anon.post("/api/auth/request-password-reset", { email, redirectTo: "/reset-password" })).status).toBe(200);
  const mail = await waitForMail(email, /reset/i);
  const link = mail.links.find((l) => l.includes("/reset-password"));
  expect(link).toBeDefined();
  return new URL(link!).pathname.split("/").pop()!;
}

describe("the outbox", () => {
  it("never shows one shop the password-reset mail of another shop's member", async () => {
    const victimEmail = uniqueEmail("outbox-victim");
    const victim = await signUp("Outbox Victim", victimEmail);
    const intruder = await signUp("Outbox Intruder", uniqueEmail("outbox-intruder"));
    const token = await resetLinkFor(victimEmail);
    expect(token.length).toBeGreaterThan(10);

    // The addressee sees their own reset mail in their own shop's outbox: the page does list caught mail.
    const own = await victim.get("/outbox");
    expect(own.status).toBe(200);
    expect(own.text).toContain(token);

    const page = await intruder.get("/outbox");
    expect(page.status).toBe(200);
    expect(page.text).not.toContain(token);
    expect(page.text).not.toContain(victimEmail);

    // Nor through an API: no route serves caught mail.
    for (const path of ["/api/v1/outbox", "/api/v1/mail", "/api/v1/messages", "/api/outbox", "/outbox/messages", "/api/auth/messages"]) {
      const res = await intruder.get(path);
      expect(res.status, path).toBeGreaterThanOrEqual(400);
      expect(res.status, path).toBeLessThan(500);
      expect(res.text).not.toContain(token);
    }
  });

  it("shows a shop's owner the invitation they sent, but not a member's password reset", async () => {
    const owner = await signIn(DEMO.owner.email, DEMO.owner.password);
    const invitee = uniqueEmail("outbox-invitee");
    const invited = await owner.post("/api/auth/organization/invite-member", { email: invitee, role: "builder" });
    expect(invited.status).toBe(200);
    await waitForMail(invitee, /invites you/i);
    const page = await owner.get("/outbox");
    expect(page.text).toContain(invitee);

    const token = await resetLinkFor(DEMO.builder.email);
    const after = await owner.get("/outbox");
    expect(after.text).not.toContain(token);
  });
});
