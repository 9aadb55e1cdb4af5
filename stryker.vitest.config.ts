import { defineConfig } from "vitest/config";

// The tests Stryker runs against each mutant of geometry/ and model/job-status.ts: the pure unit tests of those
// modules, in-process, no app server.
export default defineConfig({
  resolve: { tsconfigPaths: true },
  test: {
    include: ["tests/geometry/**/*.test.ts", "tests/unit/job-status.test.ts", "tests/model/job-status*.test.ts", "tests/unit/verification.test.ts"],
    environment: "node",
    // Instrumented code on a shared 2-core machine runs several times slower than plain: the heaviest depth-stop
    // search needs more than vitest's default 5 s there.
    testTimeout: 60_000,
    // The heaviest properties run at most 20 times per mutant (tests/geometry/runs.ts); the rest of the suite as is.
    env: { MUTATION_PROPERTY_RUNS: "20" },
  },
});
