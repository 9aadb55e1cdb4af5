import { formatFractionalInches, inToMm, mmToIn, toFractionalInches, type LengthUnits } from "@/geometry/units";

// The one place that turns the core's millimetres into text and typed text back into millimetres.
// Names say what they hold: `…Mm` a number in mm, `…Text` what was typed or what a field shows,
// `…Label` a figure with its unit for a label, a result or a table, `…Pdf` the same in the characters a
// PDF's number font prints. Inches are decimal to 0.001 (what an inch caliper reads) wherever a
// measurement is set or compared; fractions only for a part sold by a fraction.

export type { LengthUnits };

/** Decimals of a length shown to a user: 0.01 mm or 0.001 in. */
export const LENGTH_DIGITS: Readonly<Record<LengthUnits, number>> = { mm: 2, in: 3 };

/** Decimals of a length written into a field: mm to 0.001, inches to 0.001 (trailing zeros dropped). */
export const FIELD_DIGITS: Readonly<Record<LengthUnits, number>> = { mm: 3, in: 3 };

/** The unit's short name as shown beside a figure or a field. */
export const UNIT_TEXT: Readonly<Record<LengthUnits, string>> = { mm: "mm", in: "in" };

/** The true minus sign (U+2212), for figures on screen. */
export const MINUS = "\u2212";

const isNumber = (v: number | null | undefined): v is number => typeof v === "number" && Number.isFinite(v);

/** Fixed decimals with a true minus and no "−0.00". */
export function fixedText(v: number, digits: number, minus = MINUS): string {
  const t = Math.abs(v).toFixed(digits);
  return v < 0 && Number(t) !== 0 ? `${minus}${t}` : t;
}

/** A length in the given units as a plain number (inches are the exact inch of geometry/units.ts). */
export function toUnits(mm: number, units: LengthUnits): number {
  return units === "in" ? mmToIn(mm) : mm;
}

/** Millimetres from a number in the given units. */
export function fromUnits(value: number, units: LengthUnits): number {
  return units === "in" ? inToMm(value) : value;
}

/** A length in mm rounded to what the user sees (0.01 mm or 0.001 in), still in mm: compare and set what is shown. */
export function roundedMm(mm: number, units: LengthUnits): number {
  const f = 10 ** LENGTH_DIGITS[units];
  return fromUnits(Math.round(toUnits(mm, units) * f) / f, units);
}

// ——— Fields ———

/** A length in mm as a field shows it, in the field's units, without the unit and without trailing zeros ("55.1", "2.169"). */
export function lengthFieldText(mm: number | null | undefined, units: LengthUnits): string {
  if (!isNumber(mm)) return "";
  return String(Number(toUnits(mm, units).toFixed(FIELD_DIGITS[units])));
}

/** Any number as field text (a count, a price, a speed). */
export function numberFieldText(v: number | null | undefined): string {
  return isNumber(v) ? String(v) : "";
}

/** What a field holds once read: a number (undefined when empty), or what is wrong in words. */
export type NumberParse = { ok: true; value: number | undefined } | { ok: false; message: string };

