// The app tests with the jobs fakes started before the app server, for running the jobs tests on their own:
//   NEXT_DIST_DIR=.next-jobs npx vitest run --config tests/setup/vitest.jobs.config.ts <files>
import { fileURLToPath } from "node:url";
import { defineConfig } from "vitest/config";

const root = fileURLToPath(new URL("../..", import.meta.url));

export default defineConfig({
  root,
  resolve: { tsconfigPaths: true, alias: { "server-only": fileURLToPath(new URL("../support/empty.ts", import.meta.url)) } },
  test: {
    include: ["tests/integration/**/*.test.ts", "tests/browser/**/*.test.ts"],
    environment: "node",
    globalSetup: ["tests/setup/global-jobs.ts", "tests/setup/global-server.ts"],
    testTimeout: 60_000,
    hookTimeout: 120_000,
    fileParallelism: true,
    maxWorkers: 2,
  },
});
