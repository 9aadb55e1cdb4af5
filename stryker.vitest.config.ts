import { defineConfig } from "vitest/config";

// The tests Stryker runs against each mutant of geometry/ and model/job-status.ts: the pure unit tests of those
// modules, in-process, no app server.
export default defineConfig({
  resolve: { tsconfigPaths: true },
  test: {
    // MUTATION_TESTS (comma-separated globs) narrows a partial run to the tests of the files it mutates: a mutant
    // in a module's top-level code (a table, a constant) is run against every test, which on the whole suite costs
    // a minute a mutant here. A narrower set can only kill fewer mutants, so its score is a lower bound.
    include: process.env.MUTATION_TESTS
      ? process.env.MUTATION_TESTS.split(",")
      : ["tests/geometry/**/*.test.ts", "tests/model/job-status*.test.ts", "tests/db/verification.test.ts"],
    environment: "node",
    // Instrumented code on a shared 2-core machine runs several times slower than plain: the heaviest depth-stop
    // search needs more than vitest's default 5 s there.
    testTimeout: 60_000,
    // The heaviest properties run at most 20 times per mutant (tests/geometry/runs.ts); the rest of the suite as is.
    env: { MUTATION_PROPERTY_RUNS: "20" },
  },
});
