// Development: migrate, seed, the local services, and `next dev` with hot reload.
import { spawn } from "node:child_process";
import { ensureSecrets, root, run } from "./lib.mjs";
import { startLocalServices } from "./services.mjs";

ensureSecrets();
process.env.BETTER_AUTH_URL ??= "http://localhost:3000";
run("npx", ["tsx", "db/migrate.ts"]);
run("npx", ["tsx", "db/seed.ts"]);
const services = await startLocalServices();
const child = spawn(process.execPath, ["node_modules/next/dist/bin/next", "dev"], {
  cwd: root,
  stdio: "inherit",
  env: { ...process.env, NEXT_TELEMETRY_DISABLED: "1", ...services.env },
});
child.on("exit", (code) => services.stop().finally(() => process.exit(code ?? 0)));
process.on("SIGINT", () => child.kill("SIGINT"));
