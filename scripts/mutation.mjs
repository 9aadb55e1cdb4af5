// Mutation testing of the fit computation (geometry/) and the job status rules: `npm run test:mutation`.
//
// Runs Stryker once per source file, one file after another, at the lowest priority and one test runner, each
// with only the test files that exercise that source (MUTATION_TESTS, read by stryker.vitest.config.ts) and its
// own incremental report, reports/mutation/<folder>-<name>.json (git-ignored): a second run re-tests only the
// mutants whose code or covering tests changed. Then it reads every file's report (the mutation-testing-report
// schema) and prints one line per file and one combined mutation score; it exits non-zero when the combined score
// is under the target or a file has no report yet.
//
// The score is conservative: each file is mutated against its own tests only, and the properties run at most 20
// times per mutant, so a mutant that another test file (or a longer property run) would kill counts as surviving.
//
//   npm run test:mutation                         every file, small ones first, the depth-stop search last
//   npm run test:mutation -- geometry/wall.ts     one file (or several), then the table over all reports
//   npm run test:mutation -- --report             only the table, from the reports as they are
//   npm run test:mutation -- --survivors [file…]  the table, and each surviving mutant (file:line, mutator, the change)
//   npm run test:mutation -- --full [file…]       every mutant again (Stryker's --force), up to date or not
//
// A file whose source and test files are those its report was made from is not run again ("up to date"). Like
// Stryker's own incremental mode, this sees changes to the mutated file and to its test files only: after a change
// to a test helper (fixtures.ts, arbitraries.ts) or to a module the file imports, run it with --full.
import { spawn } from "node:child_process";
import { existsSync, mkdirSync, readFileSync, readdirSync, writeFileSync } from "node:fs";
import { performance } from "node:perf_hooks";

const root = new URL("..", import.meta.url).pathname;
const TARGET_PERCENT = 90;
const REPORTS = "reports/mutation";

const t = (name) => `tests/geometry/${name}.test.ts`;
/** The tests of the evaluation as a whole: a study in, its result out. */
const EVALUATION = [t("evaluate"), t("evaluate-kit"), t("fit-cases"), t("kit-cut"), t("sources")];

/**
 * Each mutated file and the tests that exercise it, cheapest first; the depth-stop search (each of its mutants
 * runs its property tests) last. Not mutated: the zod schema files (see stryker.config.mjs) and geometry/index.ts,
 * which only re-exports. Any other file of geometry/ missing here is counted as not measured.
 */
export const TARGETS = [
  ["model/job-status.ts", ["tests/model/job-status.test.ts", "tests/model/job-status-moves.test.ts"]],
  ["geometry/verification.ts", [t("verification")]],
  ["geometry/units.ts", [t("units"), t("sources")]],
  ["geometry/tolerance.ts", [t("tolerance"), ...EVALUATION]],
  ["geometry/lens.ts", [t("lens"), t("clearance"), t("sources")]],
  ["geometry/displacement.ts", [t("displacement"), t("sources"), t("evaluate")]],
  ["geometry/speed.ts", [t("speed"), t("rig"), t("sources")]],
  ["geometry/removal.ts", [t("removal"), t("fit-cases"), t("sources"), t("evaluate")]],
  ["geometry/depth.ts", [t("depth"), ...EVALUATION]],
  ["geometry/parse.ts", [t("parse"), t("schema"), t("evaluate")]],
  ["geometry/errors.ts", [t("errors"), t("schema"), t("studs-threads"), t("evaluate")]],
  ["geometry/studs.ts", [t("studs-threads"), t("sources")]],
  ["geometry/threads.ts", [t("studs-threads"), t("sources")]],
  ["geometry/vec.ts", [t("vec"), t("wall"), t("polygon-measures"), t("alignment")]],
  ["geometry/outline.ts", [t("outline"), t("area"), t("shapes"), t("fit-cases")]],
  ["geometry/flatten-adapter.ts", [t("flatten-adapter"), t("area")]],
  ["geometry/holder.ts", [t("holder")]],
  ["geometry/rig-setup.ts", [t("rig-setup")]],
  ["geometry/rig.ts", [t("rig"), t("sources")]],
  ["geometry/wall.ts", [t("wall"), t("fit-cases")]],
  ["geometry/alignment.ts", [t("alignment"), t("fit-cases"), t("sources")]],
  ["geometry/shapes.ts", [t("shapes")]],
  ["geometry/homography.ts", [t("homography")]],
  ["geometry/study-context.ts", EVALUATION],
  ["geometry/limits.ts", [t("limits"), t("resolve-limits"), ...EVALUATION]],
  ["geometry/resolve-limits.ts", [t("resolve-limits"), ...EVALUATION]],
  ["geometry/cut-warnings.ts", [t("cut-warnings"), ...EVALUATION]],
  ["geometry/warnings.ts", [t("warnings"), ...EVALUATION]],
  ["geometry/verdict.ts", [t("verdict"), ...EVALUATION]],
  ["geometry/kit-checks.ts", [t("kit-checks"), t("ports"), t("crank"), ...EVALUATION]],
  ["geometry/kit-cut.ts", [t("kit-cut"), t("fit-cases"), t("evaluate-kit")]],
  ["geometry/evaluate-kit.ts", [t("evaluate-kit"), t("fit-cases")]],
  ["geometry/evaluate.ts", EVALUATION],
  ["geometry/clearance.ts", [t("clearance")]],
  ["geometry/ports.ts", [t("ports")]],
  ["geometry/polygon.ts", [t("polygon-measures"), t("area")]],
  ["geometry/simplicity.ts", [t("polygon")]],
  ["geometry/crank.ts", [t("crank")]],
  // Its own tests only: the rig tests evaluate a whole example study (a second a mutant) for one depth-stop call.
  ["geometry/depth-stop.ts", [t("depth-stop")]],
];

