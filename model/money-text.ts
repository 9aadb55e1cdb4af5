// Money as text: amounts written by Intl.NumberFormat and typed amounts read back, exactly in minor units.
// Kept apart from money.ts (which holds the zod schemas) so a page that only shows a price loads no validator.
import type { Money } from "./money";

/** Largest amount a price or a line may hold, in minor units (10 million major units). */
export const MAX_AMOUNT_MINOR = 1_000_000_000;

const digitsOf = new Map<string, number>();
/** How many minor-unit digits the currency has (2 for EUR, 0 for JPY), as the runtime's ISO 4217 data says (asked once per currency: a number format is costly to make). */
export function minorDigits(currency: string): number {
  let digits = digitsOf.get(currency);
  if (digits === undefined) {
    digits = new Intl.NumberFormat("en", { style: "currency", currency }).resolvedOptions().maximumFractionDigits ?? 2;
    digitsOf.set(currency, digits);
  }
  return digits;
}

const formats = new Map<string, Intl.NumberFormat>();
/** Money as text, e.g. "€289.00" in "en-IE" or "289,00 €" in "de-DE"; "en-GB" by default ("€289.00"). */
export function formatMoney(m: Money, locale = "en-GB"): string {
  const key = `${locale}|${m.currency}`;
  let f = formats.get(key);
  if (!f) {
    f = new Intl.NumberFormat(locale, { style: "currency", currency: m.currency, currencyDisplay: "code" });
    formats.set(key, f);
  }
  return f.format(m.amountMinor / 10 ** minorDigits(m.currency));
}

/** An amount in minor units as plain field text in major units ("289.00"), no currency. */
export function amountText(amountMinor: number, currency: string): string {
  const digits = minorDigits(currency);
  const sign = amountMinor < 0 ? "-" : "";
  const a = Math.abs(amountMinor);
  if (digits === 0) return `${sign}${a}`;
  const unit = 10 ** digits;
  return `${sign}${Math.floor(a / unit)}.${String(a % unit).padStart(digits, "0")}`;
}

/**
 * Typed major units ("289", "289.5", "289,50", "1 289.00") as minor units, exactly (no float step);
 * null when the text is not an amount with at most the currency's digits.
 */
export function parseAmount(text: string, currency: string): number | null {
  const t = text.trim().replace(/[\s\u00a0\u202f']/g, "").replace(",", ".");
  const digits = minorDigits(currency);
  const m = /^(\d+)(?:\.(\d*))?$/.exec(t);
  if (!m) return null;
  const frac = m[2] ?? "";
  if (frac.length > digits) return null;
  const value = Number(m[1]) * 10 ** digits + (frac ? Number(frac.padEnd(digits, "0")) : 0);
  return Number.isSafeInteger(value) && value <= MAX_AMOUNT_MINOR ? value : null;
}
