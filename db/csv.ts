import "server-only";
import { and, asc, eq, isNull } from "drizzle-orm";
import type { z } from "zod";
import type { Outline, Pocket, Stud } from "@/geometry";
import {
  CaseCreateSchema,
  KitCreateSchema,
  type CaseCreate,
  type CaseData,
  type CsvImportResult,
  type CsvImportRow,
  type KitCreate,
  type KitData,
  type LibraryCsvKind,
} from "@/model/schemas";
import type { Caller } from "./access";
import { getDb } from "./client";
import { DataError } from "./errors";
import { insertLibraryStmt, newLibraryValues } from "./library-writes";
import { assertStaff, parseStoredReadings, runBatch } from "./rows";
import * as schema from "./schema";

// The library as CSV: a template, an export, and an import that checks every row, reports each bad
// cell by its column, and writes the good rows only when the user confirms, all in one batch.
//
// Cell formats (our own, chosen to be typed by hand in a spreadsheet):
//   numbers       a point for decimals: 46.5
//   lists         values separated by semicolons: 53.92; 53.96
//   outline       "circle 46" or "circle 46 at 0.5 -0.2" (diameter, then centre), or a polygon as points
//                 "x y, x y, x y"
//   studs         "label: x y; label: x y"
//   pockets       "label: outline | label @depth: outline" (depth below the deck where it starts, mm)
//   yes/no        yes, no, true, false, 1, 0

// ── RFC 4180 CSV ────────────────────────────────────────────────────────────────────────────────

export type CsvRecord = { line: number; cells: string[] };

/** Splits CSV text into records, each with the line it starts on; quoted cells may hold commas, quotes and line breaks. */
export function parseCsv(text: string): CsvRecord[] {
  const records: CsvRecord[] = [];
  let cells: string[] = [];
  let cell = "";
  let quoted = false;
  let line = 1;
  let start = 1;
  let i = text.charCodeAt(0) === 0xfeff ? 1 : 0;
  const endRecord = () => {
    cells.push(cell);
    if (!(cells.length === 1 && cells[0].trim() === "")) records.push({ line: start, cells });
    cells = [];
    cell = "";
  };
  for (; i < text.length; i++) {
    const ch = text[i];
    if (quoted) {
      if (ch === '"') {
        if (text[i + 1] === '"') {
          cell += '"';
          i++;
        } else quoted = false;
      } else {
        if (ch === "\n") line++;
        cell += ch;
      }
    } else if (ch === '"' && cell.trim() === "") {
      quoted = true;
      cell = "";
    } else if (ch === ",") {
      cells.push(cell);
      cell = "";
    } else if (ch === "\n" || ch === "\r") {
      if (ch === "\r" && text[i + 1] === "\n") i++;
      endRecord();
      line++;
      start = line;
    } else cell += ch;
  }
  if (cell !== "" || cells.length > 0) endRecord();
  return records;
}

