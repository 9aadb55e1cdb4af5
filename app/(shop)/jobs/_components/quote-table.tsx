import { formatMoney } from "@/model/money";
import type { QuoteTotals } from "@/model/quote";

const percent = (p: number) => `${Number.isInteger(p) ? p : p.toFixed(2).replace(/0$/, "")} %`;

/** The words of one line, the same for the shop and the customer. */
function lineWords(line: QuoteTotals["lines"][number]): string {
  if (line.kind === "machining" && line.unit) return `Machining, ${line.quantity} h at ${formatMoney(line.unit)} an hour`;
  if (line.kind === "kit") return `Cylinder kit: ${line.label}`;
  return line.quantity && line.unit && line.quantity > 1 ? `${line.label}, ${line.quantity} × ${formatMoney(line.unit)}` : line.label;
}

/** A quote as a table: its lines, the sum before tax, the tax, the total and the deposit, in plain words. */
export function QuoteTable({ totals, taxPercent, depositPercent, overridden, large = false }: { totals: QuoteTotals; taxPercent: number; depositPercent: number; overridden: boolean; large?: boolean }) {
  const row = "flex items-baseline justify-between gap-4 py-1";
  return (
    <div className={large ? "text-lg" : "text-sm"} data-testid="quote-table">
      <ul className="divide-y divide-rule">
        {totals.lines.map((l, i) => (
          <li key={i} className={row}>
            <span className="min-w-0 break-words">{lineWords(l)}</span>
            <span className="num shrink-0">{formatMoney(l.amount)}</span>
          </li>
        ))}
      </ul>
      <dl className="mt-2 border-t-2 border-rule">
        <div className={row}><dt>Sum before tax</dt><dd className="num" data-testid="quote-subtotal">{formatMoney(totals.subtotal)}</dd></div>
        <div className={row}><dt>Tax ({percent(taxPercent)} of the sum)</dt><dd className="num" data-testid="quote-tax">{formatMoney(totals.tax)}</dd></div>
        <div className={`${row} font-semibold`}><dt>Total, tax included</dt><dd className="num" data-testid="quote-total">{formatMoney(totals.total)}</dd></div>
        <div className={row}>
          <dt>{overridden ? "Deposit on approval (set by the shop)" : `Deposit on approval (${percent(depositPercent)} of the total)`}</dt>
          <dd className="num" data-testid="quote-deposit">{formatMoney(totals.deposit)}</dd>
        </div>
      </dl>
      <p className="mt-1 text-xs text-ink-3">The prices on the lines are before tax; the tax is added once on their sum. Amounts are rounded to the cent, halves up.</p>
    </div>
  );
}
