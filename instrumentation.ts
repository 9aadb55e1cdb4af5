// Runs once when the server starts (never during the build): a production server refuses to start with a
// missing or published secret.
export async function register() {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  const { refuseToStartWithoutSecrets } = await import("./db/env");
  refuseToStartWithoutSecrets();
}