const reportOf = (file) => `${REPORTS}/${file.replace(/\.ts$/, "").replace("/", "-")}.json`;

/** The test files of a target that exist. */
const testsOf = (tests) => [...new Set(tests)].filter((p) => existsSync(root + p));

/** True when the file's report was made from the file and the test files as they are now. */
function upToDate(file, tests) {
  const path = root + reportOf(file);
  if (!existsSync(path)) return false;
  const report = JSON.parse(readFileSync(path, "utf8"));
  if (report.files?.[file]?.source !== readFileSync(root + file, "utf8")) return false;
  const present = testsOf(tests);
  const recorded = Object.keys(report.testFiles ?? {});
  if (recorded.length !== present.length || !present.every((p) => recorded.includes(p))) return false;
  return present.every((p) => report.testFiles[p].source === readFileSync(root + p, "utf8"));
}

/** One Stryker run of a file against its tests; resolves with the exit code. Its output goes to a log beside the report. */
function mutate(file, tests, full) {
  const present = testsOf(tests);
  const log = reportOf(file).replace(/\.json$/, ".log");
  const args = ["-n", "19", "node_modules/.bin/stryker", "run", "--mutate", file, "--incremental", "--incrementalFile", reportOf(file), "--reporters", "clear-text,progress", "--concurrency", "1"];
  if (full) args.push("--force");
  return new Promise((resolve) => {
    // One Stryker at a time on this machine, even when two people start a run: flock waits for the other.
    const child = spawn("flock", ["/tmp/borewright-stryker.lock", "nice", ...args], {
      cwd: root,
      env: { ...process.env, MUTATION_TESTS: present.join(","), FORCE_COLOR: "0" },
      stdio: ["ignore", "pipe", "pipe"],
    });
    const chunks = [];
    child.stdout.on("data", (d) => chunks.push(d));
    child.stderr.on("data", (d) => chunks.push(d));
    child.on("close", (code) => {
      writeFileSync(root + log, Buffer.concat(chunks));
      resolve(code ?? 1);
    });
  });
}

/** Counts of a report's mutants by status (mutation-testing-report-schema). */
function counts(file) {
  const path = root + reportOf(file);
  if (!existsSync(path)) return null;
  const report = JSON.parse(readFileSync(path, "utf8"));
  const entry = report.files?.[file];
  if (!entry) return null;
  const c = { Killed: 0, Timeout: 0, Survived: 0, NoCoverage: 0, CompileError: 0, RuntimeError: 0, Ignored: 0 };
  for (const m of entry.mutants) c[m.status] = (c[m.status] ?? 0) + 1;
  return c;
}

/** Stryker's score: detected (killed + timeout) over valid mutants (detected + survived + no coverage). */
const detected = (c) => c.Killed + c.Timeout;
const valid = (c) => detected(c) + c.Survived + c.NoCoverage;
const percent = (c) => (valid(c) === 0 ? 100 : (100 * detected(c)) / valid(c));

