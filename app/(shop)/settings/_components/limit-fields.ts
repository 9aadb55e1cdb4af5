import { LIMIT_TERM } from "@/model/glossary";
import { fromUnits, lengthFieldText } from "@/model/units";

// The shop's limits as fields: which there are, their words, and their text read back into the core's units.

export type LengthKey = "minRadialClearanceMm" | "minDepthClearanceMm" | "minSealingLandMm" | "minWallMm" | "studToleranceMm" | "hardwareMarginMm" | "maxRockMm" | "minCrankClearanceMm";
export type SpeedKey = "cuttingSpeedMinMPerMin" | "cuttingSpeedMaxMPerMin";
export type Key = LengthKey | SpeedKey | "displacementClassesCc";

// Each limit's name and why, the same words as the study page (model/glossary.ts).
export const FIELDS: Array<{ key: Key; label: string; kind: "length" | "speed" | "classes"; why: string }> = [
  { key: "minRadialClearanceMm", label: LIMIT_TERM.minRadialClearanceMm.label, kind: "length", why: LIMIT_TERM.minRadialClearanceMm.hint },
  { key: "minDepthClearanceMm", label: LIMIT_TERM.minDepthClearanceMm.label, kind: "length", why: LIMIT_TERM.minDepthClearanceMm.hint },
  { key: "minSealingLandMm", label: LIMIT_TERM.minSealingLandMm.label, kind: "length", why: LIMIT_TERM.minSealingLandMm.hint },
  { key: "minWallMm", label: LIMIT_TERM.minWallMm.label, kind: "length", why: LIMIT_TERM.minWallMm.hint },
  { key: "minCrankClearanceMm", label: LIMIT_TERM.minCrankClearanceMm.label, kind: "length", why: LIMIT_TERM.minCrankClearanceMm.hint },
  { key: "studToleranceMm", label: LIMIT_TERM.studToleranceMm.label, kind: "length", why: LIMIT_TERM.studToleranceMm.hint },
  { key: "hardwareMarginMm", label: LIMIT_TERM.hardwareMarginMm.label, kind: "length", why: LIMIT_TERM.hardwareMarginMm.hint },
  { key: "maxRockMm", label: LIMIT_TERM.maxRockMm.label, kind: "length", why: LIMIT_TERM.maxRockMm.hint },
  { key: "cuttingSpeedMinMPerMin", label: LIMIT_TERM.cuttingSpeedMinMPerMin.label, kind: "speed", why: LIMIT_TERM.cuttingSpeedMinMPerMin.hint },
  { key: "cuttingSpeedMaxMPerMin", label: LIMIT_TERM.cuttingSpeedMaxMPerMin.label, kind: "speed", why: LIMIT_TERM.cuttingSpeedMaxMPerMin.hint },
  { key: "displacementClassesCc", label: LIMIT_TERM.displacementClassesCc.label, kind: "classes", why: LIMIT_TERM.displacementClassesCc.hint },
];

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
