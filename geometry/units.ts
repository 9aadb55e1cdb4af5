/** Millimetres per inch, exact since the 1959 international yard and pound agreement (NBS Circular 572 Addendum). */
export const MM_PER_INCH = 25.4;

/** Display units the product offers. */
export type LengthUnits = "mm" | "in";

/** Default denominator for fractional inches (1/64"). */
export const DEFAULT_FRACTION_DENOMINATOR = 64;

/** Inches from millimetres: in = mm / 25.4. */
export function mmToIn(mm: number): number {
  return mm / MM_PER_INCH;
}

/** Millimetres from inches: mm = in · 25.4. */
export function inToMm(inches: number): number {
  return inches * MM_PER_INCH;
}

/** A length in inches rounded to the nearest 1/denominator, reduced (e.g. 0.8125 → 13/16). */
export interface FractionalInches {
  readonly negative: boolean;
  readonly whole: number;
  readonly numerator: number;
  readonly denominator: number;
  /** The rounded value in inches. */
  readonly valueIn: number;
  /** Rounded value minus the exact value, in inches. */
  readonly errorIn: number;
}

function gcd(a: number, b: number): number {
  let x = Math.abs(a);
  let y = Math.abs(b);
  while (y) [x, y] = [y, x % y];
  return x || 1;
}

/** Nearest fraction of an inch with the given denominator: n = round(in · den), then reduced by gcd. */
export function toFractionalInches(inches: number, denominator: number = DEFAULT_FRACTION_DENOMINATOR): FractionalInches {
  if (!Number.isInteger(denominator) || denominator < 1) throw new RangeError(`denominator must be a positive integer, got ${denominator}`);
  const negative = inches < 0;
  const ticks = Math.round(Math.abs(inches) * denominator);
  const whole = Math.floor(ticks / denominator);
  const rest = ticks - whole * denominator;
  const g = gcd(rest, denominator);
  const valueIn = (negative ? -1 : 1) * (ticks / denominator);
  return {
    negative,
    whole,
    numerator: rest / g,
    denominator: rest === 0 ? 1 : denominator / g,
    valueIn,
    errorIn: valueIn - inches,
  };
}

/** Text of a fractional inch value, e.g. 1 13/16" or 3/64". */
export function formatFractionalInches(f: FractionalInches): string {
  const sign = f.negative && (f.whole > 0 || f.numerator > 0) ? "-" : "";
  if (f.numerator === 0) return `${sign}${f.whole}"`;
  return f.whole > 0 ? `${sign}${f.whole} ${f.numerator}/${f.denominator}"` : `${sign}${f.numerator}/${f.denominator}"`;
}

/** Options for formatLength. */
export interface FormatLengthOptions {
  /** Decimal places; defaults to 2 for mm and 3 for inches. */
  readonly digits?: number;
  /** Inches only: show the nearest fraction of this denominator instead of decimals (e.g. 64). */
  readonly fractionDenominator?: number;
}

/** A length for display: "45.75 mm", "1.801 in" or, with a denominator, '1 51/64"'. */
export function formatLength(mm: number, units: LengthUnits, options: FormatLengthOptions = {}): string {
  if (units === "mm") return `${mm.toFixed(options.digits ?? 2)} mm`;
  const inches = mmToIn(mm);
  if (options.fractionDenominator !== undefined) {
    return formatFractionalInches(toFractionalInches(inches, options.fractionDenominator));
  }
  return `${inches.toFixed(options.digits ?? 3)} in`;
}

const LENGTH_KEY = /^(.*)Mm([23]?)$/;

/** Converts every length field of a result (keys ending in Mm, Mm2, Mm3, and everything under such a key) to inches, renaming the suffix to In, In2, In3. */
export function convertLengthsToInches(value: unknown): unknown {
  return convertNode(value, 0);
}

function convertNode(value: unknown, power: number): unknown {
  if (typeof value === "number") return power === 0 ? value : value / MM_PER_INCH ** power;
  if (Array.isArray(value)) return value.map((v) => convertNode(v, power));
  if (value !== null && typeof value === "object") {
    const out: Record<string, unknown> = {};
    for (const [key, v] of Object.entries(value)) {
      const m = LENGTH_KEY.exec(key);
      if (m && power === 0) {
        const p = m[2] === "" ? 1 : Number(m[2]);
        out[`${m[1]}In${m[2]}`] = convertNode(v, p);
      } else {
        out[key] = convertNode(v, power);
      }
    }
    return out;
  }
  return value;
}
