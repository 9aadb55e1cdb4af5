import { existsSync } from "node:fs";

/** Loads .env.local into process.env for scripts (Next.js loads it by itself); values already set win. */
export function loadLocalEnv(path = ".env.local"): void {
  if (existsSync(path)) process.loadEnvFile(path);
}

/**
 * Secrets that were ever written in this repository (old defaults of the local fakes, the test runner's
 * and the build's placeholders). A server holding one of them signs with a key anyone can read.
 */
export const KNOWN_SECRETS = new Set([
  "whsec_local_demo",
  "sk_test_local_demo",
  "test-secret-for-the-test-server-only-0123456789",
  "build-time-placeholder-secret-0123456789",
  "build-secret-0123456789abcdef0123",
]);

const MIN_AUTH_SECRET_LENGTH = 32;

/**
 * What is wrong with the secrets of a production server (NODE_ENV=production): a missing, known or too
 * short BETTER_AUTH_SECRET, and a missing or known payment key and webhook secret (unless PAYMENTS=off).
 * Empty when all hold, and always empty outside production.
 */
export function productionSecretProblems(env: NodeJS.ProcessEnv = process.env): string[] {
  if (env.NODE_ENV !== "production") return [];
  const problems: string[] = [];
  const check = (name: string, minLength = 1) => {
    const value = env[name]?.trim();
    if (!value) problems.push(`${name} is not set.`);
    else if (KNOWN_SECRETS.has(value)) problems.push(`${name} is a value published in the source code; set a secret of your own.`);
    else if (value.length < minLength) problems.push(`${name} is shorter than ${minLength} characters.`);
  };
  check("BETTER_AUTH_SECRET", MIN_AUTH_SECRET_LENGTH);
  if (env.PAYMENTS !== "off") {
    check("STRIPE_SECRET_KEY");
    check("STRIPE_WEBHOOK_SECRET");
  }
  return problems;
}

/** Ends the process with the reasons when a production server's secrets do not hold (called once at start). */
export function refuseToStartWithoutSecrets(env: NodeJS.ProcessEnv = process.env): void {
  const problems = productionSecretProblems(env);
  if (problems.length === 0) return;
  console.error(
    `Borewright refuses to start in production:\n${problems.map((p) => `  - ${p}`).join("\n")}\n` +
      "Generate secrets (for example `openssl rand -base64 32`) and set them in the environment. " +
      "`npm run demo` generates its own into .env.local.",
  );
  process.exit(1);
}
