// The README's run command: migrate, seed the demo shop, build, and serve at http://localhost:3000 with the local mail sink.
import { startMailSink } from "./mail-sink.mjs";
import { buildIsStale, ensureSecret, run, startNext } from "./lib.mjs";

const port = Number(process.env.PORT ?? 3000);
ensureSecret();
process.env.BETTER_AUTH_URL ??= `http://localhost:${port}`;

run("npx", ["tsx", "db/migrate.ts"]);
run("npx", ["tsx", "db/seed.ts"]);

const sink = await startMailSink({
  smtpPort: Number(process.env.MAIL_SINK_SMTP_PORT ?? 2525),
  httpPort: Number(process.env.MAIL_SINK_HTTP_PORT ?? 2526),
});
console.log(`mail sink: SMTP ${sink.host}:${sink.smtpPort}; the owner's Outbox page lists what it catches`);

if (process.env.SKIP_BUILD !== "1" && buildIsStale()) run("npx", ["next", "build"]);
else console.log("the build is up to date; serving it");

const server = startNext({
  port,
  host: process.env.HOST ?? "0.0.0.0",
  env: { SMTP_HOST: sink.host, SMTP_PORT: String(sink.smtpPort), SMTP_IGNORE_TLS: "true", MAIL_SINK_URL: sink.url },
});
console.log(`\nBorewright: http://localhost:${port}  (Ctrl-C stops it)\n`);

const stop = () => {
  server.kill("SIGTERM");
  sink.stop().finally(() => process.exit(0));
};
process.on("SIGINT", stop);
process.on("SIGTERM", stop);
server.on("exit", (code) => {
  sink.stop().finally(() => process.exit(code ?? 0));
});
