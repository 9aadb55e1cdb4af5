// A person's name, a shop's name and a row's name follow one set of rules wherever they are taken: text,
// 1 to 100 characters, one line, no invisible text-direction characters. Anything else answers 4xx in the
// one error shape and stores nothing.
import { describe, expect, it } from "vitest";
import { Http, signUp, testDb, uniqueEmail } from "../support/http";
import { kitData } from "./library-fixtures";

const RLO = "\u202E";
const BAD_NAMES: Array<[string, unknown]> = [
  ["an array", ["Ada"]],
  ["an object", { first: "Ada" }],
  ["null", null],
  ["a number", 123],
  ["a boolean", true],
  ["100 000 characters", "x".repeat(100_000)],
  ["101 characters", "y".repeat(101)],
  ["blank", "   "],
  ["a right-to-left override", `Ada ${RLO}gnp.exe`],
  ["a left-to-right isolate", "Ada \u2066Lovelace\u2069"],
  ["a line break", "Ada\nLovelace"],
];

function expectRefused(res: { status: number; json: unknown; text: string }, field = "name") {
  expect(res.status, res.text.slice(0, 300)).toBeGreaterThanOrEqual(400);
  expect(res.status, res.text.slice(0, 300)).toBeLessThan(500);
  expect(res.json).toMatchObject({ error: { code: expect.any(String), message: expect.any(String) } });
  if (res.status === 400) expect(Object.keys((res.json as { error: { fields?: object } }).error.fields ?? {})).toContain(field);
}

async function storedName(email: string): Promise<string | null> {
  const db = testDb();
  try {
    const r = await db.execute({ sql: "select name from user where email = ?", args: [email] });
    return (r.rows[0]?.name as string | undefined) ?? null;
  } finally {
    db.close();
  }
}

describe("a person's name", () => {
  it.each(BAD_NAMES)("update-user refuses %s and keeps the name", async (_what, name) => {
    const email = uniqueEmail("name-update");
    const http = await signUp("Kept Name", email);
    expectRefused(await http.post("/api/auth/update-user", { name }));
    expect(await storedName(email)).toBe("Kept Name");
  });

  it.each(BAD_NAMES)("sign-up refuses %s and makes no account", async (_what, name) => {
    const email = uniqueEmail("name-signup");
    expectRefused(await new Http().post("/api/auth/sign-up/email", { name, email, password: "a-long-test-password" }));
    expect(await storedName(email)).toBeNull();
  });

  it("update-user takes a good name, trimmed, and only the name", async () => {
    const email = uniqueEmail("name-good");
    const http = await signUp("First Name", email);
    expect((await http.post("/api/auth/update-user", { name: "  Second Name  " })).status).toBe(200);
    expect(await storedName(email)).toBe("Second Name");
    expectRefused(await http.post("/api/auth/update-user", { name: "Third Name", image: "http://evil.test/x.png" }), "(body)");
    expect(await storedName(email)).toBe("Second Name");
  });
});

describe("a shop's and a row's name", () => {
  it("refuses text-direction characters in a new shop, a renamed shop and a kit", async () => {
    const http = await signUp("Bidi Owner", uniqueEmail("bidi"));
    expectRefused(await http.post("/api/v1/shops", { name: `Shop ${RLO}pohs` }));
    expectRefused(await http.post("/api/auth/organization/create", { name: `Shop ${RLO}pohs`, slug: `bidi-${Date.now()}` }));
    const { me } = (await http.get("/api/v1/me")).json as { me: { shopId: string } };
    expectRefused(await http.post("/api/auth/organization/update", { organizationId: me.shopId, data: { name: `Shop ${RLO}pohs` } }), "data.name");
    expectRefused(await http.post("/api/v1/kits", { name: `Kit ${RLO}47`, data: kitData(47, 53.92) }));
    expect((await http.post("/api/v1/kits", { name: "Kit 47", data: kitData(47, 53.92) })).status).toBe(201);
  });
});
