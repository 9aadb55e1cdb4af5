import { inToMm, type LengthUnits } from "@/geometry";

/** What a number field holds: the text as typed. Parsing it says what is wrong in words. */
export type NumberParse = { ok: true; value: number | undefined } | { ok: false; message: string };

const PLAIN = /^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i;
const COMMA_DECIMAL = /^[+-]?\d*,\d+$/;
const FRACTION = /^(?:(\d+)[\s-]+)?(\d+)\/(\d+)\s*(?:"|in)?$/;

/**
 * Reads a number as people type it: "54.5", ".5", "-3"; in inches also "1 13/16" or "13/16".
 * A comma decimal ("54,5") gets its own message so nobody wonders why the value vanished.
 */
export function parseNumberText(text: string | undefined, opts: { inches?: boolean } = {}): NumberParse {
  const t = (text ?? "").trim().replace(/\s*(mm|in|")$/i, "");
  if (t === "") return { ok: true, value: undefined };
  if (COMMA_DECIMAL.test(t)) return { ok: false, message: `use a point for decimals: ${t.replace(",", ".")}` };
  if (PLAIN.test(t)) return { ok: true, value: Number(t) };
  const f = opts.inches ? FRACTION.exec((text ?? "").trim()) : null;
  if (f) {
    const den = Number(f[3]);
    if (den === 0) return { ok: false, message: "a fraction cannot have 0 below the line" };
    return { ok: true, value: Number(f[1] ?? 0) + Number(f[2]) / den };
  }
  if (/,/.test(t)) return { ok: false, message: "use a point for decimals and no thousands separator, like 1250.5" };
  return { ok: false, message: opts.inches ? 'enter a number, like 2.125 or 2 1/8' : "enter a number, like 54.5" };
}

/** A length typed in the form's units, in millimetres. */
export function parseLengthText(text: string | undefined, units: LengthUnits): NumberParse {
  const r = parseNumberText(text, { inches: units === "in" });
  if (!r.ok || r.value === undefined) return r;
  return { ok: true, value: units === "in" ? inToMm(r.value) : r.value };
}

/** A length in mm as text in the given units, without trailing zeros (mm to 0.001, inches to 0.0001). */
export function lengthText(mm: number | undefined | null, units: LengthUnits): string {
  if (mm === undefined || mm === null || !Number.isFinite(mm)) return "";
  const v = units === "in" ? mm / 25.4 : mm;
  return String(Number(v.toFixed(units === "in" ? 4 : 3)));
}

/** Any number as text for a field. */
export function numberText(v: number | undefined | null): string {
  return v === undefined || v === null || !Number.isFinite(v) ? "" : String(v);
}
