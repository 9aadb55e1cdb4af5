// A second app server beside the test server, for the checks that need a setting of their own (a
// production refusal, the limiter without trusted proxies). Same build, same database; its own port.
import { randomBytes } from "node:crypto";
import { inject } from "vitest";
import { freePort, startNext, waitFor } from "../../scripts/lib.mjs";

export type ExtraServer = { base: string; exited: Promise<number | null>; log: () => string; stop: () => Promise<void> };

/** Fresh secrets of this server only, so a test can replace one of them. */
export function freshSecrets(): Record<string, string> {
  return {
    BETTER_AUTH_SECRET: randomBytes(32).toString("base64url"),
    STRIPE_SECRET_KEY: `sk_test_${randomBytes(24).toString("hex")}`,
    STRIPE_WEBHOOK_SECRET: `whsec_${randomBytes(24).toString("hex")}`,
  };
}

/** Starts `next start` with the test server's database and the given environment on top; does not wait for it. */
export async function startExtraServer(env: Record<string, string>): Promise<ExtraServer> {
  const port = await freePort();
  const base = `http://127.0.0.1:${port}`;
  const child = startNext({
    port,
    quiet: true,
    env: { DATABASE_URL: inject("databaseURL"), BETTER_AUTH_URL: base, TRUSTED_PROXY_HOPS: "0", ...freshSecrets(), ...env },
  }) as ReturnType<typeof startNext> & { log: () => string };
  const exited = new Promise<number | null>((resolve) => child.once("exit", (code) => resolve(code)));
  return {
    base,
    exited,
    log: () => child.log(),
    stop: async () => {
      if (child.exitCode === null && child.signalCode === null) {
        child.kill("SIGTERM");
        await exited;
      }
    },
  };
}

/** Starts an extra server and waits until it answers. */
export async function startReadyServer(env: Record<string, string>): Promise<ExtraServer> {
  const server = await startExtraServer(env);
  try {
    await waitFor(`${server.base}/sign-in`, 60_000);
  } catch (error) {
    await server.stop();
    throw new Error(`${error instanceof Error ? error.message : error}\n${server.log()}`);
  }
  return server;
}
