import { readFileSync } from "node:fs";
import { createClient } from "@libsql/client";
import { describe, expect, it } from "vitest";

// The migration that turns a kit's bare price (a number, in the euros the shop then priced in) into money:
// integer cents with the ISO 4217 code. Run here on a table of the shape it updates.

const statements = readFileSync("drizzle/0007_job-quote.sql", "utf8")
  .split("--> statement-breakpoint")
  .map((s) => s.replace(/^\s*--.*$/gm, "").trim())
  .filter((s) => /^UPDATE `cylinder_kit`/.test(s));

describe("the kit price migration", () => {
  it("turns a bare price into cents with its currency, rounding to the cent, and leaves kits without a price as they are", async () => {
    expect(statements).toHaveLength(1);
    const db = createClient({ url: ":memory:" });
    await db.execute("create table cylinder_kit (id text primary key, data_json text not null)");
    const rows: [string, unknown][] = [
      ["whole", { boreMm: 47, price: 289 }],
      ["cents", { boreMm: 50, price: 349.9 }],
      ["float", { boreMm: 52, price: 0.29 }], // 0.29 × 100 is 28.999… in binary floating point
      ["none", { boreMm: 54 }],
      ["money", { boreMm: 57, price: { amountMinor: 22_900, currency: "EUR" } }],
    ];
    for (const [id, data] of rows) await db.execute({ sql: "insert into cylinder_kit values (?, ?)", args: [id, JSON.stringify(data)] });
    await db.execute(statements[0]);
    const after = Object.fromEntries((await db.execute("select id, data_json from cylinder_kit")).rows.map((r) => [r.id, JSON.parse(String(r.data_json))]));
    expect(after.whole).toEqual({ boreMm: 47, price: { amountMinor: 28_900, currency: "EUR" } });
    expect(after.cents).toEqual({ boreMm: 50, price: { amountMinor: 34_990, currency: "EUR" } });
    expect(after.float).toEqual({ boreMm: 52, price: { amountMinor: 29, currency: "EUR" } });
    expect(after.none).toEqual({ boreMm: 54 });
    expect(after.money).toEqual({ boreMm: 57, price: { amountMinor: 22_900, currency: "EUR" } });
    db.close();
  });
});
