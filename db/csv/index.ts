import "server-only";
import { and, asc, eq, isNull } from "drizzle-orm";
import type { CsvImportResult, LibraryCsvKind } from "@/model/schemas";
import type { Caller } from "../access";
import { getDb } from "../client";
import { DataError } from "../errors";
import { toRow } from "../library";
import { insertLibraryStmt, newLibraryValues } from "../library-writes";
import { assertStaff, runBatch } from "../rows";
import * as schema from "../schema";
import { CSV_HEADERS, EXAMPLE_CASE, EXAMPLE_KIT, caseCells, kitCells } from "./columns";
import { readLibraryCsv } from "./read";
import { CsvTextError, toCsv } from "./text";

// The library as CSV: a template, an export, and an import that checks every row, reports each bad
// cell by its column, and writes the good rows only when the user confirms, all in one batch.
// Cell formats: cells.ts; columns: columns.ts; CSV text and the formula neutraliser: text.ts.

export { CSV_HEADERS } from "./columns";
export { MAX_CSV_ROWS } from "./read";

/** A CSV with the header row and one example row, to fill in. */
export function csvTemplate(kind: LibraryCsvKind): string {
  const row =
    kind === "cases"
      ? caseCells("Example two-stroke case, four studs", "measured with calipers", EXAMPLE_CASE, [46.02, 46.05])
      : kitCells("Example 47 mm kit", "", EXAMPLE_KIT);
  return toCsv(CSV_HEADERS[kind], [row]);
}

/** The shop's live case profiles or kits as CSV, in the template's columns. */
export async function exportLibraryCsv(caller: Caller, kind: LibraryCsvKind): Promise<string> {
  assertStaff(caller);
  const db = await getDb();
  if (kind === "cases") {
    const t = schema.caseProfile;
    const rows = await db.select().from(t).where(and(eq(t.organizationId, caller.shopId), isNull(t.archivedAt))).orderBy(asc(t.name), asc(t.id));
    return toCsv(
      CSV_HEADERS.cases,
      rows.map((r) => toRow("cases", r, "")).map((r) => caseCells(r.name, r.notes, r.data, r.mouthReadingsMm.map((x) => x.valueMm))),
    );
  }
  const t = schema.cylinderKit;
  const rows = await db.select().from(t).where(and(eq(t.organizationId, caller.shopId), isNull(t.archivedAt))).orderBy(asc(t.name), asc(t.id));
  return toCsv(CSV_HEADERS.kits, rows.map((r) => toRow("kits", r, "")).map((r) => kitCells(r.name, r.notes, r.data)));
}

/** Checks every row of a CSV; with confirm, writes the good ones (all in one batch) and says how many. */
export async function importLibraryCsv(caller: Caller, kind: LibraryCsvKind, csv: string, confirm: boolean): Promise<CsvImportResult> {
  assertStaff(caller);
  let reading;
  try {
    reading = readLibraryCsv(kind, csv);
  } catch (error) {
    if (error instanceof CsvTextError) throw new DataError("invalid_input", error.message, { csv: error.message });
    throw error;
  }
  if (reading.refused) throw new DataError("invalid_input", reading.refused.message, reading.refused.fields);
  const { rows, good } = reading;
  if (!confirm || good.length === 0) return { rows, written: 0 };
  const now = Date.now();
  await runBatch(good.map((b) => insertLibraryStmt(kind, newLibraryValues(caller, kind, b, now))));
  return { rows, written: good.length };
}
