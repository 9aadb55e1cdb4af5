import { describe, expect, it } from "vitest";
import { confirmEmail, countRows, DEMO, Http, signIn, signUp, uniqueEmail, waitForMail } from "../support/http";

type ErrorBody = { error: { code: string; message: string; fields?: Record<string, string> } };

function expectErrorShape(json: unknown): asserts json is ErrorBody {
  expect(json).toMatchObject({ error: { code: expect.any(String), message: expect.any(String) } });
}

describe("sign-up", () => {
  it("creates a shop of one with the new person as its owner, and mails a confirmation link", async () => {
    const email = uniqueEmail("solo");
    const http = await signUp("Solo Builder", email);
    const me = await http.get("/api/v1/me");
    expect(me.status).toBe(200);
    expect(me.json).toMatchObject({ me: { email, role: "owner", shopName: "Solo Builder's shop", emailVerified: false } });

    const mail = await waitForMail(email, /confirm/i);
    const link = mail.links.find((l) => l.includes("/verify-email"));
    expect(link).toBeDefined();
    const verified = await http.get(new URL(link!).pathname + new URL(link!).search);
    expect([200, 302, 307]).toContain(verified.status);
    const after = await http.get("/api/v1/me");
    expect(after.json).toMatchObject({ me: { emailVerified: true } });
  });

  it("sets the session cookie httpOnly and sameSite, and never sends the password back", async () => {
    const http = new Http();
    const password = "another-long-password";
    const res = await http.post("/api/auth/sign-up/email", { name: "Cookie Check", email: uniqueEmail("cookie"), password });
    expect(res.status).toBe(200);
    const cookie = res.headers.getSetCookie().find((c) => c.startsWith("borewright.session_token="));
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(res.text).not.toContain(password);
  });

  it.each([
    ["a malformed e-mail", { name: "A", email: "not-an-address", password: "a-long-test-password" }, "email"],
    ["a short password", { name: "A", email: "short@example.test", password: "short" }, "password"],
    ["an e-mail already taken", { name: "A", email: DEMO.owner.email, password: "a-long-test-password" }, "email"],
  ])("refuses %s with a 4xx in the one error shape, naming the field, and writes nothing", async (_label, body, field) => {
    // A name of its own, so the shop a wrong sign-up might have made is counted apart from other files' sign-ups.
    const name = `Refused ${uniqueEmail("sign-up")}`;
    const users = await countRows("user", { email: body.email });
    const shops = await countRows("organization", { name: `${name}'s shop` });
    const res = await new Http().post("/api/auth/sign-up/email", { ...body, name });
    expect(res.status).toBeGreaterThanOrEqual(400);
    expect(res.status).toBeLessThan(500);
    expectErrorShape(res.json);
    expect(res.json.error.fields?.[field]).toEqual(expect.any(String));
    expect(await countRows("user", { email: body.email })).toBe(users);
    expect(await countRows("organization", { name: `${name}'s shop` })).toBe(shops);
  });

  it("answers a body that is not JSON with a 4xx in the one error shape", async () => {
    const res = await new Http().send("POST", "/api/auth/sign-up/email", "{not json");
    expect(res.status).toBe(400);
    expectErrorShape(res.json);
  });
});

describe("sign-in", () => {
  it("signs each demo role in and reports that role in its shop", async () => {
    for (const role of ["owner", "builder", "customer"] as const) {
      const http = await signIn(DEMO[role].email, DEMO[role].password);
      const me = await http.get("/api/v1/me");
      expect(me.json).toMatchObject({ me: { role, shopName: "Quillfern Engine Works" } });
    }
  });

  it("rate-limits repeated attempts from one address with 429", async () => {
    // A fresh account, so the failures count against no one else (sign-in also limits failures per account).
    const email = uniqueEmail("limited");
    await signUp("Limited Person", email);
    const http = new Http();
    const statuses: number[] = [];
    for (let i = 0; i < 8; i++) {
      statuses.push((await http.post("/api/auth/sign-in/email", { email, password: "wrong-password-here" })).status);
    }
    expect(statuses.slice(0, 3)).toEqual([401, 401, 401]);
    expect(statuses).toContain(429);
  });

  it("signs out: the session no longer opens the API", async () => {
    const http = await signIn(DEMO.builder.email, DEMO.builder.password);
    expect((await http.get("/api/v1/me")).status).toBe(200);
    expect((await http.post("/api/auth/sign-out", {})).status).toBe(200);
    expect((await http.get("/api/v1/me")).status).toBe(401);
  });
});

describe("password reset", () => {
  it("mails a one-hour link whose token sets a new password; the old one stops working", async () => {
    const email = uniqueEmail("reset");
    await signUp("Reset Person", email, "the-first-password");
    const anon = new Http();
    expect((await anon.post("/api/auth/request-password-reset", { email, redirectTo: "/reset-password" })).status).toBe(200);
    const mail = await waitForMail(email, /reset/i);
    const link = new URL(mail.links.find((l) => l.includes("/reset-password"))!);
    const landing = await anon.get(link.pathname + link.search);
    const location = landing.headers.get("location") ?? "";
    const token = new URL(location, anon.base).searchParams.get("token");
    expect(token).toBeTruthy();
    expect((await anon.post("/api/auth/reset-password", { newPassword: "the-second-password", token })).status).toBe(200);
    expect((await new Http().post("/api/auth/sign-in/email", { email, password: "the-first-password" })).status).toBe(401);
    expect((await new Http().post("/api/auth/sign-in/email", { email, password: "the-second-password" })).status).toBe(200);
  });
});

