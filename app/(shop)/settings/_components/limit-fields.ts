import { LIMIT_TERM } from "@/model/glossary";
import { fromUnits, lengthFieldText } from "@/model/units";

// The shop's limits as fields: which there are, their words, and their text read back into the core's units.

export type LengthKey = "minRadialClearanceMm" | "minDepthClearanceMm" | "minSealingLandMm" | "minWallMm" | "studToleranceMm" | "hardwareMarginMm" | "maxRockMm" | "minCrankClearanceMm";
export type SpeedKey = "cuttingSpeedMinMPerMin" | "cuttingSpeedMaxMPerMin";
export type Key = LengthKey | SpeedKey | "displacementClassesCc";

/** Each limit the shop sets, in the form's order, and what kind of figure it is. */
const KINDS: Record<Key, "length" | "speed" | "classes"> = {
  minRadialClearanceMm: "length",
  minDepthClearanceMm: "length",
  minSealingLandMm: "length",
  minWallMm: "length",
  minCrankClearanceMm: "length",
  studToleranceMm: "length",
  hardwareMarginMm: "length",
  maxRockMm: "length",
  cuttingSpeedMinMPerMin: "speed",
  cuttingSpeedMaxMPerMin: "speed",
  displacementClassesCc: "classes",
};

// Each limit's name and why, the same words as the study page (model/glossary.ts).
export const FIELDS: ReadonlyArray<{ key: Key; label: string; kind: "length" | "speed" | "classes"; why: string }> = (Object.keys(KINDS) as Key[]).map((key) => ({
  key,
  label: LIMIT_TERM[key].label,
  kind: KINDS[key],
  why: LIMIT_TERM[key].hint,
}));

const FIELD_OF = Object.fromEntries(FIELDS.map((f) => [f.key, f])) as Record<Key, (typeof FIELDS)[number]>;

export type Limits = Record<LengthKey | SpeedKey, number> & { displacementClassesCc: number[] };

const round = (v: number, places: number) => String(Math.round(v * 10 ** places) / 10 ** places);

/** A limit as its field shows it, in the shop's units for a length. */
export function show(key: Key, value: number | number[], units: "mm" | "in"): string {
  if (Array.isArray(value)) return value.join(", ");
  return FIELD_OF[key].kind === "length" ? lengthFieldText(value, units) : round(value, 3);
}

/** The reason a typed value cannot be used, or the value in the core's units. */
export function read(key: Key, text: string, units: "mm" | "in"): { value?: number | number[]; error?: string } {
  const field = FIELD_OF[key];
  if (/\d,\d/.test(text) && field.kind !== "classes") return { error: `Use a point for decimals: ${text.replace(",", ".")}` };
  if (field.kind === "classes") {
    const parts = text.split(/[,\s]+/).filter(Boolean).map(Number);
    if (parts.some((n) => !Number.isFinite(n) || n <= 0)) return { error: "List positive numbers of cc, separated by commas: 50, 125" };
    return { value: parts };
  }
  const n = Number(text.trim());
  if (!text.trim() || !Number.isFinite(n)) return { error: "Enter a number." };
  if (n < 0) return { error: "It cannot be negative." };
  const value = field.kind === "length" ? fromUnits(n, units) : n;
  if (field.kind === "length" && value > 100) return { error: "That is more than 100 mm; check the units." };
  if (field.kind === "speed" && (value <= 0 || value > 5000)) return { error: "Between 1 and 5000 m/min." };
  return { value };
}
