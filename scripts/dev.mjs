// Development: migrate, seed, the local mail sink, and `next dev` with hot reload.
import { spawn } from "node:child_process";
import { startMailSink } from "./mail-sink.mjs";
import { ensureSecret, root, run } from "./lib.mjs";

ensureSecret();
process.env.BETTER_AUTH_URL ??= "http://localhost:3000";
run("npx", ["tsx", "db/migrate.ts"]);
run("npx", ["tsx", "db/seed.ts"]);
const sink = await startMailSink({});
const child = spawn(process.execPath, ["node_modules/next/dist/bin/next", "dev"], {
  cwd: root,
  stdio: "inherit",
  env: { ...process.env, NEXT_TELEMETRY_DISABLED: "1", SMTP_HOST: sink.host, SMTP_PORT: String(sink.smtpPort), SMTP_IGNORE_TLS: "true", MAIL_SINK_URL: sink.url },
});
child.on("exit", (code) => sink.stop().finally(() => process.exit(code ?? 0)));
process.on("SIGINT", () => child.kill("SIGINT"));
