import { defineConfig } from "vitest/config";

// Two projects: "unit" runs the pure code in-process; "app" runs integration and browser tests
// against a production server that tests/setup/global-server.ts builds a fresh database for and starts.
export default defineConfig({
  // "server-only" guards the bundle; in tests the server modules are imported directly.
  resolve: { tsconfigPaths: true, alias: { "server-only": new URL("./tests/support/empty.ts", import.meta.url).pathname } },
  test: {
    projects: [
      {
        extends: true,
        test: {
          name: "unit",
          sequence: { groupOrder: 0 },
          // tests/ mirrors the source: tests/db/csv.test.ts is the test of db/csv/, tests/app/… of app/…
          include: ["tests/geometry/**/*.test.ts", "tests/model/**/*.test.ts", "tests/scene/**/*.test.ts", "tests/scripts/**/*.test.ts", "tests/db/**/*.test.ts", "tests/app/**/*.test.ts", "tests/lint/**/*.test.ts"],
          environment: "node",
        },
      },
      {
        extends: true,
        test: {
          name: "app",
          // After the unit project, with its own worker count.
          sequence: { groupOrder: 1 },
          include: ["tests/integration/**/*.test.ts", "tests/browser/**/*.test.ts"],
          environment: "node",
          // The payment fake and object store first: the app server reads their settings from the environment.
          globalSetup: ["tests/setup/global-jobs.ts", "tests/setup/global-server.ts"],
          testTimeout: 60_000,
          // Pages under load on two cores can take a few seconds to show a change.
          expect: { poll: { timeout: 10_000 } },
          hookTimeout: 120_000,
          fileParallelism: true,
          maxWorkers: 2,
        },
      },
    ],
  },
});
