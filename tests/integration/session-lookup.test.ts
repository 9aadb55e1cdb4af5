// The session lookup on every request: a cookie the server has already verified is answered from the
// session row, so a session ended by sign-out, by revoking it from another device, or by deleting its row
// (as another server process would) is refused on the very next request; the membership read with it
// follows a role lowered, a shop switched or a membership ended on the very next request too. Also: the benchmark's framework
// floor does not exist on a server started without its flag, and the studies list reads its page, kits
// and total in one statement, past the last page included.
import { describe, expect, it } from "vitest";
import { Http, signUp, testDb, uniqueEmail } from "../support/http";
import { freshShopOwner, newStudy, ok } from "./library-fixtures";
import { twoSessions } from "./session-support";

/** A client holding a copy of another's cookies, as a stolen or kept cookie would be. */
function copyOf(http: Http): Http {
  const copy = new Http(http.base, http.address);
  for (const [k, v] of http.cookies) copy.cookies.set(k, v);
  return copy;
}

describe("a verified session cookie", () => {
  it("is refused at once after sign-out", async () => {
    const http = await signUp("Signs Out", uniqueEmail("lookup-out"));
    expect((await http.get("/api/v1/me")).status).toBe(200);
    expect((await http.get("/api/v1/me")).status).toBe(200);
    const kept = copyOf(http);
    expect((await http.post("/api/auth/sign-out", {})).status).toBe(200);
    const after = await kept.get("/api/v1/me");
    expect(after.status).toBe(401);
    expect(after.json).toMatchObject({ error: { code: "unauthenticated" } });
    expect((await kept.get("/api/v1/studies")).status).toBe(401);
  });

  it("is refused at once when another session of the account revokes it", async () => {
    const { here, elsewhere } = await twoSessions("Revokes Others", "lookup-revoke", "the-only-password");
    // A second request: the cookie is now one the server has verified.
    expect((await elsewhere.get("/api/v1/me")).status).toBe(200);
    expect((await here.post("/api/auth/revoke-other-sessions", {})).status).toBe(200);
    expect((await elsewhere.get("/api/v1/me")).status).toBe(401);
    expect((await here.get("/api/v1/me")).status).toBe(200);
  });

  it("is refused at once when its session row is deleted behind the server's back", async () => {
    const email = uniqueEmail("lookup-row");
    const http = await signUp("Row Deleted", email);
    expect((await http.get("/api/v1/me")).status).toBe(200);
    expect((await http.get("/api/v1/me")).status).toBe(200);
    const db = testDb();
    try {
      await db.execute({ sql: `delete from session where user_id = (select id from user where email = ?)`, args: [email] });
    } finally {
      db.close();
    }
    expect((await http.get("/api/v1/me")).status).toBe(401);
  });

  it("with a forged signature is refused, even for a token the server knows", async () => {
    const http = await signUp("Forged Signature", uniqueEmail("lookup-forged"));
    expect((await http.get("/api/v1/me")).status).toBe(200);
    const forged = copyOf(http);
    const name = [...forged.cookies.keys()].find((k) => k.endsWith("session_token"));
    expect(name).toBeDefined();
    const [token] = decodeURIComponent(forged.cookies.get(name!)!).split(".");
    forged.cookies.set(name!, encodeURIComponent(`${token}.${"A".repeat(43)}=`));
    expect((await forged.get("/api/v1/me")).status).toBe(401);
    expect((await http.get("/api/v1/me")).status).toBe(200);
  });
});

/** Runs statements against the server's database behind its back, as another server process would. */
async function behindTheServer(statements: { sql: string; args: string[] }[]): Promise<void> {
  const db = testDb();
  try {
    for (const statement of statements) await db.execute(statement);
  } finally {
    db.close();
  }
}

type Me = { me: { shopId: string; shopName: string; role: string } };

describe("the membership read with a verified session cookie", () => {
  it("follows a role lowered behind the server's back on the very next request", async () => {
    const email = uniqueEmail("lookup-role");
    const http = await signUp("Role Lowered", email);
    expect((await http.get("/api/v1/studies")).status).toBe(200);
    expect((await http.get("/api/v1/studies")).status).toBe(200);
    await behindTheServer([{ sql: "update member set role = 'customer' where user_id = (select id from user where email = ?)", args: [email] }]);
    const refused = await http.get("/api/v1/studies");
    expect(refused.status).toBe(403);
    expect(refused.json).toMatchObject({ error: { code: "forbidden" } });
    expect(ok<Me>(await http.get("/api/v1/me")).me.role).toBe("customer");
  });

  it("acts in the active shop while the person belongs to it, in their first shop once they leave it, and in none after", async () => {
    const email = uniqueEmail("lookup-shops");
    const http = await signUp("Two Shops", email);
    const first = ok<Me>(await http.get("/api/v1/me")).me;
    expect(first.role).toBe("owner");
    const second = { id: `lookup-shop-${first.shopId}`, name: `Second shop of ${email}` };
    await behindTheServer([
      { sql: "insert into organization (id, name, slug) values (?, ?, ?)", args: [second.id, second.name, second.id] },
      { sql: "insert into member (id, organization_id, user_id, role) values (?, ?, (select id from user where email = ?), 'builder')", args: [`${second.id}-m`, second.id, email] },
      { sql: "update session set active_organization_id = ? where user_id = (select id from user where email = ?)", args: [second.id, email] },
    ]);
    expect(ok<Me>(await http.get("/api/v1/me")).me).toMatchObject({ shopId: second.id, shopName: second.name, role: "builder" });
    await behindTheServer([{ sql: "delete from member where id = ?", args: [`${second.id}-m`] }]);
    expect(ok<Me>(await http.get("/api/v1/me")).me).toMatchObject({ shopId: first.shopId, role: "owner" });
    await behindTheServer([{ sql: "delete from member where user_id = (select id from user where email = ?)", args: [email] }]);
    expect((await http.get("/api/v1/studies")).status).toBe(401);
    expect((await http.get("/api/v1/me")).status).toBe(401);
  });
});

describe("the benchmark's framework floor", () => {
  it("does not exist on a server started without its flag", async () => {
    for (const path of ["/bench-floor/results", "/bench-floor/list", "/bench-floor/anything"]) {
      const res = await new Http().get(path);
      expect(res.status).toBe(404);
    }
  });
});

describe("the studies list", () => {
  it("gives each study its kits in order and the shop's total, on every page and past the last", async () => {
    const owner = await freshShopOwner("List Reader");
    const a = await newStudy(owner);
    const b = await newStudy(owner);
    type Page = { items: { id: string; kitIds: string[]; caseName: string }[]; page: number; pageSize: number; total: number };
    const pages = [1, 2].map(async (page) => ok<Page>(await owner.get(`/api/v1/studies?pageSize=1&page=${page}&sort=name`)));
    const [first, second] = await Promise.all(pages);
    expect([first.total, second.total]).toEqual([2, 2]);
    expect([first.items.length, second.items.length]).toEqual([1, 1]);
    const byId = new Map([...first.items, ...second.items].map((s) => [s.id, s]));
    for (const made of [a, b]) {
      expect(byId.get(made.study.id)?.kitIds).toEqual(made.kits.map((k) => k.id));
      expect(byId.get(made.study.id)?.caseName).toBe(made.caseRow.name);
    }
    const past = ok<Page>(await owner.get("/api/v1/studies?pageSize=1&page=3"));
    expect(past).toMatchObject({ items: [], page: 3, total: 2 });
  });
});