describe("invitations", () => {
  it("an owner invites a builder by mail; the invitee signs up, accepts and works in that shop", async () => {
    const ownerEmail = uniqueEmail("inviting-owner");
    const owner = await signUp("Inviting Owner", ownerEmail);
    const builderEmail = uniqueEmail("invited-builder");
    const sent = await owner.post("/api/auth/organization/invite-member", { email: builderEmail, role: "builder" });
    expect(sent.status, sent.text).toBe(200);
    const mail = await waitForMail(builderEmail, /invites you/i);
    const invitationId = mail.links.map((l) => new URL(l).pathname.match(/^\/invite\/(.+)$/)?.[1]).find(Boolean);
    expect(invitationId).toBeTruthy();

    const shopsBefore = await countRows("organization", { name: "Invited Builder's shop" });
    const builder = await signUp("Invited Builder", builderEmail);
    // An invited person gets no shop of their own on the way.
    expect(await countRows("organization", { name: "Invited Builder's shop" })).toBe(shopsBefore);
    // Holding the invitation's id is not enough: the address must be confirmed first.
    const unconfirmed = await builder.post("/api/auth/organization/accept-invitation", { invitationId });
    expect(unconfirmed.status, unconfirmed.text).toBe(403);
    expect(unconfirmed.json).toMatchObject({ error: { code: expect.any(String), message: expect.any(String) } });
    await confirmEmail(builder, builderEmail);
    expect((await builder.post("/api/auth/organization/accept-invitation", { invitationId })).status).toBe(200);
    const me = await builder.get("/api/v1/me");
    expect(me.json).toMatchObject({ me: { role: "builder", shopName: "Inviting Owner's shop" } });
  });

  it("a builder cannot invite anyone (403), and a customer cannot either", async () => {
    for (const role of ["builder", "customer"] as const) {
      const http = await signIn(DEMO[role].email, DEMO[role].password);
      const res = await http.post("/api/auth/organization/invite-member", { email: uniqueEmail("nope"), role: "builder" });
      expect(res.status).toBe(403);
      expectErrorShape(res.json);
    }
  });

  it("a person in two shops can switch between them", async () => {
    const email = uniqueEmail("two-shops");
    const http = await signUp("Two Shops", email);
    const created = await http.post("/api/v1/shops", { name: "Second Bench" });
    expect(created.status).toBe(201);
    const { shop } = created.json as { shop: { id: string } };
    expect((await http.post("/api/auth/organization/set-active", { organizationId: shop.id })).status).toBe(200);
    expect((await http.get("/api/v1/me")).json).toMatchObject({ me: { shopName: "Second Bench", role: "owner" } });
  });
});

describe("pages by role", () => {
  type Who = "owner" | "builder" | "customer" | "anonymous";
  /** Each page, with what it answers each role tried on it (307: to sign in). */
  const ANSWERS: Record<string, Partial<Record<Who, number>>> = {
    "/settings": { owner: 200, builder: 403, customer: 403, anonymous: 307 },
    "/library": { builder: 200, customer: 403, anonymous: 307 },
    "/studies": { customer: 403 },
    "/jobs": { customer: 403 },
    "/outbox": { builder: 403, owner: 200 },
    "/consult": { customer: 200 },
  };
  const cases = Object.entries(ANSWERS).flatMap(([path, byRole]) => Object.entries(byRole).map(([role, status]) => [path, role as Who, status] as const));
  it.each(cases)("%s as %s answers %i", async (path, role, status) => {
    const http = role === "anonymous" ? new Http() : await signIn(DEMO[role].email, DEMO[role].password);
    const res = await http.get(path);
    expect(res.status).toBe(status);
    if (status === 307) expect(res.headers.get("location")).toContain("/sign-in");
  });
});

describe("one shop cannot reach another", () => {
  it("an owner of shop B can neither enter shop A, invite into it, nor remove its members", async () => {
    const other = await signUp("Other Owner", uniqueEmail("other-shop"));
    const demoShopId = "demo-shop";
    const enter = await other.post("/api/auth/organization/set-active", { organizationId: demoShopId });
    expect(enter.status).toBeGreaterThanOrEqual(400);
    expect(enter.status).toBeLessThan(500);
    expect((await other.get("/api/v1/me")).json).toMatchObject({ me: { shopName: "Other Owner's shop" } });

    const invite = await other.post("/api/auth/organization/invite-member", { email: uniqueEmail("sneak"), role: "owner", organizationId: demoShopId });
    expect([400, 403, 404]).toContain(invite.status);

    const members = await countRows("member", { id: "demo-builder-member" });
    const remove = await other.post("/api/auth/organization/remove-member", { memberIdOrEmail: "demo-builder-member", organizationId: demoShopId });
    expect([400, 403, 404]).toContain(remove.status);
    expect(await countRows("member", { id: "demo-builder-member" })).toBe(members);
  });

  it("the settings page shows only the caller's own shop's members", async () => {
    const other = await signUp("Lone Owner", uniqueEmail("lone"));
    const page = await other.get("/settings");
    expect(page.status).toBe(200);
    expect(page.text).toContain("Lone Owner");
    expect(page.text).not.toContain("owner@quillfern.test");
    expect(page.text).not.toContain("Tomas Brisk");
  });
});
