// A customer of a shop sees, through the sign-in library's organization endpoints, the shop's name and its
// staff's names at most: never an address of the staff, of another customer or of an invitee, and never
// a member list. Each endpoint is tried as the demo shop's customer.
import { beforeAll, describe, expect, it } from "vitest";
import { DEMO, Http, confirmEmail, signIn, signUp, testDb, uniqueEmail, waitForMail } from "../support/http";

let customer: Http;
let owner: Http;
let builder: Http;
let secrets: string[];
let otherCustomerMemberId: string;
let invitationId: string;

beforeAll(async () => {
  [owner, builder, customer] = await Promise.all([
    signIn(DEMO.owner.email, DEMO.owner.password),
    signIn(DEMO.builder.email, DEMO.builder.password),
    signIn(DEMO.customer.email, DEMO.customer.password),
  ]);
  // A second customer in the demo shop, and a pending invitation to a third address.
  const otherEmail = uniqueEmail("org-other-customer");
  const other = await signUp("Second Customer", otherEmail);
  await confirmEmail(other, otherEmail);
  expect((await owner.post("/api/auth/organization/invite-member", { email: otherEmail, role: "customer" })).status).toBe(200);
  const mail = await waitForMail(otherEmail, /invites you/i);
  const accepted = await other.post("/api/auth/organization/accept-invitation", { invitationId: mail.links.find((l) => l.includes("/invite/"))!.split("/invite/")[1] });
  expect(accepted.status, accepted.text).toBe(200);
  otherCustomerMemberId = (accepted.json as { member: { id: string } }).member.id;
  const inviteeEmail = uniqueEmail("org-invitee");
  const invited = await owner.post("/api/auth/organization/invite-member", { email: inviteeEmail, role: "builder" });
  expect(invited.status).toBe(200);
  invitationId = (invited.json as { id: string }).id;
  secrets = [DEMO.owner.email, DEMO.builder.email, otherEmail, inviteeEmail];
});

type Probe = { method: "GET" | "POST"; path: string | (() => string); body?: () => unknown; outcome: "refused" | "answered" };

const PROBES: Probe[] = [
  { method: "GET", path: "/api/auth/organization/list-members", outcome: "refused" },
  { method: "GET", path: "/api/auth/organization/list-members?organizationId=demo-shop", outcome: "refused" },
  { method: "GET", path: "/api/auth/organization/list-invitations", outcome: "refused" },
  { method: "GET", path: "/api/auth/organization/list-invitations?organizationId=demo-shop", outcome: "refused" },
  { method: "GET", path: "/api/auth/organization/get-full-organization", outcome: "answered" },
  { method: "GET", path: "/api/auth/organization/get-full-organization?organizationId=demo-shop", outcome: "answered" },
  { method: "GET", path: "/api/auth/organization/get-active-member", outcome: "answered" },
  { method: "GET", path: "/api/auth/organization/get-active-member-role", outcome: "answered" },
  { method: "GET", path: "/api/auth/organization/list", outcome: "answered" },
  { method: "GET", path: "/api/auth/organization/list-user-invitations", outcome: "answered" },
  { method: "GET", path: () => `/api/auth/organization/get-invitation?id=${invitationId}`, outcome: "refused" },
  { method: "POST", path: "/api/auth/organization/has-permission", body: () => ({ permissions: { member: ["create"] } }), outcome: "answered" },
  { method: "POST", path: "/api/auth/organization/invite-member", body: () => ({ email: uniqueEmail("org-by-customer"), role: "customer" }), outcome: "refused" },
  { method: "POST", path: "/api/auth/organization/remove-member", body: () => ({ memberIdOrEmail: otherCustomerMemberId }), outcome: "refused" },
  { method: "POST", path: "/api/auth/organization/update-member-role", body: () => ({ memberId: otherCustomerMemberId, role: "owner" }), outcome: "refused" },
  { method: "POST", path: "/api/auth/organization/cancel-invitation", body: () => ({ invitationId }), outcome: "refused" },
  { method: "POST", path: "/api/auth/organization/update", body: () => ({ organizationId: "demo-shop", data: { name: "Taken Over" } }), outcome: "refused" },
  { method: "POST", path: "/api/auth/organization/delete", body: () => ({ organizationId: "demo-shop" }), outcome: "refused" },
];

