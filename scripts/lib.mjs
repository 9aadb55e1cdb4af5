// Helpers shared by the demo, dev, test and bench runners.
import { spawn, spawnSync } from "node:child_process";
import { randomBytes } from "node:crypto";
import { appendFileSync, existsSync, readFileSync } from "node:fs";
import { createServer } from "node:net";

export const root = new URL("..", import.meta.url).pathname;

/** Makes sure an auth secret exists: from the environment, else generated once into .env.local (git-ignored). */
export function ensureSecret() {
  if (process.env.BETTER_AUTH_SECRET) return;
  const envFile = `${root}.env.local`;
  const current = existsSync(envFile) ? readFileSync(envFile, "utf8") : "";
  const found = current.match(/^BETTER_AUTH_SECRET=(.+)$/m);
  if (found) {
    process.env.BETTER_AUTH_SECRET = found[1].trim();
    return;
  }
  const secret = randomBytes(32).toString("base64url");
  appendFileSync(envFile, `${current && !current.endsWith("\n") ? "\n" : ""}BETTER_AUTH_SECRET=${secret}\n`);
  process.env.BETTER_AUTH_SECRET = secret;
  console.log("generated an auth secret into .env.local");
}

/** Runs a command to completion with inherited output; exits the process when it fails. */
export function run(cmd, args, env = {}) {
  const result = spawnSync(cmd, args, { cwd: root, stdio: "inherit", env: { ...process.env, NEXT_TELEMETRY_DISABLED: "1", ...env } });
  if (result.status !== 0) {
    console.error(`\n${cmd} ${args.join(" ")} failed (exit ${result.status ?? result.signal})`);
    process.exit(result.status || 1);
  }
}

/** A free TCP port on 127.0.0.1. */
export function freePort() {
  return new Promise((resolve, reject) => {
    const srv = createServer();
    srv.once("error", reject);
    srv.listen(0, "127.0.0.1", () => {
      const { port } = srv.address();
      srv.close(() => resolve(port));
    });
  });
}

/** Waits until a URL answers (any status), or fails after the timeout. */
export async function waitFor(url, timeoutMs = 60_000, child) {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    if (child && child.exitCode !== null) throw new Error(`the server exited (code ${child.exitCode}) before ${url} answered`);
    try {
      await fetch(url, { redirect: "manual" });
      return;
    } catch {
      await new Promise((r) => setTimeout(r, 200));
    }
  }
  throw new Error(`${url} did not answer within ${timeoutMs} ms`);
}

/** Starts the built app with `next start` as one process (so it can be stopped by its PID). */
export function startNext({ port, host = "127.0.0.1", env = {}, quiet = false }) {
  const child = spawn(process.execPath, ["node_modules/next/dist/bin/next", "start", "-p", String(port), "-H", host], {
    cwd: root,
    env: { ...process.env, NEXT_TELEMETRY_DISABLED: "1", NODE_ENV: "production", ...env },
    stdio: quiet ? ["ignore", "pipe", "pipe"] : "inherit",
  });
  if (quiet) {
    let log = "";
    const keep = (chunk) => {
      log = (log + chunk.toString()).slice(-20_000);
    };
    child.stdout.on("data", keep);
    child.stderr.on("data", keep);
    child.log = () => log;
  }
  return child;
}

/** Whether the production build is missing or older than the sources it was made from. */
export function buildIsStale() {
  const id = `${root}${process.env.NEXT_DIST_DIR || ".next"}/BUILD_ID`;
  if (!existsSync(id)) return true;
  const result = spawnSync("find", ["app", "db", "geometry", "scene", "public", "next.config.ts", "package.json", "-newer", id, "-type", "f", "-print", "-quit"], {
    cwd: root,
    encoding: "utf8",
  });
  return Boolean(result.stdout.trim());
}
