// Mutation testing of the fit computation (geometry/) and the pure job rules: `npm run test:mutation`, which runs
// scripts/mutation.mjs: one Stryker run per source file, against that file's tests only (MUTATION_TESTS, read by
// stryker.vitest.config.ts), each with its own incremental report in reports/mutation/, then one combined score.
// Not part of `npm test`: it runs the unit tests once per mutant. The machine is shared, so one test runner at
// a time. Surviving mutants that change nothing are listed, with the reason, in tests/geometry/equivalent-mutants.md.
//
// The zod schema files (geometry/schema*.ts, geometry/result-schema.ts) are left out: they are declarations
// (field shapes, bounds and their messages), evaluated once when the module loads, so every one of their
// mutants is "static" and runs against the whole unit suite — about a minute a mutant on this machine for
// 317 mutants — while tests/geometry/schema.test.ts and the properties' "every invalid study is
// rejected" check what they accept and refuse.
/** @type {import("@stryker-mutator/api/core").PartialStrykerOptions} */
const config = {
  testRunner: "vitest",
  vitest: { configFile: "stryker.vitest.config.ts", related: false },
  plugins: ["@stryker-mutator/vitest-runner", "@stryker-mutator/typescript-checker"],
  checkers: process.env.STRYKER_TYPECHECK === "1" ? ["typescript"] : [],
  tsconfigFile: "tsconfig.json",
  mutate: [
    "geometry/**/*.ts",
    "!geometry/**/*.d.ts",
    "!geometry/**/cli*.ts",
    "!geometry/**/bench*.ts",
    "!geometry/schema*.ts",
    "!geometry/result-schema.ts",
    "model/job-status.ts",
  ],
  ignorePatterns: ["data", "test-results", "bench-results", "reports", ".next*", "public/uploads"],
  concurrency: 1,
  dryRunTimeoutMinutes: 30,
  // A mutant's time limit is timeoutFactor × the net time of the tests that cover it (measured in the initial run,
  // under the same load) + timeoutMS + the runner's overhead. A mutant that turns a loop endless (a binary search's
  // `lo < hi` → `lo <= hi`, a bound → `true` in geometry/depth-stop.ts) then ends as "Timeout" (counted as detected)
  // after about ten seconds instead of a minute, and a test that is only slow still has twice its time and more.
  timeoutMS: 10_000,
  timeoutFactor: 2,
  coverageAnalysis: "perTest",
  reporters: ["clear-text", "progress", "html", "json"],
  htmlReporter: { fileName: "reports/mutation/index.html" },
  jsonReporter: { fileName: "reports/mutation/mutation.json" },
  thresholds: { high: 90, low: 80, break: null },
  tempDirName: ".stryker-tmp",
  cleanTempDir: true,
};

export default config;
