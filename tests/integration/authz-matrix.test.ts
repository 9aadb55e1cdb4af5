// Who may call what: every route under app/api × every kind of caller × a row of their own shop and a row
// of another shop. A route that exists under app/api but is missing here fails the last test.
import { readFileSync, readdirSync, statSync } from "node:fs";
import { join, relative, sep } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { DEMO, Http, signIn } from "../support/http";
import { caseData, freshShopOwner, kitData, newCase, newKit, newRig, ok, rigData, type Row } from "./library-fixtures";

type Actor = "owner" | "builder" | "customer" | "stranger" | "anonymous";
type Side = "own" | "other" | "none";
type Entity = "cases" | "kits" | "rigs" | "studies";
const ACTORS: Actor[] = ["owner", "builder", "customer", "stranger", "anonymous"];

/** What one actor's own shop holds, for bodies that must refer to it. */
type Shop = { http: Http; caseId: string; kitId: string };
type Ctx = { actor: Actor; shop: Shop; http: Http };
type Expected = Record<Actor, number>;
type RouteCase = {
  method: "GET" | "POST" | "PATCH" | "DELETE";
  path: string;
  /** A row the path's {id} names: the actor's own shop's and another shop's are both tried. */
  entity?: Entity;
  /**
   * For rows of other domains: makes a row in the given shop (through that shop's owner, `shop.http`) and
   * returns the path's parameters ({ id, photoId, … }). Both sides are tried, as for `entity`.
   */
  row?: (shop: Shop) => Promise<Record<string, string>>;
  /** Whether the call changes the row, so every cell gets a row of its own. */
  mutates?: boolean;
  query?: string;
  body?: (ctx: Ctx) => unknown | Promise<unknown>;
  own: Expected;
  other?: Expected;
  /** A route the matrix lists but does not call, and why. */
  skip?: string;
};

// Expected statuses by role, for a row of the caller's own shop and for another shop's row. A new route
// under app/api gets its row here (the last test fails until it has one).
const staff = (ok: number): Expected => ({ owner: ok, builder: ok, customer: 403, stranger: ok, anonymous: 401 });
const staffOther: Expected = { owner: 404, builder: 404, customer: 403, stranger: 404, anonymous: 401 };
const ownerOnly = (ok: number): Expected => ({ owner: ok, builder: 403, customer: 403, stranger: ok, anonymous: 401 });
const member = (ok: number): Expected => ({ owner: ok, builder: ok, customer: ok, stranger: ok, anonymous: 401 });
const anyone = (ok: number): Expected => ({ owner: ok, builder: ok, customer: ok, stranger: ok, anonymous: ok });

let seq = 0;
const label = (what: string) => `Matrix ${what} ${Date.now().toString(36)}-${seq++}`;

const CREATE: Record<Exclude<Entity, "studies">, () => unknown> = {
  cases: () => ({ name: label("case"), data: caseData() }),
  kits: () => ({ name: label("kit"), data: kitData(47, 53.92) }),
  rigs: () => ({ name: label("rig"), data: rigData() }),
};

const studyFile = () => ({
  name: label("study file"),
  case: { name: label("file case"), ...caseData() },
  kits: [{ id: "k1", name: label("file kit"), ...kitData(47, 53.92) }],
});

function library(e: Exclude<Entity, "studies">): RouteCase[] {
  const base = `/api/v1/${e}`;
  return [
    { method: "GET", path: base, own: staff(200) },
    { method: "POST", path: base, body: CREATE[e], own: staff(201) },
    { method: "GET", path: `${base}/{id}`, entity: e, own: staff(200), other: staffOther },
    { method: "PATCH", path: `${base}/{id}`, entity: e, mutates: true, body: () => ({ version: 1, name: label("renamed") }), own: staff(200), other: staffOther },
    { method: "DELETE", path: `${base}/{id}`, entity: e, mutates: true, own: staff(204), other: staffOther },
    { method: "POST", path: `${base}/{id}/archive`, entity: e, mutates: true, own: staff(200), other: staffOther },
    { method: "POST", path: `${base}/{id}/restore`, entity: e, mutates: true, own: staff(200), other: staffOther },
  ];
}

