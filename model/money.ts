// Money: an integer number of the currency's minor units (cents, pence, öre; yen have none) with its
// ISO 4217 code. Never a float of major units. Adding checks the currencies match; multiplying by a rate
// (a quantity, hours, a percentage) rounds once, half away from zero ("half-up" as a shop till does it),
// in exact integer arithmetic; text is written by Intl.NumberFormat.
import { z } from "zod";
import { MAX_AMOUNT_MINOR } from "./money-text";

// The text side (formatting and reading amounts) is in money-text.ts, free of zod, for pages that only show money.
export { amountText, formatMoney, MAX_AMOUNT_MINOR, minorDigits, parseAmount } from "./money-text";

/** The ISO 4217 codes a shop may price in (upper case, as the standard writes them). */
export const CURRENCY_CODES = ["EUR", "USD", "GBP", "CHF", "SEK", "NOK", "DKK", "PLN", "CZK", "CAD", "AUD"] as const;
export type CurrencyCode = (typeof CURRENCY_CODES)[number];

export type Money = { readonly amountMinor: number; readonly currency: CurrencyCode };

export const CurrencySchema = z.preprocess(
  (v) => (typeof v === "string" ? v.trim().toUpperCase() : v),
  z.enum(CURRENCY_CODES, { error: `Choose a currency: ${CURRENCY_CODES.join(", ")}.` }),
);

/** An amount in minor units: a whole number, not negative. */
export const AmountMinorSchema = z
  .number({ error: "An amount is a whole number of the currency's smallest unit (e.g. 28900 for 289.00)." })
  .int("An amount is a whole number of the currency's smallest unit (e.g. 28900 for 289.00).")
  .min(0, "An amount cannot be negative.")
  .max(MAX_AMOUNT_MINOR, "That amount is too large for a quote.");

export const MoneySchema = z.strictObject({ amountMinor: AmountMinorSchema, currency: CurrencySchema });

export class CurrencyMismatch extends Error {
  readonly code = "currency_mismatch";
  constructor(a: string, b: string) {
    super(`Cannot add ${a} to ${b}: a quote is in one currency.`);
  }
}

export const money = (amountMinor: number, currency: CurrencyCode): Money => ({ amountMinor, currency });
export const zero = (currency: CurrencyCode): Money => money(0, currency);

/** a + b, in one currency. */
export function add(a: Money, b: Money): Money {
  if (a.currency !== b.currency) throw new CurrencyMismatch(b.currency, a.currency);
  return money(a.amountMinor + b.amountMinor, a.currency);
}

/** The sum of amounts in one currency (zero of `currency` for none). */
export function sum(items: readonly Money[], currency: CurrencyCode): Money {
  return items.reduce(add, zero(currency));
}

/** n / d rounded half away from zero, exactly (BigInt), for integers n and d > 0. */
function divideHalfUp(n: bigint, d: bigint): bigint {
  const sign = n < 0n ? -1n : 1n;
  const a = n * sign;
  const q = a / d;
  return sign * (2n * (a % d) >= d ? q + 1n : q);
}

/**
 * The amount times numerator / denominator, rounded once to the minor unit, half away from zero
 * (0.5 minor units goes up: 12.345 → 12.35). numerator and denominator are integers, denominator > 0.
 */
export function multiplyRatio(m: Money, numerator: number, denominator: number): Money {
  if (!Number.isInteger(numerator) || !Number.isInteger(denominator) || denominator <= 0) throw new RangeError("multiplyRatio takes integers, the denominator above zero");
  return money(Number(divideHalfUp(BigInt(m.amountMinor) * BigInt(numerator), BigInt(denominator))), m.currency);
}

/** The amount times a decimal rate given as text-exact hundredths (a percent with two decimals: 7.7 % → 770 / 10000). */
export function percentOf(m: Money, percent: number): Money {
  return multiplyRatio(m, Math.round(percent * 100), 100 * 100);
}

/** The amount times a whole quantity. */
export function times(m: Money, quantity: number): Money {
  return multiplyRatio(m, quantity, 1);
}

/** An hourly rate times hours given to the quarter hour (1.25 h → 5 quarters), rounded half-up. */
export function timesHours(rate: Money, hours: number): Money {
  return multiplyRatio(rate, Math.round(hours * 4), 4);
}