describe("the organization endpoints, as a customer of the shop", () => {
  it.each(PROBES.map((p) => [`${p.method} ${typeof p.path === "string" ? p.path : p.path().replace(/=.*/, "=…")}`, p] as const))("%s", async (_name, probe) => {
    const path = typeof probe.path === "string" ? probe.path : probe.path();
    const res = await customer.send(probe.method, path, probe.body?.());
    expect(res.status, res.text.slice(0, 300)).toBeLessThan(500);
    if (probe.outcome === "refused") {
      expect(res.status, res.text.slice(0, 300)).toBeGreaterThanOrEqual(400);
      expect(res.json).toMatchObject({ error: { code: expect.any(String), message: expect.any(String) } });
    } else {
      expect(res.status, res.text.slice(0, 300)).toBe(200);
    }
    for (const address of secrets) expect(res.text.toLowerCase()).not.toContain(address.toLowerCase());
  });

  it("the full organization gives the shop's name and its staff's names only", async () => {
    // The staff as the database holds them around the call (other test files may add builders to the demo shop).
    const staffRoles = async () => {
      const db = testDb();
      try {
        const rows = await db.execute("select role from member where organization_id = 'demo-shop' and role <> 'customer'");
        return rows.rows.map((r) => String(r.role)).sort();
      } finally {
        db.close();
      }
    };
    const before = await staffRoles();
    const res = await customer.get("/api/auth/organization/get-full-organization");
    const after = await staffRoles();
    const shop = res.json as { name: string; members: { role: string; user: Record<string, unknown> }[] };
    expect(shop.name).toBe("Quillfern Engine Works");
    expect(before).toContain("owner");
    expect([before, after]).toContainEqual(shop.members.map((m) => m.role).sort());
    for (const m of shop.members) expect(Object.keys(m.user)).toEqual(["name"]);
  });

  it("changed nothing: the shop keeps its name, the other customer and the invitation", async () => {
    const db = testDb();
    try {
      const shop = await db.execute("select name from organization where id = 'demo-shop'");
      expect(shop.rows[0]?.name).toBe("Quillfern Engine Works");
      const member = await db.execute({ sql: "select role from member where id = ?", args: [otherCustomerMemberId] });
      expect(member.rows[0]?.role).toBe("customer");
      const invitation = await db.execute({ sql: "select status from invitation where id = ?", args: [invitationId] });
      expect(invitation.rows[0]?.status).toBe("pending");
    } finally {
      db.close();
    }
  });

  it("staff still see the members (the refusal is the customer's)", async () => {
    const res = await owner.get("/api/auth/organization/list-members");
    expect(res.status).toBe(200);
    expect(res.text).toContain(DEMO.builder.email);
  });
});

describe("roles on the organization endpoints", () => {
  it("a builder removing a member is refused with 403 (signed in, not allowed), and the member stays", async () => {
    const res = await builder.post("/api/auth/organization/remove-member", { memberIdOrEmail: otherCustomerMemberId });
    expect(res.status, res.text).toBe(403);
    expect(res.json).toMatchObject({ error: { code: "forbidden" } });
    const anonymous = await new Http().post("/api/auth/organization/remove-member", { memberIdOrEmail: otherCustomerMemberId });
    expect(anonymous.status).toBe(401);
    const db = testDb();
    try {
      expect((await db.execute({ sql: "select count(*) as n from member where id = ?", args: [otherCustomerMemberId] })).rows[0]?.n).toBe(1);
    } finally {
      db.close();
    }
  });
});
