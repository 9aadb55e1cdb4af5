import { describe, expect, it } from "vitest";
import { QuoteDraftSchema, quoteTotals, type StoredQuote } from "@/model/quote";

const base: StoredQuote = {
  currency: "EUR",
  kit: { label: "Test kit", unitMinor: 28_900 },
  parts: [{ label: "Base gasket", quantity: 2, unitMinor: 1250 }],
  machiningHours: 1.5,
  others: [],
  labourRateMinor: 6000,
  taxPercent: 20,
  depositPercent: 30,
  depositOverride: null,
  updatedAt: "2026-12-02T09:00:00.000Z",
  updatedBy: { id: "u", name: "Tester" },
};

describe("a job's quote", () => {
  it("sums the kit, parts and machining before tax, adds the tax once and takes the deposit share of the total", () => {
    const t = quoteTotals(base);
    // Hand sums: 289.00 + 2 × 12.50 + 1.5 h × 60.00 = 404.00; tax 20 % = 80.80; total 484.80; deposit 30 % = 145.44.
    expect(t.lines.map((l) => l.amount.amountMinor)).toEqual([28_900, 2500, 9000]);
    expect(t.subtotal.amountMinor).toBe(40_400);
    expect(t.tax.amountMinor).toBe(8080);
    expect(t.total.amountMinor).toBe(48_480);
    expect(t.deposit.amountMinor).toBe(14_544);
    expect(t.pricesIncludeTax).toBe(false);
  });

  it("rounds the tax on the sum, not line by line", () => {
    // Hand figures: 3 × 0.03 = 0.09 at 25 %: on the sum 0.09 × 0.25 = 0.0225 → 0.02 (line by line it would be 3 × 0.0075 → 3 × 0.01 = 0.03).
    const t = quoteTotals({ ...base, kit: null, machiningHours: 0, parts: [{ label: "Washer", quantity: 3, unitMinor: 3 }], taxPercent: 25 });
    expect(t.subtotal.amountMinor).toBe(9);
    expect(t.tax.amountMinor).toBe(2);
    expect(t.total.amountMinor).toBe(11);
  });

  it("asks the owner's deposit instead of the share when one is set, and keeps the share beside it", () => {
    const t = quoteTotals({ ...base, depositOverride: { amountMinor: 10_000, reason: "regular customer", by: { id: "o", name: "Owner" }, at: "2026-12-02T09:00:00.000Z" } });
    expect(t.deposit.amountMinor).toBe(10_000);
    expect(t.depositShare.amountMinor).toBe(14_544);
  });

  it("takes machining time to the quarter hour only", () => {
    expect(QuoteDraftSchema.safeParse({ machiningHours: 1.25 }).success).toBe(true);
    const bad = QuoteDraftSchema.safeParse({ machiningHours: 1.3 });
    expect(bad.success).toBe(false);
    expect(bad.error?.issues[0].message).toMatch(/quarter hour/);
  });
});
