// Mutation testing of the fit computation (geometry/) and the pure job rules: `npm run test:mutation`.
// Not part of `npm test`: it runs the unit tests once per mutant. The machine is shared, so one test runner at
// a time. Run part of it with `npm run test:mutation -- --mutate geometry/wall.ts`.
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
    "model/job-status.ts",
  ],
  ignorePatterns: ["data", "test-results", "bench-results", "reports", ".next*", "public/uploads"],
  concurrency: 1,
  dryRunTimeoutMinutes: 30,
  timeoutMS: 60_000,
  timeoutFactor: 3,
  coverageAnalysis: "perTest",
  reporters: ["clear-text", "progress", "html", "json"],
  htmlReporter: { fileName: "reports/mutation/index.html" },
  jsonReporter: { fileName: "reports/mutation/mutation.json" },
  thresholds: { high: 90, low: 80, break: null },
  tempDirName: ".stryker-tmp",
  cleanTempDir: true,
};

export default config;
