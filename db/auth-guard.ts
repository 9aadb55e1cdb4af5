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
