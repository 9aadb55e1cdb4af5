import type { z } from "zod";
import { CaseCreateSchema, KitCreateSchema, type CaseData, type KitData, type LibraryCsvKind } from "@/model/schemas";
import { amountText, CURRENCY_CODES, parseAmount, type CurrencyCode, type Money } from "@/model/money";
import { CellError, fmt, numList, num, outline, outlineText, pockets, pocketsText, studs, studsText, yesNo } from "./cells";

// The columns of the library CSV: where each cell goes in a create body, and a library row as cells.
// The formula neutraliser is applied to every cell when the CSV is written (text.ts), not here.

export type Column = {
  name: string;
  required: boolean;
  /** Where the cell's value goes in the create body (dotted path), and the body paths it answers for. */
  path: string;
  read: (text: string) => unknown;
};

const text = (t: string) => t.trim();

/** A price cell: the amount and its ISO 4217 code, "289.00 EUR" (money, never a bare number). */
function price(t: string): Money {
  const m = /^\s*([\d.,\s]+?)\s*([A-Za-z]{3})\s*$/.exec(t);
  if (!m) throw new CellError(`"${t.trim()}": write the price with its currency code, e.g. 289.00 EUR`);
  const currency = m[2].toUpperCase();
  if (!(CURRENCY_CODES as readonly string[]).includes(currency)) throw new CellError(`"${m[2]}": a currency code of ${CURRENCY_CODES.join(", ")}`);
  const amountMinor = parseAmount(m[1], currency);
  if (amountMinor === null) throw new CellError(`"${m[1].trim()}" is not an amount in ${currency}`);
  return { amountMinor, currency: currency as CurrencyCode };
}
const priceText = (p: Money) => `${amountText(p.amountMinor, p.currency)} ${p.currency}`;

// The columns both tables have, each read the same way into the same place.
const NAME: Column = { name: "name", required: true, path: "name", read: text };
const NOTES: Column = { name: "notes", required: false, path: "notes", read: text };
const STUDS: Column = { name: "studs", required: true, path: "data.studs", read: studs };
const STUD_THREAD: Column = { name: "stud_thread", required: false, path: "data.studThread", read: text };

const CASE_COLUMNS: Column[] = [
  NAME,
  NOTES,
  { name: "deck", required: true, path: "data.deck", read: outline },
  { name: "mouth", required: true, path: "data.mouth.outline", read: outline },
  { name: "mouth_depth_mm", required: true, path: "data.mouth.depthMm", read: num },
  { name: "mouth_readings_mm", required: false, path: "mouthReadingsMm", read: numList },
  STUDS,
  { name: "stud_hole_diameter_mm", required: true, path: "data.studHoleDiameterMm", read: num },
  STUD_THREAD,
  { name: "pockets", required: false, path: "data.pockets", read: pockets },
  { name: "stock_bore_mm", required: true, path: "data.stockBoreMm", read: num },
  { name: "stroke_mm", required: true, path: "data.strokeMm", read: num },
  { name: "cylinders", required: false, path: "data.cylinders", read: num },
  { name: "density_g_per_cm3", required: false, path: "data.densityGPerCm3", read: num },
];

const KIT_COLUMNS: Column[] = [
  NAME,
  NOTES,
  { name: "bore_mm", required: true, path: "data.boreMm", read: num },
  { name: "stroke_mm", required: false, path: "data.strokeMm", read: num },
  { name: "skirt_diameter_readings_mm", required: true, path: "data.skirtDiameterReadingsMm", read: numList },
  { name: "skirt_length_readings_mm", required: true, path: "data.skirtLengthReadingsMm", read: numList },
  STUDS,
  STUD_THREAD,
  { name: "base_gaskets_mm", required: false, path: "data.baseGasketsMm", read: numList },
  { name: "always_with_gasket", required: false, path: "data.alwaysWithGasket", read: yesNo },
  { name: "price", required: false, path: "data.price", read: price },
];

export const COLUMNS: Record<LibraryCsvKind, Column[]> = { cases: CASE_COLUMNS, kits: KIT_COLUMNS };
export const SCHEMAS: Record<LibraryCsvKind, z.ZodType> = { cases: CaseCreateSchema, kits: KitCreateSchema };

export const CSV_HEADERS: Record<LibraryCsvKind, string[]> = { cases: CASE_COLUMNS.map((c) => c.name), kits: KIT_COLUMNS.map((c) => c.name) };

export function setPath(target: Record<string, unknown>, path: string, value: unknown) {
  const keys = path.split(".");
  let at = target;
  for (const k of keys.slice(0, -1)) {
    at[k] ??= {};
    at = at[k] as Record<string, unknown>;
  }
  at[keys[keys.length - 1]] = value;
}

/** The column a body path came from (the longest column path that starts it). */
export function columnOf(kind: LibraryCsvKind, path: string): string {
  const hit = COLUMNS[kind]
    .filter((c) => path === c.path || path.startsWith(`${c.path}.`))
    .sort((a, b) => b.path.length - a.path.length)[0];
  if (hit) return hit.name;
  if (path.startsWith("data.mouth")) return "mouth";
  return path || "row";
}

// ── Rows of the library as cells ────────────────────────────────────────────────────────────────

export function caseCells(name: string, notes: string, data: CaseData, mouthReadings: number[]): string[] {
  return [
    name,
    notes,
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

export function kitCells(name: string, notes: string, d: KitData): string[] {
  return [
    name,
    notes,
    fmt(d.boreMm),
    d.strokeMm === undefined ? "" : fmt(d.strokeMm),
    d.skirtDiameterReadingsMm.map(fmt).join("; "),
    d.skirtLengthReadingsMm.map(fmt).join("; "),
    studsText(d.studs),
    d.studThread ?? "",
    d.baseGasketsMm.map(fmt).join("; "),
    d.alwaysWithGasket ? "yes" : "no",
    d.price === undefined ? "" : priceText(d.price),
  ];
}

export const EXAMPLE_CASE: CaseData = {
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
export const EXAMPLE_KIT: KitData = {
  boreMm: 47,
  skirtDiameterReadingsMm: [53.92, 53.96],
  skirtLengthReadingsMm: [24.6, 24.7],
  studs: EXAMPLE_CASE.studs,
  studThread: "M7",
  baseGasketsMm: [0.2, 0.4],
  alwaysWithGasket: false,
  price: { amountMinor: 28900, currency: "EUR" },
};
