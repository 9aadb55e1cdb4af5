// Runs once when the server starts (never during the build): a production server refuses to start with a
// missing or published secret.
export async function register() {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  const { productionSecretProblems } = await import("./db/env");
  const problems = productionSecretProblems();
  if (problems.length === 0) return;
  console.error(
    `Borewright refuses to start in production:\n${problems.map((p) => `  - ${p}`).join("\n")}\n` +
      "Generate secrets (for example `openssl rand -base64 32`) and set them in the environment. " +
      "`npm run demo` generates its own into .env.local.",
  );
  process.exit(1);
}
