// The README's run command: migrate, seed the demo shop, build, and serve at http://localhost:3000 with the
// local mail sink, payment fake and object store.
import { buildIsStale, ensureSecrets, run, startNext } from "./lib.mjs";
import { startLocalServices } from "./services.mjs";

const port = Number(process.env.PORT ?? 3000);
ensureSecrets();
process.env.BETTER_AUTH_URL ??= `http://localhost:${port}`;

run("npx", ["tsx", "db/migrate.ts"]);
run("npx", ["tsx", "db/seed.ts"]);

const services = await startLocalServices();

if (process.env.SKIP_BUILD !== "1" && buildIsStale()) run("npx", ["next", "build"]);
else console.log("the build is up to date; serving it");

const server = startNext({ port, host: process.env.HOST ?? "0.0.0.0", env: services.env });
console.log(`\nBorewright: http://localhost:${port}  (Ctrl-C stops it)\n`);

const stop = () => {
  server.kill("SIGTERM");
  services.stop().finally(() => process.exit(0));
};
process.on("SIGINT", stop);
process.on("SIGTERM", stop);
server.on("exit", (code) => {
  services.stop().finally(() => process.exit(code ?? 0));
});
