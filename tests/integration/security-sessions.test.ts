// Sign-in: the limiter counts a client by the address the trusted proxies saw (none by default, so a
// changing X-Forwarded-For gets no fresh allowance), failed sign-ins are limited per account whatever the
// address, and a new password ends the sessions that the old one opened.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { FailedSignIns, clientAddress } from "../../db/auth-guard";
import { Http, freshAddress, signIn, signUp, uniqueEmail, waitForMail } from "../support/http";
import { startReadyServer, type ExtraServer } from "../setup/extra-server";
import { twoSessions } from "./session-support";

describe("the client address", () => {
  const xff = (value: string) => new Headers({ "x-forwarded-for": value });
  it("ignores X-Forwarded-For unless proxies are trusted, then takes the address the outermost one saw", () => {
    expect(clientAddress(xff("198.18.0.1"), 0)).toBeNull();
    expect(clientAddress(xff("198.18.0.1, 10.0.0.2"), 0)).toBeNull();
    expect(clientAddress(xff("198.18.0.1"), 1)).toBe("198.18.0.1");
    // A client that writes its own header in front of the proxy's entry gains nothing.
    expect(clientAddress(xff("1.2.3.4, 198.18.0.1"), 1)).toBe("198.18.0.1");
    expect(clientAddress(xff("1.2.3.4, 198.18.0.1, 10.0.0.2"), 2)).toBe("198.18.0.1");
    expect(clientAddress(xff("198.18.0.1"), 2)).toBeNull();
    expect(clientAddress(new Headers(), 1)).toBeNull();
  });

  it("counts failures per account in a window", () => {
    let now = 0;
    const limit = new FailedSignIns(3, 1000, () => now);
    for (let i = 0; i < 3; i++) {
      expect(limit.blocked("a@example.test")).toBe(false);
      limit.record("a@example.test");
    }
    expect(limit.blocked("a@example.test")).toBe(true);
    expect(limit.blocked("b@example.test")).toBe(false);
    expect(limit.retryAfterSeconds("a@example.test")).toBe(1);
    now = 1000;
    expect(limit.blocked("a@example.test")).toBe(false);
  });
});

describe("a server that trusts no proxy (the default)", () => {
  let server: ExtraServer;
  beforeAll(async () => {
    server = await startReadyServer({});
  });
  afterAll(async () => {
    await server?.stop();
  });

  it("gives a changing X-Forwarded-For no fresh allowance: 429 within the address limit", async () => {
    const email = uniqueEmail("limiter");
    await signUp("Limiter Person", email);
    const statuses: number[] = [];
    for (let i = 0; i < 8; i++) {
      const res = await new Http(server.base, freshAddress()).post("/api/auth/sign-in/email", { email, password: "not-the-password-at-all" });
      statuses.push(res.status);
    }
    expect(statuses.slice(0, 3)).toEqual([401, 401, 401]);
    expect(statuses).toContain(429);
  });
});

describe("failed sign-ins per account", () => {
  it("after ten failures from ten addresses, even the right password is refused for a while", async () => {
    const email = uniqueEmail("per-account");
    await signUp("Per Account", email, "the-right-password");
    for (let i = 0; i < 10; i++) {
      const res = await new Http().post("/api/auth/sign-in/email", { email, password: `wrong-password-${i}` });
      expect(res.status).toBe(401);
    }
    const refused = await new Http().post("/api/auth/sign-in/email", { email, password: "the-right-password" });
    expect(refused.status).toBe(429);
    expect(refused.json).toMatchObject({ error: { code: "rate_limited" } });
    expect(Number(refused.headers.get("retry-after"))).toBeGreaterThan(0);
    // Another account is not affected.
    const other = uniqueEmail("per-account-other");
    await signUp("Other Account", other, "the-right-password");
    expect((await new Http().post("/api/auth/sign-in/email", { email: other, password: "the-right-password" })).status).toBe(200);
  });
});

describe("sessions and a new password", () => {
  it("a password reset ends every session of the account", async () => {
    const { email, here: first, elsewhere: second } = await twoSessions("Reset Revokes", "revoke-reset", "the-first-password");

    const anon = new Http();
    expect((await anon.post("/api/auth/request-password-reset", { email, redirectTo: "/reset-password" })).status).toBe(200);
    const mail = await waitForMail(email, /reset/i);
    const link = new URL(mail.links.find((l) => l.includes("/reset-password"))!);
    const landing = await anon.get(link.pathname + link.search);
    const token = new URL(landing.headers.get("location") ?? "", anon.base).searchParams.get("token");
    expect((await anon.post("/api/auth/reset-password", { newPassword: "the-second-password", token })).status).toBe(200);

    expect((await first.get("/api/v1/me")).status).toBe(401);
    expect((await second.get("/api/v1/me")).status).toBe(401);
    expect((await (await signIn(email, "the-second-password")).get("/api/v1/me")).status).toBe(200);
  });

  it("a password change ends the other sessions, even when the client does not ask", async () => {
    const { here, elsewhere } = await twoSessions("Change Revokes", "revoke-change", "the-first-password");
    const changed = await here.post("/api/auth/change-password", { currentPassword: "the-first-password", newPassword: "the-second-password", revokeOtherSessions: false });
    expect(changed.status).toBe(200);
    expect((await elsewhere.get("/api/v1/me")).status).toBe(401);
    expect((await here.get("/api/v1/me")).status).toBe(200);
  });
});