// Cells a spreadsheet would run as a formula are written with a leading apostrophe, which import drops.
const FORMULA = /^[=+\-@\t\r]/;
const guardText = (v: string) => (FORMULA.test(v) ? `'${v}` : v);
const unguardText = (v: string) => (/^'[=+\-@\t\r]/.test(v) ? v.slice(1) : v);

function csvCell(v: string): string {
  return /[",\r\n]/.test(v) ? `"${v.replace(/"/g, '""')}"` : v;
}
export function toCsv(header: readonly string[], rows: readonly string[][]): string {
  return [header, ...rows].map((r) => r.map(csvCell).join(",")).join("\r\n") + "\r\n";
}

// ── Cell formats ────────────────────────────────────────────────────────────────────────────────

class CellError extends Error {}

const NUMBER = /^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/;
function num(text: string): number {
  const t = text.trim();
  if (/^[-+]?\d+,\d+$/.test(t)) throw new CellError(`"${t}": use a point for decimals, not a comma`);
  if (!NUMBER.test(t)) throw new CellError(`"${t}" is not a number`);
  return Number(t);
}
const fmt = (n: number) => String(n);
const list = (text: string) =>
  text
    .split(";")
    .map((x) => x.trim())
    .filter((x) => x !== "");
const numList = (text: string) => list(text).map(num);
const point = (text: string): [number, number] => {
  const parts = text.trim().split(/\s+/);
  if (parts.length !== 2) throw new CellError(`"${text.trim()}": a point is two numbers, x and y, separated by a space`);
  return [num(parts[0]), num(parts[1])];
};

function outline(text: string): Outline {
  const t = text.trim();
  const circle = /^circle\s+(\S+)(?:\s+at\s+(\S+)\s+(\S+))?$/i.exec(t);
  if (circle) {
    const o: Outline = { kind: "circle", diameterMm: num(circle[1]) };
    if (circle[2] !== undefined) o.centerMm = [num(circle[2]), num(circle[3])];
    return o;
  }
  if (/^circle\b/i.test(t)) throw new CellError(`"${t}": write a circle as "circle 46" or "circle 46 at 0 0"`);
  return { kind: "polygon", pointsMm: t.split(",").map(point) };
}
function outlineText(o: Outline): string {
  if (o.kind === "circle") return o.centerMm ? `circle ${fmt(o.diameterMm)} at ${fmt(o.centerMm[0])} ${fmt(o.centerMm[1])}` : `circle ${fmt(o.diameterMm)}`;
  return o.pointsMm.map(([x, y]) => `${fmt(x)} ${fmt(y)}`).join(", ");
}

function studs(text: string): Stud[] {
  return list(text).map((entry) => {
    const at = entry.lastIndexOf(":");
    if (at <= 0) throw new CellError(`"${entry}": write each stud as "label: x y"`);
    return { label: entry.slice(0, at).trim(), positionMm: point(entry.slice(at + 1)) };
  });
}
const studsText = (s: readonly Stud[]) => s.map((x) => `${x.label}: ${fmt(x.positionMm[0])} ${fmt(x.positionMm[1])}`).join("; ");

function pockets(text: string): Pocket[] {
  return text
    .split("|")
    .map((x) => x.trim())
    .filter((x) => x !== "")
    .map((entry) => {
      const m = /^([^:@]+?)\s*(?:@\s*(\S+))?\s*:\s*(.+)$/.exec(entry);
      if (!m) throw new CellError(`"${entry}": write each pocket as "label: x y, x y, x y" or "label @3: circle 6 at 30 0"`);
      return { label: m[1].trim(), startDepthMm: m[2] === undefined ? 0 : num(m[2]), outline: outline(m[3]) };
    });
}
const pocketsText = (p: readonly Pocket[]) =>
  p.map((x) => `${x.label}${x.startDepthMm ? ` @${fmt(x.startDepthMm)}` : ""}: ${outlineText(x.outline)}`).join(" | ");

function yesNo(text: string): boolean {
  const t = text.trim().toLowerCase();
  if (["yes", "true", "1", "y"].includes(t)) return true;
  if (["no", "false", "0", "n"].includes(t)) return false;
  throw new CellError(`"${text.trim()}": write yes or no`);
}

// ── Columns ─────────────────────────────────────────────────────────────────────────────────────

type Column = {
  name: string;
  required: boolean;
  /** Where the cell's value goes in the create body (dotted path), and the body paths it answers for. */
  path: string;
  read: (text: string) => unknown;
};

const text = (t: string) => unguardText(t.trim());

const CASE_COLUMNS: Column[] = [
  { name: "name", required: true, path: "name", read: text },
  { name: "notes", required: false, path: "notes", read: text },
  { name: "deck", required: true, path: "data.deck", read: outline },
  { name: "mouth", required: true, path: "data.mouth.outline", read: outline },
  { name: "mouth_depth_mm", required: true, path: "data.mouth.depthMm", read: num },
  { name: "mouth_readings_mm", required: false, path: "mouthReadingsMm", read: numList },
  { name: "studs", required: true, path: "data.studs", read: studs },
  { name: "stud_hole_diameter_mm", required: true, path: "data.studHoleDiameterMm", read: num },
  { name: "stud_thread", required: false, path: "data.studThread", read: (t) => t.trim() },
  { name: "pockets", required: false, path: "data.pockets", read: pockets },
  { name: "stock_bore_mm", required: true, path: "data.stockBoreMm", read: num },
  { name: "stroke_mm", required: true, path: "data.strokeMm", read: num },
  { name: "cylinders", required: false, path: "data.cylinders", read: num },
  { name: "density_g_per_cm3", required: false, path: "data.densityGPerCm3", read: num },
];

const KIT_COLUMNS: Column[] = [
  { name: "name", required: true, path: "name", read: text },
  { name: "notes", required: false, path: "notes", read: text },
  { name: "bore_mm", required: true, path: "data.boreMm", read: num },
  { name: "stroke_mm", required: false, path: "data.strokeMm", read: num },
  { name: "skirt_diameter_readings_mm", required: true, path: "data.skirtDiameterReadingsMm", read: numList },
  { name: "skirt_length_readings_mm", required: true, path: "data.skirtLengthReadingsMm", read: numList },
  { name: "studs", required: true, path: "data.studs", read: studs },
  { name: "stud_thread", required: false, path: "data.studThread", read: (t) => t.trim() },
  { name: "base_gaskets_mm", required: false, path: "data.baseGasketsMm", read: numList },
  { name: "always_with_gasket", required: false, path: "data.alwaysWithGasket", read: yesNo },
  { name: "price", required: false, path: "data.price", read: num },
];

const COLUMNS: Record<LibraryCsvKind, Column[]> = { cases: CASE_COLUMNS, kits: KIT_COLUMNS };
const SCHEMAS: Record<LibraryCsvKind, z.ZodType> = { cases: CaseCreateSchema, kits: KitCreateSchema };

export const CSV_HEADERS: Record<LibraryCsvKind, string[]> = { cases: CASE_COLUMNS.map((c) => c.name), kits: KIT_COLUMNS.map((c) => c.name) };

function setPath(target: Record<string, unknown>, path: string, value: unknown) {
  const keys = path.split(".");
  let at = target;
  for (const k of keys.slice(0, -1)) {
    at[k] ??= {};
    at = at[k] as Record<string, unknown>;
  }
  at[keys[keys.length - 1]] = value;
}

/** The column a body path came from (the longest column path that starts it). */
function columnOf(kind: LibraryCsvKind, path: string): string {
  const hit = COLUMNS[kind]
    .filter((c) => path === c.path || path.startsWith(`${c.path}.`))
    .sort((a, b) => b.path.length - a.path.length)[0];
  if (hit) return hit.name;
  if (path.startsWith("data.mouth")) return "mouth";
  return path || "row";
}

// ── Rows of the library as cells ────────────────────────────────────────────────────────────────

function caseCells(name: string, notes: string, data: CaseData, mouthReadings: number[]): string[] {
  return [
    guardText(name),
    guardText(notes),
    outlineText(data.deck),
    outlineText(data.mouth.outline),
    fmt(data.mouth.depthMm),
    mouthReadings.map(fmt).join("; "),
    studsText(data.studs),
    fmt(data.studHoleDiameterMm),
    data.studThread ?? "",
    pocketsText(data.pockets),
    fmt(data.stockBoreMm),
    fmt(data.strokeMm),
    fmt(data.cylinders),
    data.densityGPerCm3 === undefined ? "" : fmt(data.densityGPerCm3),
  ];
}

function kitCells(name: string, notes: string, d: KitData): string[] {
  return [
    guardText(name),
    guardText(notes),
    fmt(d.boreMm),
    d.strokeMm === undefined ? "" : fmt(d.strokeMm),
    d.skirtDiameterReadingsMm.map(fmt).join("; "),
    d.skirtLengthReadingsMm.map(fmt).join("; "),
    studsText(d.studs),
    d.studThread ?? "",
    d.baseGasketsMm.map(fmt).join("; "),
    d.alwaysWithGasket ? "yes" : "no",
    d.price === undefined ? "" : fmt(d.price),
  ];
}

const EXAMPLE_CASE: CaseData = {
  deck: { kind: "polygon", pointsMm: [[-40, -48], [40, -48], [48, -40], [48, 40], [40, 48], [-40, 48], [-48, 40], [-48, -40]] },
  mouth: { outline: { kind: "circle", diameterMm: 46 }, depthMm: 26 },
  studs: [
    { label: "front left", positionMm: [-28, 28] },
    { label: "front right", positionMm: [28, 28] },
    { label: "rear right", positionMm: [28, -28] },
    { label: "rear left", positionMm: [-28, -28] },
  ],
  studHoleDiameterMm: 7.5,
  studThread: "M7",
  pockets: [{ label: "left transfer", startDepthMm: 0, outline: { kind: "polygon", pointsMm: [[-35, -9], [-30.5, -8], [-30, 0], [-30.5, 8], [-35, 9]] } }],
  stockBoreMm: 40,
  strokeMm: 39.2,
  cylinders: 1,
};
const EXAMPLE_KIT: KitData = {
  boreMm: 47,
  skirtDiameterReadingsMm: [53.92, 53.96],
  skirtLengthReadingsMm: [24.6, 24.7],
  studs: EXAMPLE_CASE.studs,
  studThread: "M7",
  baseGasketsMm: [0.2, 0.4],
  alwaysWithGasket: false,
  price: 289,
};

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
      rows.map((r) => caseCells(r.name, r.notes, JSON.parse(r.dataJson) as CaseData, parseStoredReadings(r.mouthReadingsJson).map((x) => x.valueMm))),
    );
  }
  const t = schema.cylinderKit;
  const rows = await db.select().from(t).where(and(eq(t.organizationId, caller.shopId), isNull(t.archivedAt))).orderBy(asc(t.name), asc(t.id));
  return toCsv(CSV_HEADERS.kits, rows.map((r) => kitCells(r.name, r.notes, JSON.parse(r.dataJson) as KitData)));
}

export const MAX_CSV_ROWS = 2000;

/** Checks every row of a CSV; with confirm, writes the good ones (all in one batch) and says how many. */
export async function importLibraryCsv(caller: Caller, kind: LibraryCsvKind, csv: string, confirm: boolean): Promise<CsvImportResult> {
  assertStaff(caller);
  const records = parseCsv(csv);
  const [header, ...body] = records;
  if (!header) throw new DataError("invalid_input", "The CSV is empty: it needs a header row and at least one row.", { csv: "empty" });
  const names = header.cells.map((h) => h.trim().toLowerCase());
  const columns = COLUMNS[kind];
  const headerErrors: Record<string, string> = {};
  for (const c of columns) if (c.required && !names.includes(c.name)) headerErrors[c.name] = "This column is missing from the header row.";
  names.forEach((n, i) => {
    if (n !== "" && !columns.some((c) => c.name === n)) headerErrors[n] = `Unknown column "${header.cells[i].trim()}"; the columns are: ${CSV_HEADERS[kind].join(", ")}.`;
  });
  const dupes = names.filter((n, i) => n !== "" && names.indexOf(n) !== i);
  for (const d of dupes) headerErrors[d] = "This column appears twice in the header row.";
  if (Object.keys(headerErrors).length > 0) return { rows: [{ line: header.line, ok: false, errors: headerErrors }], written: 0 };
  if (body.length > MAX_CSV_ROWS) throw new DataError("invalid_input", `Import at most ${MAX_CSV_ROWS} rows at a time.`, { csv: "too many rows" });

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
      const cell = record.cells[i] ?? "";
      if (!column || cell.trim() === "") return;
      try {
        setPath(value, column.path, column.read(cell));
      } catch (error) {
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

  if (!confirm || good.length === 0) return { rows, written: 0 };
  const now = Date.now();
  await runBatch(good.map((b) => insertLibraryStmt(kind, newLibraryValues(caller, kind, b, now))));
  return { rows, written: good.length };
}
