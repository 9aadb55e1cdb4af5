// The README's test command: installs what the tests need, builds the app, runs lint, the type check and
// every vitest project (unit, integration, browser), and ends with one line: "tests: N passed, N failed".
import { spawnSync } from "node:child_process";
import { existsSync, mkdirSync, readFileSync } from "node:fs";
import { root } from "./lib.mjs";

// The build evaluates the auth module; a throwaway secret keeps it quiet (the test server gets its own).
const env = { BETTER_AUTH_SECRET: "build-time-placeholder-secret-0123456789", ...process.env, NEXT_TELEMETRY_DISABLED: "1" };
const sh = (cmd, args, opts = {}) => spawnSync(cmd, args, { cwd: root, stdio: "inherit", env, ...opts });

// 1. Dependencies and the browser.
if (!existsSync(`${root}node_modules/.package-lock.json`)) {
  console.log("installing dependencies (npm ci)…");
  if (sh("npm", ["ci", "--no-audit", "--no-fund"]).status !== 0) process.exit(1);
}
const chromium = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";
if (!existsSync(chromium)) {
  const isRoot = process.getuid?.() === 0;
  if (isRoot && existsSync("/usr/bin/apt-get")) {
    console.log("installing Debian's chromium for the browser tests…");
    sh("apt-get", ["update", "-qq"]);
    sh("apt-get", ["install", "-y", "-qq", "chromium"], { env: { ...env, DEBIAN_FRONTEND: "noninteractive" } });
  }
  if (!existsSync(chromium)) {
    console.error("The browser tests need Debian's Chromium. Install it with:\n\n  sudo apt-get install -y chromium\n\nthen run npm test again.");
    console.log("tests: 0 passed, 1 failed");
    process.exit(1);
  }
}

let extraFailures = 0;
const step = (label, cmd, args) => {
  console.log(`\n── ${label}`);
  const ok = sh(cmd, args).status === 0;
  if (!ok) {
    console.error(`${label}: FAILED`);
    extraFailures++;
  }
  return ok;
};

// 2. Static checks, then the production build the app tests serve.
step("lint", "npx", ["eslint", "."]);
step("typecheck", "npx", ["tsc", "--noEmit"]);
const built = step("build", "npx", ["next", "build"]);

// 3. The tests, counted from vitest's own JSON report.
mkdirSync(`${root}test-results`, { recursive: true });
const report = `${root}test-results/vitest.json`;
const args = ["vitest", "run", "--reporter=default", "--reporter=json", `--outputFile.json=${report}`];
if (!built) args.push("--project", "unit");
console.log("\n── vitest");
const vitestStatus = sh("npx", args).status;

let passed = 0;
let failed = 0;
if (existsSync(report)) {
  const json = JSON.parse(readFileSync(report, "utf8"));
  passed = json.numPassedTests ?? 0;
  failed = json.numFailedTests ?? 0;
  // A file that failed outside its tests (a hook or its import) counts once, even when its tests were skipped.
  failed += (json.testResults ?? []).filter((f) => f.status === "failed" && !(f.assertionResults ?? []).some((a) => a.status === "failed")).length;
} else {
  failed = 1;
}
failed += extraFailures;
// vitest's own verdict too: an error it reports outside any file still fails the run.
if (vitestStatus !== 0 && failed === 0) failed = 1;
console.log(`\ntests: ${passed} passed, ${failed} failed`);
process.exit(failed > 0 || passed === 0 ? 1 : 0);
