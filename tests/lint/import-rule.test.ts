import { readFileSync } from "node:fs";
import { ESLint } from "eslint";
import { beforeAll, describe, expect, it } from "vitest";

// The linter holds the import flow: app → db, scene, model, geometry; db → model, geometry (and the pure
// drawings of scene/drawing); scene → model, geometry; model → geometry; geometry → nothing of ours.
// One fixture imports from every layer; linted as if it sat in each layer, exactly the imports against
// the flow are reported.

const fixture = readFileSync(new URL("./fixtures/imports-every-layer.ts", import.meta.url), "utf8");
let eslint: ESLint;

beforeAll(() => {
  eslint = new ESLint({ cwd: process.cwd() });
});

async function refusedImports(filePath: string): Promise<string[]> {
  const [result] = await eslint.lintText(fixture, { filePath });
  const refused = result.messages.filter((m) => m.ruleId === "import/no-restricted-paths");
  // The reported line names the import; keep its module path.
  const lines = fixture.split("\n");
  return refused.map((m) => /from "([^"]+)"/.exec(lines[m.line - 1])?.[1] ?? `line ${m.line}`).sort();
}

describe("the import rule", { timeout: 120_000 }, () => {
  it("lets app/ import every layer", async () => {
    expect(await refusedImports("app/(shop)/fixture.ts")).toEqual([]);
  });

  it("refuses db/ its imports of app/ and of scene/ outside the drawings", async () => {
    expect(await refusedImports("db/fixture.ts")).toEqual(["@/app/api/_lib/respond", "@/scene/fit"]);
  });

  it("refuses scene/ its imports of app/ and db/", async () => {
    expect(await refusedImports("scene/fixture.ts")).toEqual(["@/app/api/_lib/respond", "@/db/errors"]);
  });

  it("refuses model/ everything but geometry/", async () => {
    expect(await refusedImports("model/fixture.ts")).toEqual(["@/app/api/_lib/respond", "@/db/errors", "@/scene/drawing/svg", "@/scene/fit"]);
  });

  it("refuses geometry/ every layer of ours", async () => {
    expect(await refusedImports("geometry/fixture.ts")).toEqual([
      "@/app/api/_lib/respond",
      "@/db/errors",
      "@/model/schemas",
      "@/scene/drawing/svg",
      "@/scene/fit",
    ]);
  });
});
