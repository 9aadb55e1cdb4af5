import "server-only";

// Two guards in front of the sign-in library: which client address its limiter counts a request against,
// and a limit on failed sign-ins per account that no change of address gets around.

/** The header the sign-in limiter reads; the auth route sets it and drops any value a client sent. */
export const CLIENT_ADDRESS_HEADER = "x-borewright-client-address";

/**
 * How many proxies in front of the app append to X-Forwarded-For and are trusted to (TRUSTED_PROXY_HOPS,
 * 0 by default). With 0 the header is ignored: anyone can write it, so the limiter counts every request
 * alike. With N, the client is the N-th address from the right, the one the outermost trusted proxy saw.
 */
export function trustedProxyHops(env: NodeJS.ProcessEnv = process.env): number {
  const hops = Number(env.TRUSTED_PROXY_HOPS ?? "0");
  return Number.isInteger(hops) && hops > 0 && hops <= 10 ? hops : 0;
}

/** The client address the trusted proxies report, or null when none is trusted (or the chain is too short). */
export function clientAddress(headers: Headers, hops = trustedProxyHops()): string | null {
  if (hops === 0) return null;
  const chain = (headers.get("x-forwarded-for") ?? "")
    .split(",")
    .map((s) => s.trim())
    .filter(Boolean);
  if (chain.length < hops) return null;
  return chain[chain.length - hops] ?? null;
}

/** Failed sign-ins per account: after `max` within `windowMs`, the account refuses sign-in until the window passes. */
export class FailedSignIns {
  private readonly failures = new Map<string, { count: number; since: number }>();
  constructor(
    readonly max = 10,
    readonly windowMs = 15 * 60 * 1000,
    private readonly now: () => number = Date.now,
  ) {}

  private current(email: string) {
    const entry = this.failures.get(email);
    if (entry && this.now() - entry.since >= this.windowMs) {
      this.failures.delete(email);
      return undefined;
    }
    return entry;
  }

  blocked(email: string): boolean {
    return (this.current(email)?.count ?? 0) >= this.max;
  }

  retryAfterSeconds(email: string): number {
    const entry = this.current(email);
    return entry ? Math.max(1, Math.ceil((entry.since + this.windowMs - this.now()) / 1000)) : 0;
  }

  record(email: string): void {
    const entry = this.current(email);
    if (entry) entry.count++;
    else this.failures.set(email, { count: 1, since: this.now() });
    if (this.failures.size > 100_000) {
      for (const key of this.failures.keys()) {
        this.current(key);
        if (this.failures.size <= 90_000) break;
      }
      if (this.failures.size > 100_000) this.failures.delete(this.failures.keys().next().value as string);
    }
  }

  clear(email: string): void {
    this.failures.delete(email);
  }
}

/** The limit of this server process: ten failed sign-ins per account in a quarter of an hour. */
export const failedSignIns = new FailedSignIns();

/**
 * Signed session cookies this process has seen the sign-in library accept, each with the session token it
 * carries, so that a later request with the very same cookie skips the signature check and the library's
 * machinery. An entry proves only that the cookie's signature was good: the session row is still read on
 * every request, so a session ended anywhere (sign-out, revocation, a password reset or change, another
 * server process) ends at once. Bounded in size; the least recently used entry leaves first.
 */
export class VerifiedCookies {
  private readonly tokens = new Map<string, string>();
  constructor(readonly max = 10_000) {}

  get size(): number {
    return this.tokens.size;
  }

  /** The session token a cookie value was seen to carry, or undefined. */
  tokenOf(cookie: string): string | undefined {
    const token = this.tokens.get(cookie);
    if (token !== undefined) {
      this.tokens.delete(cookie);
      this.tokens.set(cookie, token);
    }
    return token;
  }

  /** Keeps a cookie value the library accepted, when it is the token's signed form (`token.signature`). */
  remember(cookie: string, token: string): void {
    if (!signedFormOf(cookie, token)) return;
    this.tokens.delete(cookie);
    this.tokens.set(cookie, token);
    if (this.tokens.size > this.max) this.tokens.delete(this.tokens.keys().next().value as string);
  }

  forget(cookie: string): void {
    this.tokens.delete(cookie);
  }
}

function signedFormOf(cookie: string, token: string): boolean {
  try {
    const value = decodeURIComponent(cookie);
    return token.length > 0 && value.startsWith(`${token}.`) && value.length > token.length + 1;
  } catch (error) {
    // A cookie that is not valid percent-encoding is not a signed form of any token; anything else is a defect.
    if (error instanceof URIError) return false;
    throw error;
  }
}

/** The raw value of the named cookie in a Cookie header, or null when it is absent. */
export function cookieValue(header: string | null, name: string): string | null {
  if (!header) return null;
  for (const part of header.split(";")) {
    const at = part.indexOf("=");
    if (at > 0 && part.slice(0, at).trim() === name) return part.slice(at + 1).trim();
  }
  return null;
}

/** Whether a session expiring at `expiresAt` is due for the library's refresh (older than `updateAgeS`). */
export function refreshDue(expiresAt: Date, expiresInS: number, updateAgeS: number, now = Date.now()): boolean {
  return expiresAt.getTime() - expiresInS * 1000 + updateAgeS * 1000 <= now;
}
