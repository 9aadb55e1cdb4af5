import next from "eslint-config-next";
import nextTs from "eslint-config-next/typescript";

// Imports flow one way: app → db, scene, model, geometry; db → model, geometry; scene → model, geometry;
// model → geometry; geometry → nothing of ours. One allowance: db/ may import the pure SVG drawings of
// scene/drawing/ (no browser code), because the setup card's PDF prints the same drawings as the studio.
const layers = {
  app: [],
  db: ["./app", "./scene"],
  scene: ["./app", "./db"],
  model: ["./app", "./db", "./scene"],
  geometry: ["./app", "./db", "./scene", "./model"],
};
const zones = Object.entries(layers).flatMap(([layer, forbidden]) =>
  forbidden.map((from) => ({
    target: `./${layer}`,
    from,
    except: layer === "db" && from === "./scene" ? ["./drawing"] : [],
    message: `${layer}/ does not import from ${from.slice(2)}/ (imports flow app → db, scene → model → geometry; see eslint.config.mjs).`,
  })),
);

const config = [
  ...next,
  ...nextTs,
  { ignores: [".next/**", ".next-*/**", "bench-results/**", "node_modules/**", "data/**", "test-results/**", "next-env.d.ts", "drizzle/**", ".stryker-tmp/**", "reports/**"] },
  { files: ["**/*.{ts,tsx,mjs}"], rules: { "import/no-restricted-paths": ["error", { zones }] } },
];

export default config;