const MATRIX: RouteCase[] = [
  ...library("cases"),
  ...library("kits"),
  ...library("rigs"),
  { method: "GET", path: "/api/v1/studies", own: staff(200) },
  { method: "POST", path: "/api/v1/studies", body: ({ shop }) => ({ name: label("study"), caseId: shop.caseId, kitIds: [shop.kitId] }), own: staff(201) },
  { method: "GET", path: "/api/v1/studies/{id}", entity: "studies", own: staff(200), other: staffOther },
  { method: "PATCH", path: "/api/v1/studies/{id}", entity: "studies", mutates: true, body: () => ({ version: 1, name: label("renamed study") }), own: staff(200), other: staffOther },
  { method: "POST", path: "/api/v1/studies/{id}/archive", entity: "studies", mutates: true, own: staff(200), other: staffOther },
  { method: "POST", path: "/api/v1/studies/{id}/restore", entity: "studies", mutates: true, own: staff(200), other: staffOther },
  { method: "POST", path: "/api/v1/studies/{id}/duplicate", entity: "studies", own: staff(201), other: staffOther },
  { method: "GET", path: "/api/v1/studies/{id}/results", entity: "studies", own: staff(200), other: staffOther },
  { method: "GET", path: "/api/v1/studies/{id}/history", entity: "studies", own: staff(200), other: staffOther },
  { method: "GET", path: "/api/v1/studies/{id}/export", entity: "studies", own: staff(200), other: staffOther },
  { method: "POST", path: "/api/v1/studies/import", body: studyFile, own: staff(201) },
  { method: "GET", path: "/api/v1/library/template", query: "?kind=cases", own: staff(200) },
  { method: "GET", path: "/api/v1/library/export", query: "?kind=kits", own: staff(200) },
  { method: "POST", path: "/api/v1/library/import", query: "?kind=kits", body: () => ({ csv: "name,bore_mm\n", confirm: false }), own: staff(200) },
  { method: "GET", path: "/api/v1/settings", own: staff(200) },
  {
    method: "PATCH",
    path: "/api/v1/settings",
    body: async ({ http }) => {
      const r = await http.get("/api/v1/settings");
      return { version: r.status === 200 ? (r.json as { version: number }).version : 1, units: "mm" };
    },
    own: ownerOnly(200),
  },
  { method: "POST", path: "/api/v1/fit", body: studyFile, own: member(200) },
  { method: "GET", path: "/api/v1/openapi.json", own: anyone(200) },
  { method: "GET", path: "/api/v1/me", own: member(200) },
  { method: "POST", path: "/api/v1/me", body: () => ({ units: "mm" }), own: member(200) },
  { method: "GET", path: "/api/v1/shops", own: member(200) },
  { method: "POST", path: "/api/v1/shops", body: () => ({ name: label("shop") }), own: member(201) },
  { method: "GET", path: "/api/auth/{...all}", own: anyone(200), skip: "the sign-in library's own endpoints, covered by the sign-in tests" },
  { method: "POST", path: "/api/auth/{...all}", own: anyone(200), skip: "the sign-in library's own endpoints, covered by the sign-in tests" },
];

let clients: Record<Actor, Http>;
let shopA: Shop;
let shopB: Shop;

async function shopOf(http: Http): Promise<Shop> {
  const c = await newCase(http);
  const k = await newKit(http);
  return { http, caseId: c.id, kitId: k.id };
}

/** A row of an entity in the shop that `shop.http` owns. */
async function makeRow(shop: Shop, e: Entity): Promise<Row> {
  if (e === "cases") return newCase(shop.http);
  if (e === "kits") return newKit(shop.http);
  if (e === "rigs") return newRig(shop.http);
  const res = await shop.http.post("/api/v1/studies", { name: label("matrix study"), caseId: shop.caseId, kitIds: [shop.kitId] });
  return ok<{ item: Row }>(res, 201).item;
}

