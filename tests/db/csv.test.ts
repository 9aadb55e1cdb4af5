import { describe, expect, it } from "vitest";
import { CSV_HEADERS, EXAMPLE_CASE, EXAMPLE_KIT, caseCells, kitCells } from "../../db/csv/columns";
import { readLibraryCsv } from "../../db/csv/read";
import { CsvTextError, parseCsv, toCsv } from "../../db/csv/text";

// The library CSV layer: CSV text (RFC 4180, through csv-parse and csv-stringify), the formula neutraliser
// and the columns. The formula prefixes are the ones spreadsheets run as formulas (OWASP, "CSV Injection").

const DANGEROUS = ["=", "+", "-", "@", "\t", "\r"];
const FORMULA_START = /^[=+\-@\t\r]/;

describe("CSV text", () => {
  it("reads quoted cells with commas, doubled quotes and line breaks, and gives each record the line it starts on", () => {
    const text = '\ufeffname,notes\r\n"a, b","say ""hi"""\n\n"two\nlines",x\r   ,  \rlast,1\n';
    expect(parseCsv(text)).toEqual([
      { line: 1, cells: ["name", "notes"] },
      { line: 2, cells: ["a, b", 'say "hi"'] },
      { line: 4, cells: ["two\nlines", "x"] },
      { line: 7, cells: ["last", "1"] },
    ]);
  });

  it("refuses text that is not CSV (an unclosed quote) with a reason", () => {
    expect(() => parseCsv('name\n"never closed')).toThrow(CsvTextError);
  });

  it("writes what it reads back: commas, quotes, line breaks", () => {
    const rows = [["a,b", 'q"uote', "line\nbreak", "cr\r\nlf", "plain"]];
    const [, back] = parseCsv(toCsv(["1", "2", "3", "4", "5"], rows));
    expect(back.cells).toEqual(rows[0]);
  });

  it("never writes a cell that a spreadsheet would run as a formula", () => {
    const cells = DANGEROUS.map((p) => `${p}HYPERLINK("http://x.test")`);
    const records = parseCsv(toCsv(cells, [cells]));
    for (const r of records) for (const cell of r.cells) expect(cell, JSON.stringify(cell)).not.toMatch(FORMULA_START);
    expect(records[1].cells.map((c) => c.slice(1))).toEqual(cells);
  });
});

describe("library rows as CSV", () => {
  it("neutralises every text field of a case and a kit: name, notes, stud and pocket labels, thread", () => {
    for (const p of DANGEROUS) {
      const label = (s: string) => `${p}${s}`;
      const kase = {
        ...EXAMPLE_CASE,
        studThread: label("M7"),
        studs: EXAMPLE_CASE.studs.map((s, i) => ({ ...s, label: label(`stud${i}`) })),
        pockets: EXAMPLE_CASE.pockets.map((x) => ({ ...x, label: label("pocket") })),
      };
      const kit = { ...EXAMPLE_KIT, studThread: label("M7"), studs: kase.studs };
      const csv = toCsv(CSV_HEADERS.cases, [caseCells(label("name"), label("notes"), kase, [46.02])]) + toCsv(CSV_HEADERS.kits, [kitCells(label("name"), label("notes"), kit)]);
      const cells = parseCsv(csv).flatMap((r) => r.cells);
      for (const cell of cells) expect(cell, `prefix ${JSON.stringify(p)}: ${JSON.stringify(cell)}`).not.toMatch(FORMULA_START);
      // Every text field carried the prefix, so every one of them was guarded.
      expect(cells.filter((c) => c.startsWith(`'${p}`)).length).toBeGreaterThanOrEqual(8);
    }
  });

  it("imports its own export back: the labels a spreadsheet would run come back as typed", () => {
    for (const p of ["=", "+", "-", "@"]) {
      const studs = EXAMPLE_CASE.studs.map((s, i) => ({ ...s, label: `${p}stud${i}` }));
      // A pocket's cell keeps "@" for its start depth ("label @3: outline"), so a pocket label cannot hold one.
      const pocketLabel = p === "@" ? "pocket" : `${p}pocket`;
      const pockets = EXAMPLE_CASE.pockets.map((x) => ({ ...x, label: pocketLabel }));
      const csv = toCsv(CSV_HEADERS.cases, [caseCells(`${p}Case`, `${p}notes`, { ...EXAMPLE_CASE, studs, pockets }, [46.02, 46.05])]);
      const reading = readLibraryCsv("cases", csv);
      expect(reading.rows).toEqual([{ line: 2, ok: true, name: `${p}Case` }]);
      const [body] = reading.good as { name: string; notes?: string; data: typeof EXAMPLE_CASE; mouthReadingsMm?: number[] }[];
      expect(body.notes).toBe(`${p}notes`);
      expect(body.data.studs).toEqual(studs);
      expect(body.data.pockets.map((x) => x.label)).toEqual([pocketLabel]);
      expect(body.data.deck).toEqual(EXAMPLE_CASE.deck);
      expect(body.mouthReadingsMm).toEqual([46.02, 46.05]);
    }
  });

  it("reports a bad cell by its column and line", () => {
    const cells = kitCells("Kit", "", EXAMPLE_KIT);
    cells[CSV_HEADERS.kits.indexOf("bore_mm")] = "52,5";
    const reading = readLibraryCsv("kits", toCsv(CSV_HEADERS.kits, [kitCells("Good", "", EXAMPLE_KIT), cells]));
    expect(reading.rows.map((r) => [r.line, r.ok])).toEqual([[2, true], [3, false]]);
    expect(reading.rows[1].errors?.bore_mm).toMatch(/point for decimals/);
  });
});
