import { parse } from "csv-parse/sync";
import { beforeAll, describe, expect, it } from "vitest";
import type { Http } from "../support/http";
import { caseData, expectError, freshShopOwner, kitData, ok, shopCounts } from "./library-fixtures";

type Report = { rows: { line: number; ok: boolean; errors?: Record<string, string>; name?: string }[]; written: number };
type Page = { items: { name: string; data: Record<string, unknown>; mouthReadingsMm?: { valueMm: number }[] }[]; total: number };

let shop: Http;
beforeAll(async () => {
  shop = await freshShopOwner("Csv Owner");
});

const importCsv = (kind: string, csv: string, confirm: boolean) => shop.post(`/api/v1/library/import?kind=${kind}`, { csv, confirm });

describe("the library as CSV", () => {
  it("offers a template whose example row imports cleanly", async () => {
    for (const kind of ["cases", "kits"]) {
      const res = await shop.get(`/api/v1/library/template?kind=${kind}`);
      expect(res.status).toBe(200);
      expect(res.headers.get("content-type")).toMatch(/text\/csv/);
      expect(res.headers.get("content-disposition")).toMatch(/attachment/);
      const report = ok<Report>(await importCsv(kind, res.text, false));
      expect(report.rows).toEqual([{ line: 2, ok: true, name: expect.any(String) }]);
      expect(report.written).toBe(0);
    }
  });

  it("reports each bad row by line and column, writes nothing on a preview, and only the good rows on confirm", async () => {
    const template = (await shop.get("/api/v1/library/template?kind=kits")).text;
    const [header, example] = template.trim().split(/\r?\n/);
    const cols = header.split(",");
    const at = (name: string) => cols.indexOf(name);
    const cells = (line: string) => line.match(/("([^"]|"")*"|[^,]*)(,|$)/g)!.slice(0, cols.length).map((c) => c.replace(/,$/, ""));
    const withCell = (name: string, value: string, rowName: string) => {
      const c = cells(example);
      c[at("name")] = rowName;
      c[at(name)] = value;
      return c.join(",");
    };
    const csv = [
      header,
      withCell("bore_mm", "52", "Good kit 52"),
      withCell("bore_mm", `"52,5"`, "Comma kit"),
      withCell("skirt_diameter_readings_mm", "", "No skirt kit"),
      withCell("price", "-4", "Negative price kit"),
      "",
      withCell("always_with_gasket", "maybe", "Unsure kit"),
      withCell("bore_mm", "41", "Good kit 41"),
    ].join("\r\n");

    const before = await shopCounts(shop);
    const preview = ok<Report>(await importCsv("kits", csv, false));
    expect(preview.written).toBe(0);
    expect(await shopCounts(shop)).toEqual(before);
    expect(preview.rows.map((r) => [r.line, r.ok])).toEqual([[2, true], [3, false], [4, false], [5, false], [7, false], [8, true]]);
    expect(preview.rows[1].errors?.bore_mm).toMatch(/point for decimals/);
    expect(preview.rows[2].errors?.skirt_diameter_readings_mm).toMatch(/required/i);
    expect(preview.rows[3].errors).toHaveProperty("price");
    expect(preview.rows[4].errors?.always_with_gasket).toMatch(/yes or no/);

    const written = ok<Report>(await importCsv("kits", csv, true));
    expect(written.written).toBe(2);
    const list = ok<Page>(await shop.get("/api/v1/kits?sort=name&dir=asc&q=Good kit"));
    expect(list.items.map((k) => [k.name, k.data.boreMm])).toEqual([["Good kit 41", 41], ["Good kit 52", 52]]);
  });

  it("refuses a header with a missing or unknown column, naming it", async () => {
    const report = ok<Report>(await importCsv("cases", "name,deck,colour\nA,circle 90,red\n", false));
    expect(report.rows[0].line).toBe(1);
    expect(report.rows[0].errors).toMatchObject({ colour: expect.stringMatching(/unknown/i), studs: expect.stringMatching(/missing/i) });
  });

  it("exports the shop's case profiles so that the export imports back to the same rows", async () => {
    const owner = await freshShopOwner("Round Trip");
    const template = (await owner.get("/api/v1/library/template?kind=cases")).text;
    ok<Report>(await owner.post("/api/v1/library/import?kind=cases", { csv: template, confirm: true }));
    const exported = await owner.get("/api/v1/library/export?kind=cases");
    expect(exported.status).toBe(200);
    const again = ok<Report>(await owner.post("/api/v1/library/import?kind=cases", { csv: exported.text, confirm: true }));
    expect(again.written).toBe(1);
    const rows = ok<Page>(await owner.get("/api/v1/cases?sort=createdAt")).items;
    expect(rows).toHaveLength(2);
    expect(rows[1].data).toEqual(rows[0].data);
    expect(rows[1].mouthReadingsMm?.map((r) => r.valueMm)).toEqual(rows[0].mouthReadingsMm?.map((r) => r.valueMm));
  });

  it("never exports a cell a spreadsheet would run as a formula, whatever the name, notes, stud or pocket labels start with", async () => {
    // The prefixes spreadsheets run as formulas (OWASP, "CSV Injection"). Labels and names are trimmed by the
    // schema, so the tab and carriage return reach only the notes.
    const owner = await freshShopOwner("Formula Owner");
    const prefixes = ["=", "+", "-", "@", "\t", "\r"];
    for (const p of prefixes) {
      const printable = p.trim() !== "";
      const label = (s: string) => (printable ? `${p}${s}` : s);
      const data = { ...caseData(), studs: caseData().studs.map((st, i) => ({ ...st, label: label(`HYPERLINK("http://x.test/${i}")`) })) };
      data.pockets = data.pockets.map((x, i) => ({ ...x, label: printable && p !== "@" ? `${p}pocket ${i}` : `pocket ${i}` }));
      ok(await owner.post("/api/v1/cases", { name: label(`Case ${prefixes.indexOf(p)}`), notes: `${p}SUM(A1:A9)`, data }), 201);
      const kit = { ...kitData(47, 53.92), studs: data.studs };
      ok(await owner.post("/api/v1/kits", { name: label(`Kit ${prefixes.indexOf(p)}`), notes: `${p}SUM(A1:A9)`, data: kit }), 201);
    }
    for (const kind of ["cases", "kits"]) {
      const exported = await owner.get(`/api/v1/library/export?kind=${kind}`);
      expect(exported.status).toBe(200);
      const records = parse(exported.text, { relax_column_count: true }) as string[][];
      expect(records.length).toBe(prefixes.length + 1);
      for (const cell of records.flat()) expect(cell, JSON.stringify(cell)).not.toMatch(/^[=+\-@\t\r]/);
      // And the export reads back cleanly.
      const again = ok<Report>(await owner.post(`/api/v1/library/import?kind=${kind}`, { csv: exported.text, confirm: false }));
      expect(again.rows.every((r) => r.ok)).toBe(true);
    }
  });

  it("answers a bad kind or a body that is not the import shape with 400", async () => {
    expectError(await shop.get("/api/v1/library/template?kind=rigs"), 400);
    expectError(await shop.post("/api/v1/library/import?kind=kits", { csv: "name\n", confirm: "yes" }), 400);
  });
});