beforeAll(async () => {
  const [owner, builder, customer, stranger] = await Promise.all([
    signIn(DEMO.owner.email, DEMO.owner.password),
    signIn(DEMO.builder.email, DEMO.builder.password),
    signIn(DEMO.customer.email, DEMO.customer.password),
    freshShopOwner("Matrix Stranger"),
  ]);
  clients = { owner, builder, customer, stranger, anonymous: new Http() };
  [shopA, shopB] = await Promise.all([shopOf(owner), shopOf(stranger)]);
});

/** The actor's own shop, and the other one. */
const shopsFor = (actor: Actor): { own: Shop; other: Shop } => (actor === "stranger" ? { own: shopB, other: shopA } : { own: shopA, other: shopB });

describe("authorization matrix", () => {
  const shared = new Map<string, Row>();
  for (const route of MATRIX.filter((r) => !r.skip)) {
    const sides: Side[] = route.entity || route.row ? ["own", "other"] : ["none"];
    for (const side of sides) {
      const expected = side === "other" ? route.other : route.own;
      it(`${route.method} ${route.path}${side === "none" ? "" : ` on ${side === "own" ? "a row of the caller's shop" : "another shop's row"}`}: ${JSON.stringify(expected)}`, async () => {
        expect(expected, "the matrix gives an expectation for each side").toBeDefined();
        const actual: Partial<Expected> = {};
        for (const actor of ACTORS) {
          const http = clients[actor];
          const shops = shopsFor(actor);
          const rowShop = side === "other" ? shops.other : shops.own;
          let path = route.path;
          if (route.entity) {
            const key = `${route.entity}:${rowShop === shopA ? "A" : "B"}`;
            let row = route.mutates ? undefined : shared.get(key);
            if (!row) row = await makeRow(rowShop, route.entity);
            if (!route.mutates) shared.set(key, row);
            path = path.replace("{id}", row.id);
          } else if (route.row) {
            const params = await route.row(rowShop);
            for (const [k, v] of Object.entries(params)) path = path.replace(`{${k}}`, encodeURIComponent(v));
          }
          const body = route.body ? await route.body({ actor, shop: shops.own, http }) : route.method === "POST" ? {} : undefined;
          const res = await http.send(route.method, path + (route.query ?? ""), body);
          actual[actor] = res.status;
          if (res.status >= 400) {
            expect(res.json, `${actor}: ${res.text.slice(0, 200)}`).toMatchObject({ error: { code: expect.any(String), message: expect.any(String) } });
            // A refusal never tells whether another shop's row exists.
            expect(res.text).not.toMatch(/another shop|other shop/i);
          }
        }
        expect(actual).toEqual(expected);
      });
    }
  }

  it("lists every route that exists under app/api", () => {
    const root = join(process.cwd(), "app", "api");
    const found: string[] = [];
    const walk = (dir: string) => {
      for (const name of readdirSync(dir)) {
        const full = join(dir, name);
        if (statSync(full).isDirectory()) walk(full);
        else if (name === "route.ts") {
          const path = `/api/${relative(root, dir).split(sep).join("/")}`.replace(/\[([^\]]+)\]/g, "{$1}");
          const source = readFileSync(full, "utf8");
          for (const m of source.matchAll(/export\s+(?:const|async\s+function|function)\s+(GET|POST|PUT|PATCH|DELETE)\b/g)) found.push(`${m[1]} ${path}`);
          for (const m of source.matchAll(/export\s+const\s*\{([^}]+)\}/g)) {
            for (const name of m[1].split(",").map((s) => s.trim())) if (/^(GET|POST|PUT|PATCH|DELETE)$/.test(name)) found.push(`${name} ${path}`);
          }
        }
      }
    };
    walk(root);
    const listed = new Set(MATRIX.map((r) => `${r.method} ${r.path}`));
    expect(found.length).toBeGreaterThan(30);
    expect(found.filter((f) => !listed.has(f))).toEqual([]);
    expect([...listed].filter((l) => !found.includes(l))).toEqual([]);
  });
});
