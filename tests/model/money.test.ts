import { describe, expect, it } from "vitest";
import { add, amountText, CurrencyMismatch, formatMoney, minorDigits, money, multiplyRatio, parseAmount, percentOf, sum, times, timesHours } from "@/model/money";

describe("money in minor units", () => {
  it("knows each currency's minor unit from ISO 4217", () => {
    // ISO 4217, the minor unit column: EUR 2, CHF 2, JPY 0, BHD 3.
    expect(minorDigits("EUR")).toBe(2);
    expect(minorDigits("CHF")).toBe(2);
    expect(minorDigits("JPY")).toBe(0);
    expect(minorDigits("BHD")).toBe(3);
  });

  it("adds amounts of one currency and refuses to add two currencies", () => {
    // Hand sum: 289.00 + 25.00 = 314.00.
    expect(add(money(28900, "EUR"), money(2500, "EUR"))).toEqual(money(31400, "EUR"));
    expect(sum([money(100, "USD"), money(250, "USD"), money(5, "USD")], "USD")).toEqual(money(355, "USD"));
    expect(() => add(money(100, "EUR"), money(100, "USD"))).toThrow(CurrencyMismatch);
  });

  it("rounds a rate once, half away from zero, exactly", () => {
    // Hand figures: 0.5 of a cent goes up — 12.345 → 12.35 (1234.5 cents); 12.344 → 12.34.
    expect(multiplyRatio(money(24_690, "EUR"), 1, 20)).toEqual(money(1235, "EUR")); // 246.90 / 20 = 12.345
    expect(multiplyRatio(money(24_688, "EUR"), 1, 20)).toEqual(money(1234, "EUR")); // 246.88 / 20 = 12.344
    // 20 % of 404.00 = 80.80; 30 % of 484.80 = 145.44; 7.7 % of 100.00 = 7.70; 7.7 % of 0.65 = 0.05005 → 0.05.
    expect(percentOf(money(40_400, "EUR"), 20)).toEqual(money(8080, "EUR"));
    expect(percentOf(money(48_480, "EUR"), 30)).toEqual(money(14_544, "EUR"));
    expect(percentOf(money(10_000, "CHF"), 7.7)).toEqual(money(770, "CHF"));
    expect(percentOf(money(65, "CHF"), 7.7)).toEqual(money(5, "CHF"));
    // 19 % of 0.50 = 0.095 → 0.10 (half up), where a float (0.5 * 0.19 = 0.095000…) could land either side.
    expect(percentOf(money(50, "EUR"), 19)).toEqual(money(10, "EUR"));
    // Exact on large amounts: 33.33 % of 9 999 999.99 = 3 332 999.9967 → 3 333 000.00 (999 999 999 × 3333 / 10000 cents, rounded once).
    expect(percentOf(money(999_999_999, "EUR"), 33.33)).toEqual(money(333_300_000, "EUR"));
  });

  it("multiplies by a count and by hours to the quarter", () => {
    // 2 × 12.50 = 25.00; 1.5 h × 60.00 = 90.00; 0.25 h × 55.55 = 13.8875 → 13.89.
    expect(times(money(1250, "EUR"), 2)).toEqual(money(2500, "EUR"));
    expect(timesHours(money(6000, "EUR"), 1.5)).toEqual(money(9000, "EUR"));
    expect(timesHours(money(5555, "EUR"), 0.25)).toEqual(money(1389, "EUR"));
  });

  it("reads and writes amounts as text without a float step", () => {
    expect(parseAmount("289", "EUR")).toBe(28_900);
    expect(parseAmount("289,5", "EUR")).toBe(28_950);
    expect(parseAmount("1 289.05", "EUR")).toBe(128_905);
    expect(parseAmount("0.29", "EUR")).toBe(29); // 0.29 * 100 is 28.999… as a float
    expect(parseAmount("12.345", "EUR")).toBeNull();
    expect(parseAmount("-4", "EUR")).toBeNull();
    expect(parseAmount("abc", "EUR")).toBeNull();
    expect(amountText(28_900, "EUR")).toBe("289.00");
    expect(amountText(5, "EUR")).toBe("0.05");
  });

  it("formats with Intl.NumberFormat and the currency's code", () => {
    // ECMA-402 NumberFormat with currencyDisplay "code": the code, a no-break space, the amount.
    expect(formatMoney(money(48_480, "EUR")).replace(/\s/g, " ")).toBe("EUR 484.80");
    expect(formatMoney(money(48_480, "EUR"), "de-DE").replace(/\s/g, " ")).toBe("484,80 EUR");
  });
});
