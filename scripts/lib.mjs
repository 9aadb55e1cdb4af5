// Helpers shared by the demo, dev, test and bench runners.
import { spawn, spawnSync } from "node:child_process";
import { randomBytes } from "node:crypto";
import { appendFileSync, existsSync, readFileSync } from "node:fs";
import { createServer } from "node:net";

export const root = new URL("..", import.meta.url).pathname;

/** The secrets every install has of its own, and how a fresh one is made. */
const SECRETS = {
  BETTER_AUTH_SECRET: () => randomBytes(32).toString("base64url"),
  STRIPE_SECRET_KEY: () => `sk_test_${randomBytes(24).toString("hex")}`,
  STRIPE_WEBHOOK_SECRET: () => `whsec_${randomBytes(24).toString("hex")}`,
};

/**
 * Makes sure the auth secret and the local payment fake's key and webhook secret exist: from the
 * environment, else from .env.local (git-ignored), else generated once into it. `envFile` is for tests.
 */
export function ensureSecrets(envFile = `${root}.env.local`) {
  const current = existsSync(envFile) ? readFileSync(envFile, "utf8") : "";
  const added = [];
  for (const [name, make] of Object.entries(SECRETS)) {
    if (process.env[name]) continue;
    const found = current.match(new RegExp(`^${name}=(.+)$`, "m"));
    if (found) {
      process.env[name] = found[1].trim();
      continue;
    }
    process.env[name] = make();
    added.push(`${name}=${process.env[name]}`);
  }
  if (added.length) {
    appendFileSync(envFile, `${current && !current.endsWith("\n") ? "\n" : ""}${added.join("\n")}\n`);
    console.log(`generated ${added.map((a) => a.split("=")[0]).join(", ")} into ${envFile.replace(root, "")}`);
  }
}

/** Kept for older scripts: the secrets, the auth secret among them. */
export const ensureSecret = () => ensureSecrets();

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

/** Ends every child still running (SIGTERM) and resolves once each has exited. */
export function stopProcesses(children) {
  return Promise.all(
    children
      .filter((c) => c.exitCode === null)
      .map(
        (c) =>
          new Promise((resolve) => {
            c.once("exit", () => resolve());
            c.kill("SIGTERM");
          }),
      ),
  );
}
