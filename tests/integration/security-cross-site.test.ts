// Another site's page can send a signed-in person's cookies with a form or a simple fetch, but only with
// its own Origin and without a JSON content type: every state-changing API route refuses such a call
// before doing anything. Also: answers are never cached, pages carry the security headers, list pages are
// bounded, and the core's refusals leave as 422.
import { describe, expect, it } from "vitest";
import { countRows, DEMO, Http, signIn } from "../support/http";
import { freshShopOwner, kitData } from "./library-fixtures";

const kitsNamed = (name: string) => countRows("cylinder_kit", { name });

describe("calls from another site", () => {
  const body = (name: string) => JSON.stringify({ name, data: kitData(47, 53.92) });

  it.each([
    ["another Origin with a text/plain body", { origin: "http://evil.test", "content-type": "text/plain" }, 403],
    ["another Origin with a JSON body", { origin: "http://evil.test", "content-type": "application/json" }, 403],
    ["a cross-site fetch without Origin", { origin: "", "sec-fetch-site": "cross-site", "content-type": "application/json" }, 403],
    ["the app's Origin with a text/plain body", { "content-type": "text/plain" }, 415],
    ["the app's Origin with a form body", { "content-type": "application/x-www-form-urlencoded" }, 415],
    ["the app's Origin with a multipart body", { "content-type": "multipart/form-data; boundary=x" }, 415],
  ] as const)("POST /api/v1/kits from %s is refused (%o, %i) and writes nothing", async (_what, headers, status) => {
    const http = await freshShopOwner("Cross Site Owner");
    const name = `Cross-site kit ${Math.random().toString(36).slice(2)}`;
    const extra: Record<string, string> = { ...headers };
    let res;
    if (extra.origin === "") {
      // Without any Origin header: the test client always sends one, so this call goes out by hand.
      delete extra.origin;
      const cookie = [...http.cookies].map(([k, v]) => `${k}=${v}`).join("; ");
      const raw = await fetch(`${http.base}/api/v1/kits`, { method: "POST", headers: { ...extra, cookie }, body: body(name) });
      res = { status: raw.status, text: await raw.text(), json: null as unknown };
      res.json = JSON.parse(res.text) as unknown;
    } else {
      res = await http.send("POST", "/api/v1/kits", body(name), extra);
    }
    expect(res.status, res.text).toBe(status);
    expect(res.json).toMatchObject({ error: { code: expect.any(String), message: expect.any(String) } });
    expect(await kitsNamed(name)).toBe(0);
  });

  it("takes the same call from the app's own page, and from a script that sends no Origin", async () => {
    const http = await freshShopOwner("Same Site Owner");
    const name = `Same-site kit ${Math.random().toString(36).slice(2)}`;
    expect((await http.send("POST", "/api/v1/kits", body(name), { "sec-fetch-site": "same-origin" })).status).toBe(201);
    const scripted = `Scripted kit ${Math.random().toString(36).slice(2)}`;
    const headers: Record<string, string> = { "content-type": "application/json", cookie: [...http.cookies].map(([k, v]) => `${k}=${v}`).join("; ") };
    const res = await fetch(`${http.base}/api/v1/kits`, { method: "POST", headers, body: body(scripted) });
    expect(res.status).toBe(201);
    expect(await kitsNamed(name)).toBe(1);
    expect(await kitsNamed(scripted)).toBe(1);
  });

  it("refuses bodyless actions from another site too (archive)", async () => {
    const http = await freshShopOwner("Archive Owner");
    const created = await http.post("/api/v1/kits", { name: `Archive kit ${Date.now()}`, data: kitData(47, 53.92) });
    const id = (created.json as { item: { id: string } }).item.id;
    const res = await http.send("POST", `/api/v1/kits/${id}/archive`, undefined, { origin: "http://evil.test" });
    expect(res.status).toBe(403);
    expect(((await http.get(`/api/v1/kits/${id}`)).json as { item: { archivedAt: string | null } }).item.archivedAt).toBeNull();
  });

  it("the payment webhook takes any origin (its signature is the check) but still only JSON", async () => {
    const res = await new Http().post("/api/v1/payments/webhook", "{}", { origin: "http://payments.example.test", "stripe-signature": "t=1,v1=00" });
    expect(res.status).toBe(400);
    expect(res.json).toMatchObject({ error: { code: "bad_signature" } });
    const form = await new Http().post("/api/v1/payments/webhook", "a=b", { "content-type": "application/x-www-form-urlencoded" });
    expect(form.status).toBe(415);
  });
});

describe("answers and pages", () => {
  it("no API answer may be cached: success, refusal and the sign-in routes", async () => {
    const owner = await signIn(DEMO.owner.email, DEMO.owner.password);
    for (const res of [
      await owner.get("/api/v1/me"),
      await owner.get("/api/v1/studies"),
      await new Http().get("/api/v1/me"),
      await owner.get("/api/v1/kits/no-such-kit"),
      await owner.get("/api/auth/get-session"),
      await new Http().post("/api/auth/sign-in/email", { email: "nobody@example.test", password: "not-a-password" }),
    ]) {
      expect(res.headers.get("cache-control")).toContain("no-store");
    }
  });

  it("pages carry a content security policy that forbids framing, and the other security headers", async () => {
    const owner = await signIn(DEMO.owner.email, DEMO.owner.password);
    for (const path of ["/sign-in", "/studies", "/library"]) {
      const res = await (path === "/sign-in" ? new Http() : owner).get(path);
      expect(res.status).toBe(200);
      const csp = res.headers.get("content-security-policy") ?? "";
      expect(csp).toContain("frame-ancestors 'none'");
      expect(csp).toContain("default-src 'self'");
      expect(csp).toContain("object-src 'none'");
      expect(csp).not.toContain("unsafe-eval");
      expect(res.headers.get("x-content-type-options")).toBe("nosniff");
      expect(res.headers.get("referrer-policy")).toBe("strict-origin-when-cross-origin");
    }
  });
});

describe("list pages are bounded", () => {
  it.each(["/api/v1/jobs", "/api/v1/studies", "/api/v1/cases", "/api/v1/kits", "/api/v1/rigs"])("%s refuses page=1e15 and pageSize=1000 with 400", async (path) => {
    const owner = await signIn(DEMO.owner.email, DEMO.owner.password);
    for (const query of ["page=1e15", "page=-1", "page=1.5", "pageSize=1000", "pageSize=0"]) {
      const res = await owner.get(`${path}?${query}`);
      expect(res.status, `${path}?${query}: ${res.text.slice(0, 200)}`).toBe(400);
      expect(res.json).toMatchObject({ error: { code: "invalid_input" } });
    }
    expect((await owner.get(`${path}?page=2&pageSize=5`)).status).toBe(200);
  });
});
