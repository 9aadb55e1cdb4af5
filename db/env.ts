import { existsSync } from "node:fs";

/** Loads .env.local into process.env for scripts (Next.js loads it by itself); values already set win. */
export function loadLocalEnv(path = ".env.local"): void {
  if (existsSync(path)) process.loadEnvFile(path);
}