const PLAIN = /^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i;
const COMMA_DECIMAL = /^[+-]?\d*,\d+$/;
const FRACTION = /^(?:(\d+)[\s-]+)?(\d+)\/(\d+)\s*(?:"|in)?$/;

/**
 * Reads a number as people type it: "54.5", ".5", "-3", "−3" (a true minus); in inches also "1 13/16"
 * or "13/16". A comma decimal ("54,5") gets its own message so nobody wonders why the value vanished.
 */
export function parseNumberText(text: string | undefined, opts: { inches?: boolean } = {}): NumberParse {
  const raw = (text ?? "").trim().replace(/^[\u2212\u2013]/, "-");
  const t = raw.replace(/\s*(mm|in|")$/i, "");
  if (t === "") return { ok: true, value: undefined };
  if (COMMA_DECIMAL.test(t)) return { ok: false, message: `use a point for decimals: ${t.replace(",", ".")}` };
  if (PLAIN.test(t)) return { ok: true, value: Number(t) };
  const f = opts.inches ? FRACTION.exec(raw) : null;
  if (f) {
    const den = Number(f[3]);
    if (den === 0) return { ok: false, message: "a fraction cannot have 0 below the line" };
    return { ok: true, value: Number(f[1] ?? 0) + Number(f[2]) / den };
  }
  if (/,/.test(t)) return { ok: false, message: "use a point for decimals and no thousands separator, like 1250.5" };
  return { ok: false, message: opts.inches ? "enter a number, like 2.125 or 2 1/8" : "enter a number, like 54.5" };
}

/** A length typed in the given units, in millimetres. */
export function parseLengthText(text: string | undefined, units: LengthUnits): NumberParse {
  const r = parseNumberText(text, { inches: units === "in" });
  if (!r.ok || r.value === undefined) return r;
  return { ok: true, value: fromUnits(r.value, units) };
}

// ——— Labels, results and tables ———

/** A length with its unit: "55.10 mm", "2.169 in", "−0.30 mm"; "—" when there is none. */
export function lengthLabel(mm: number | null | undefined, units: LengthUnits): string {
  if (!isNumber(mm)) return "—";
  return `${fixedText(toUnits(mm, units), LENGTH_DIGITS[units])} ${UNIT_TEXT[units]}`;
}

/** A clearance with its sign spelled out: "+0.52 mm" clears, "−0.31 mm" interferes. */
export function signedLengthLabel(mm: number | null | undefined, units: LengthUnits): string {
  if (!isNumber(mm)) return "—";
  const t = lengthLabel(Math.abs(mm), units);
  return Number(toUnits(mm, units).toFixed(LENGTH_DIGITS[units])) < 0 ? `${MINUS}${t}` : `+${t}`;
}

/** A length as a record of changes keeps it, always in mm and without the unit: at least one decimal, at most three ("54.0", "54.125"). */
export function recordMmText(mm: number): string {
  return Number.isInteger(mm) ? mm.toFixed(1) : String(Number(mm.toFixed(3)));
}

/** An axis tick: the number only, in the given units, to 0.1 mm or 0.001 in, trailing zeros dropped ("54.5", "2.125"). */
export function tickText(mm: number, units: LengthUnits): string {
  return String(Number(toUnits(mm, units).toFixed(units === "in" ? 3 : 1)));
}

/** An angle in degrees to 0.001°: "0.125°". */
export function angleLabel(deg: number): string {
  return `${fixedText(deg, 3)}°`;
}

/** A diameter: "Ø 55.10 mm". */
export function diameterLabel(mm: number | null | undefined, units: LengthUnits): string {
  return `Ø ${lengthLabel(mm, units)}`;
}

/** A length for a part sold by a fraction of an inch ('1 13/16"'), in mm for mm users. */
export function soldByFractionLabel(mm: number, units: LengthUnits, denominator = 64): string {
  return units === "in" ? formatFractionalInches(toFractionalInches(mmToIn(mm), denominator)) : lengthLabel(mm, units);
}

/** An area: "12.3 mm²" or "0.019 in²". */
export function areaLabel(mm2: number, units: LengthUnits): string {
  return units === "in" ? `${fixedText(mmToIn(mmToIn(mm2)), 3)} in²` : `${fixedText(mm2, 1)} mm²`;
}

/** A volume: "12.34 cm³" or "0.753 in³". */
export function volumeLabel(mm3: number, units: LengthUnits): string {
  return units === "in" ? `${fixedText(mmToIn(mmToIn(mmToIn(mm3))), 3)} in³` : `${fixedText(mm3 / 1000, 2)} cm³`;
}

/** Feet per minute from metres per minute (1 ft = 12 in). */
export function mPerMinToFtPerMin(mPerMin: number): number {
  return mmToIn(mPerMin * 1000) / 12;
}

/** Metres per minute from feet per minute. */
export function ftPerMinToMPerMin(ftPerMin: number): number {
  return inToMm(ftPerMin * 12) / 1000;
}

/** A cutting speed: "180 m/min" or "591 sfm" (surface feet per minute). */
export function speedLabel(mPerMin: number, units: LengthUnits): string {
  return units === "in" ? `${Math.round(mPerMinToFtPerMin(mPerMin))} sfm` : `${Math.round(mPerMin)} m/min`;
}

/** The unit of a cutting speed. */
export const SPEED_UNIT_TEXT: Readonly<Record<LengthUnits, string>> = { mm: "m/min", in: "sfm" };

// ——— PDF ———

/** A length for a PDF: as a label, with an ASCII minus the PDF's number font has. */
export function lengthPdf(mm: number | null | undefined, units: LengthUnits): string {
  return lengthLabel(mm, units).replace(MINUS, "-");
}

// ——— Messages ———

const MM_FIGURE = /([-\u2212]?\d+(?:\.\d+)?) ?mm(²|³)?(?![a-z])/g;
const SPEED_FIGURE = /(\d+(?:\.\d+)?) ?m\/min/g;

/**
 * A message of the core (written in mm) in the user's units: every "3.50 mm", "12.0 mm²" and
 * "180 m/min" rewritten with the labels above; in mm only the minus signs are made true.
 */
export function messageInUnits(message: string, units: LengthUnits): string {
  return message
    .replace(MM_FIGURE, (_, n: string, power: string | undefined) => {
      const v = Number(n.replace(MINUS, "-"));
      if (power === "²") return areaLabel(v, units);
      if (power === "³") return volumeLabel(v, units);
      return lengthLabel(v, units);
    })
    .replace(SPEED_FIGURE, (_, n: string) => speedLabel(Number(n), units));
}

/** A limit or a bound a value is compared with, as typed in a field plus its unit: "200 mm", "7.874 in". */
export function boundLabel(mm: number, units: LengthUnits): string {
  return `${lengthFieldText(mm, units)} ${UNIT_TEXT[units]}`;
}
