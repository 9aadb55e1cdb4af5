import { TERM, type Term } from "@/model/glossary";
import { formatMoney } from "@/model/money-text";
import type { QuoteTotals } from "@/model/quote";

const percent = (p: number) => `${Number.isInteger(p) ? p : p.toFixed(2).replace(/0$/, "")} %`;

/** The glossary's words for the shop (`label`) or the customer (`plain`). */
const wordsOf = (plain: boolean) => (t: Term) => (plain ? t.plain : t.label);

/** The words of one line: its own words, with the glossary's name for the kit and the machining. */
function lineWords(line: QuoteTotals["lines"][number], w: (t: Term) => string): string {
  if (line.kind === "machining" && line.unit) return `${w(TERM.quoteMachining)}, ${line.quantity} h at ${formatMoney(line.unit)} an hour`;
  if (line.kind === "kit") return `${w(TERM.quoteKit)}: ${line.label}`;
  return line.quantity && line.unit && line.quantity > 1 ? `${line.label}, ${line.quantity} × ${formatMoney(line.unit)}` : line.label;
}

/** A quote as a table: its lines, the sum before tax, the tax, the total and the deposit; `large` is the customer's, in plain words. */
export function QuoteTable({ totals, taxPercent, depositPercent, overridden, large = false }: { totals: QuoteTotals; taxPercent: number; depositPercent: number; overridden: boolean; large?: boolean }) {
  const w = wordsOf(large);
  const row = "flex items-baseline justify-between gap-4 py-1";
  return (
    <div className={large ? "text-lg" : "text-sm"} data-testid="quote-table">
      <ul className="divide-y divide-rule">
        {totals.lines.map((l, i) => (
          <li key={i} className={row}>
            <span className="min-w-0 break-words">{lineWords(l, w)}</span>
            <span className="num shrink-0">{formatMoney(l.amount)}</span>
          </li>
        ))}
      </ul>
      <dl className="mt-2 border-t-2 border-rule">
        <div className={row}><dt>{w(TERM.quoteSubtotal)}</dt><dd className="num" data-testid="quote-subtotal">{formatMoney(totals.subtotal)}</dd></div>
        <div className={row}><dt>{w(TERM.quoteTax)} ({percent(taxPercent)} of the sum)</dt><dd className="num" data-testid="quote-tax">{formatMoney(totals.tax)}</dd></div>
        <div className={`${row} font-semibold`}><dt>{w(TERM.quoteTotal)}</dt><dd className="num" data-testid="quote-total">{formatMoney(totals.total)}</dd></div>
        <div className={row}>
          <dt>{overridden ? `${w(TERM.quoteDeposit)} (set by the shop)` : `${w(TERM.quoteDeposit)} (${percent(depositPercent)} of the total)`}</dt>
          <dd className="num" data-testid="quote-deposit">{formatMoney(totals.deposit)}</dd>
        </div>
      </dl>
      <p className="mt-1 text-xs text-ink-3">The prices on the lines are before tax; the tax is added once on their sum. Amounts are rounded to the cent, halves up.</p>
    </div>
  );
}
