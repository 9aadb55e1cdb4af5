import { CsvError, parse } from "csv-parse/sync";
import { stringify } from "csv-stringify/sync";

// CSV text (RFC 4180) through csv-parse and csv-stringify, and the one formula neutraliser every exported
// cell goes through.

/** One record of a CSV, with the line it starts on (a quoted cell may hold line breaks). */
export type CsvRecord = { line: number; cells: string[] };

/** The CSV text could not be read as CSV (an unclosed quote, say). */
export class CsvTextError extends Error {}

const LINE_BREAK = /\r\n|\r|\n/g;
const breaksIn = (cell: string) => cell.match(LINE_BREAK)?.length ?? 0;

/** Splits CSV text into records; rows with nothing but blanks are skipped. */
export function parseCsv(text: string): CsvRecord[] {
  const records: CsvRecord[] = [];
  try {
    parse(text, {
      bom: true,
      relax_column_count: true,
      relax_quotes: true,
      ltrim: true,
      rtrim: true,
      skip_empty_lines: true,
      record_delimiter: ["\r\n", "\n", "\r"],
      // context.lines is the line the record ends on; its cells' own line breaks lead back to where it starts.
      on_record: (cells: string[], context) => {
        if (cells.some((cell) => cell.trim() !== "")) records.push({ line: context.lines - cells.reduce((n, cell) => n + breaksIn(cell), 0), cells });
        return null;
      },
    });
  } catch (error) {
    if (error instanceof CsvError) throw new CsvTextError(`The CSV cannot be read: ${error.message}`);
    throw error;
  }
  return records;
}

// A spreadsheet runs a cell that starts with one of these as a formula. Such a cell is written with a
// leading apostrophe (shown as text, never run), which the import drops again.
const FORMULA_START = /^[=+\-@\t\r]/;
const GUARDED = /^'[=+\-@\t\r]/;

/** A cell as written to a CSV: never a formula. */
export const neutralise = (cell: string): string => (FORMULA_START.test(cell) ? `'${cell}` : cell);
/** A cell as read from a CSV: the apostrophe the export put before a formula-like value is dropped. */
export const unneutralise = (cell: string): string => (GUARDED.test(cell) ? cell.slice(1) : cell);

/** CSV text from a header and rows; every cell goes through the formula neutraliser. */
export function toCsv(header: readonly string[], rows: readonly (readonly string[])[]): string {
  return stringify([header, ...rows].map((r) => r.map(neutralise)), { record_delimiter: "\r\n", quoted_match: /[\r\n]/ });
}
