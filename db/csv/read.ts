import type { CaseCreate, CsvImportRow, KitCreate, LibraryCsvKind } from "@/model/schemas";
import { CellError } from "./cells";
import { COLUMNS, CSV_HEADERS, SCHEMAS, columnOf, setPath } from "./columns";
import { parseCsv, unneutralise } from "./text";

// Reading a library CSV: the header is checked first (missing, unknown or doubled columns), then every row,
// each bad cell reported by its column, each good row parsed into a create body. Pure: nothing is written.

export const MAX_CSV_ROWS = 2000;

/** The rows' report and the create bodies of the good rows; `refused` says why the CSV as a whole cannot be read. */
export type CsvReading = { rows: CsvImportRow[]; good: (CaseCreate | KitCreate)[]; refused?: { message: string; fields: Record<string, string> } };

export function readLibraryCsv(kind: LibraryCsvKind, csv: string): CsvReading {
  const [header, ...body] = parseCsv(csv);
  if (!header) return { rows: [], good: [], refused: { message: "The CSV is empty: it needs a header row and at least one row.", fields: { csv: "empty" } } };
  const names = header.cells.map((h) => h.trim().toLowerCase());
  const columns = COLUMNS[kind];
  const headerErrors: Record<string, string> = {};
  for (const c of columns) if (c.required && !names.includes(c.name)) headerErrors[c.name] = "This column is missing from the header row.";
  names.forEach((n, i) => {
    if (n !== "" && !columns.some((c) => c.name === n)) headerErrors[n] = `Unknown column "${header.cells[i].trim()}"; the columns are: ${CSV_HEADERS[kind].join(", ")}.`;
  });
  const dupes = names.filter((n, i) => n !== "" && names.indexOf(n) !== i);
  for (const d of dupes) headerErrors[d] = "This column appears twice in the header row.";
  if (Object.keys(headerErrors).length > 0) return { rows: [{ line: header.line, ok: false, errors: headerErrors }], good: [] };
  if (body.length > MAX_CSV_ROWS) return { rows: [], good: [], refused: { message: `Import at most ${MAX_CSV_ROWS} rows at a time.`, fields: { csv: "too many rows" } } };

  const rows: CsvImportRow[] = [];
  const good: (CaseCreate | KitCreate)[] = [];
  for (const record of body) {
    const errors: Record<string, string> = {};
    const value: Record<string, unknown> = {};
    if (record.cells.length > names.length && record.cells.slice(names.length).some((c) => c.trim() !== "")) {
      errors.row = `This row has ${record.cells.length} cells; the header has ${names.length}.`;
    }
    names.forEach((n, i) => {
      const column = columns.find((c) => c.name === n);
      const cell = unneutralise((record.cells[i] ?? "").trim());
      if (!column || cell.trim() === "") return;
      try {
        setPath(value, column.path, column.read(cell));
      } catch (error) {
        // A cell in the wrong format is reported against its column; anything else is a defect and propagates.
        if (!(error instanceof CellError)) throw error;
        errors[column.name] = error.message;
      }
    });
    const name = typeof value.name === "string" ? value.name : undefined;
    if (Object.keys(errors).length === 0) {
      const parsed = SCHEMAS[kind].safeParse(value);
      if (parsed.success) {
        good.push(parsed.data as CaseCreate | KitCreate);
        rows.push({ line: record.line, ok: true, name });
        continue;
      }
      for (const issue of parsed.error.issues) {
        const col = columnOf(kind, issue.path.map(String).join("."));
        const missing = issue.code === "invalid_type" && /received undefined/.test(issue.message);
        errors[col] ??= missing ? "This cell is required." : issue.message;
      }
    }
    rows.push({ line: record.line, ok: false, errors, name });
  }
  return { rows, good };
}
