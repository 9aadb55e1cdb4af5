import next from "eslint-config-next";
import nextTs from "eslint-config-next/typescript";

const config = [
  ...next,
  ...nextTs,
  { ignores: [".next/**", ".next-*/**", "bench-results/**", "node_modules/**", "data/**", "test-results/**", "next-env.d.ts", "drizzle/**"] },
];

export default config;
