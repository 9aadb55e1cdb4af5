import { defineConfig } from "drizzle-kit";

export default defineConfig({
  schema: ["./db/schema.ts", "./db/schema-jobs.ts"],
  out: "./drizzle",
  dialect: "turso",
  dbCredentials: {
    url: process.env.DATABASE_URL ?? "file:./data/borewright.db",
    authToken: process.env.DATABASE_AUTH_TOKEN,
  },
});