/** Each mutant of a file that no test detected, as "file:line:column mutator  original → replacement". */
function survivors(file) {
  const path = root + reportOf(file);
  if (!existsSync(path)) return [];
  const entry = JSON.parse(readFileSync(path, "utf8")).files?.[file];
  if (!entry) return [];
  const lines = entry.source.split("\n");
  return entry.mutants
    .filter((m) => m.status === "Survived" || m.status === "NoCoverage")
    .sort((a, b) => a.location.start.line - b.location.start.line || a.location.start.column - b.location.start.column)
    .map((m) => {
      const { start, end } = m.location;
      const original = start.line === end.line ? lines[start.line - 1].slice(start.column - 1, end.column - 1) : `${lines[start.line - 1].slice(start.column - 1)}…`;
      const one = (text) => text.replace(/\s+/g, " ").slice(0, 100);
      return `${file}:${start.line}:${start.column} ${m.status === "NoCoverage" ? "(no coverage) " : ""}${m.mutatorName}  ${one(original)} → ${one(m.replacement ?? "")}`;
    });
}

/** Files of geometry/ that are neither in TARGETS nor left out on purpose. */
function unlisted() {
  const leftOut = (name) => /^(schema.*|result-schema|index|cli.*|bench.*)\.ts$/.test(name) || name.endsWith(".d.ts");
  return readdirSync(`${root}geometry`)
    .filter((name) => name.endsWith(".ts") && !leftOut(name))
    .map((name) => `geometry/${name}`)
    .filter((file) => !TARGETS.some(([f]) => f === file));
}

function table() {
  const rows = [];
  const total = { Killed: 0, Timeout: 0, Survived: 0, NoCoverage: 0 };
  const missing = unlisted();
  for (const [file] of TARGETS) {
    const c = counts(file);
    if (!c) {
      missing.push(file);
      rows.push(`${file.padEnd(30)} ${"not measured".padStart(8)}`);
      continue;
    }
    for (const k of Object.keys(total)) total[k] += c[k];
    rows.push(
      `${file.padEnd(30)} ${`${percent(c).toFixed(1)} %`.padStart(8)}  ${String(detected(c)).padStart(4)} of ${String(valid(c)).padStart(4)}` +
        `  (killed ${c.Killed}, timeout ${c.Timeout}, survived ${c.Survived}, no coverage ${c.NoCoverage})`,
    );
  }
  console.log(`\n${"file".padEnd(30)} ${"score".padStart(8)}  detected of valid`);
  for (const r of rows) console.log(r);
  console.log(
    `\nmutation score geometry/ and model/job-status.ts: ${percent(total).toFixed(1)} % (${detected(total)} killed+timeout of ${valid(total)} valid mutants)`,
  );
  if (missing.length) console.log(`not measured yet: ${missing.join(", ")}`);
  return { ok: missing.length === 0 && percent(total) >= TARGET_PERCENT };
}

async function main() {
  const args = process.argv.slice(2);
  const reportOnly = args.includes("--report") || args.includes("--survivors");
  const asked = args.filter((a) => !a.startsWith("--"));
  const unknown = asked.filter((a) => !TARGETS.some(([file]) => file === a));
  if (unknown.length) {
    console.error(`not a mutated file: ${unknown.join(", ")} (the list is TARGETS in scripts/mutation.mjs)`);
    process.exit(2);
  }
  mkdirSync(root + REPORTS, { recursive: true });
  const started = performance.now();
  if (!reportOnly) {
    const full = args.includes("--full");
    for (const [file, tests] of TARGETS.filter(([file]) => asked.length === 0 || asked.includes(file))) {
      if (!full && upToDate(file, tests)) {
        console.log(`${file}: up to date`);
        continue;
      }
      const t0 = performance.now();
      const code = await mutate(file, tests, full);
      const c = counts(file);
      const seconds = ((performance.now() - t0) / 1000).toFixed(0);
      console.log(`${file}: ${c ? `${percent(c).toFixed(1)} %` : "no report"} in ${seconds} s${code ? ` (Stryker exited ${code}, see ${reportOf(file).replace(/\.json$/, ".log")})` : ""}`);
    }
  }
  if (args.includes("--survivors")) {
    for (const [file] of TARGETS.filter(([file]) => asked.length === 0 || asked.includes(file))) for (const line of survivors(file)) console.log(line);
  }
  const { ok } = table();
  console.log(`wall time ${((performance.now() - started) / 60_000).toFixed(1)} min`);
  process.exit(ok ? 0 : 1);
}

await main();
