// A tiny HTTP client for the tests: a cookie jar, JSON in and out, and its own client address,
// so the sign-in limiter counts each test's attempts apart.
import { createClient } from "@libsql/client";
import { inject } from "vitest";

let nextAddress = 1;
/** A fresh client address from the documentation range, one per simulated person. */
export function freshAddress(): string {
  const n = nextAddress++ + Math.floor(Math.random() * 60_000);
  return `198.18.${(n >> 8) & 255}.${n & 255}`;
}

export type Reply = { status: number; json: unknown; text: string; headers: Headers };

export class Http {
  readonly cookies = new Map<string, string>();
  constructor(
    readonly base: string = inject("baseURL"),
    readonly address: string = freshAddress(),
  ) {}

  async send(method: string, path: string, body?: unknown, extra: Record<string, string> = {}): Promise<Reply> {
    const headers: Record<string, string> = { origin: this.base, "x-forwarded-for": this.address, ...extra };
    if (this.cookies.size) headers.cookie = [...this.cookies].map(([k, v]) => `${k}=${v}`).join("; ");
    let payload: string | undefined;
    if (body !== undefined) {
      headers["content-type"] ??= "application/json";
      payload = typeof body === "string" ? body : JSON.stringify(body);
    }
    const res = await fetch(this.base + path, { method, headers, body: payload, redirect: "manual" });
    for (const c of res.headers.getSetCookie()) {
      const [pair] = c.split(";");
      const i = pair.indexOf("=");
      const name = pair.slice(0, i);
      const value = pair.slice(i + 1);
      if (/max-age=0/i.test(c) || value === "") this.cookies.delete(name);
      else this.cookies.set(name, value);
    }
    const text = await res.text();
    let json: unknown = null;
    try {
      json = JSON.parse(text);
    } catch {
      json = null;
    }
    return { status: res.status, json, text, headers: res.headers };
  }
  get = (path: string, extra?: Record<string, string>) => this.send("GET", path, undefined, extra);
  post = (path: string, body: unknown = {}, extra?: Record<string, string>) => this.send("POST", path, body, extra);
}

let unique = 0;
/** An e-mail address no other test uses. */
export function uniqueEmail(tag: string): string {
  return `${tag}-${Date.now().toString(36)}-${unique++}@example.test`;
}

/** Signs a new person up and returns their signed-in client. */
export async function signUp(name: string, email: string, password = "a-long-test-password"): Promise<Http> {
  const http = new Http();
  const res = await http.post("/api/auth/sign-up/email", { name, email, password });
  if (res.status !== 200) throw new Error(`sign-up of ${email} answered ${res.status}: ${res.text}`);
  return http;
}

/** Signs an existing person in. */
export async function signIn(email: string, password: string): Promise<Http> {
  const http = new Http();
  const res = await http.post("/api/auth/sign-in/email", { email, password });
  if (res.status !== 200) throw new Error(`sign-in of ${email} answered ${res.status}: ${res.text}`);
  return http;
}

export const DEMO = {
  owner: { email: "owner@quillfern.test", password: "quillfern-owner-26" },
  builder: { email: "builder@quillfern.test", password: "quillfern-builder-26" },
  customer: { email: "customer@quillfern.test", password: "quillfern-customer-26" },
} as const;

type Mail = { id: string; to: string[]; subject: string; text: string; links: string[] };

/** Waits for a message to an address whose subject matches, and returns it. */
export async function waitForMail(to: string, subject: RegExp, timeoutMs = 10_000): Promise<Mail> {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    const res = await fetch(`${inject("mailURL")}/messages?to=${encodeURIComponent(to)}`);
    const { messages } = (await res.json()) as { messages: Mail[] };
    const found = messages.find((m) => subject.test(m.subject));
    if (found) return found;
    await new Promise((r) => setTimeout(r, 150));
  }
  throw new Error(`no mail to ${to} matching ${subject} within ${timeoutMs} ms`);
}

/** Follows the address-confirmation link mailed at sign-up, as the person (their cookies) would. */
export async function confirmEmail(http: Http, email: string): Promise<void> {
  const mail = await waitForMail(email, /confirm/i);
  const link = mail.links.find((l) => l.includes("/verify-email"));
  if (!link) throw new Error(`the confirmation mail to ${email} carries no link`);
  const url = new URL(link);
  const res = await http.get(url.pathname + url.search);
  if (res.status >= 400) throw new Error(`confirming ${email} answered ${res.status}: ${res.text.slice(0, 200)}`);
}

/** The test server's database, opened beside it (WAL lets both read; a writer waits up to 10 s for the server's). */
export function testDb() {
  return createClient({ url: inject("databaseURL"), timeout: 10_000 });
}

/**
 * Counts the rows of a table that match `where` (column = value), for checks that nothing was half-written.
 * Test files run side by side against one database, so a check counts only rows its own call could have
 * written (its unique title, address or shop), never the whole table.
 */
export async function countRows(table: string, where: Record<string, string>): Promise<number> {
  const columns = Object.keys(where);
  if (columns.length === 0) throw new Error("countRows needs a filter: other test files write to the same tables");
  const db = testDb();
  try {
    const sql = `select count(*) as n from "${table}" where ${columns.map((c) => `"${c}" = ?`).join(" and ")}`;
    const r = await db.execute({ sql, args: columns.map((c) => where[c]) });
    return Number(r.rows[0]?.n ?? 0);
  } finally {
    db.close();
  }
}
