import type { CardLine, CardVerdict } from "@/db/setup-card";

/** One figure of the card: its label and its value (in the warning style where the plan flags it). */
export function Line({ label, value, warn }: CardLine) {
  return (
    <div className="line">
      <dt>{label}</dt>
      <dd className={`num ${warn ? "warn" : ""}`}>{value}</dd>
    </div>
  );
}

/** A list of the card's figures. */
export function Lines({ lines, className, testId }: { lines: CardLine[]; className?: string; testId?: string }) {
  return (
    <dl className={className} data-testid={testId}>
      {lines.map((l) => (
        <Line key={l.label} {...l} />
      ))}
    </dl>
  );
}

/** The verdict for the planned kit, at the top of the card, in its words and colour. */
export function Verdict({ verdict, kitName }: { verdict: CardVerdict; kitName: string }) {
  return (
    <section className="verdict" data-testid="card-verdict" data-verdict={verdict.verdict} style={{ borderColor: verdict.color }}>
      <p className="verdict-words" style={{ color: verdict.color }}>
        {verdict.words} — {kitName}
      </p>
      {verdict.reasons.length ? <p>Why: {verdict.reasons.join("; ")}.</p> : null}
    </section>
  );
}

/** For a cannot-fit plan, the line every printed page carries. */
export function EveryPage({ verdict }: { verdict: CardVerdict }) {
  if (!verdict.everyPage) return null;
  return (
    <p className="every-page" data-testid="every-page" style={{ color: verdict.color, borderColor: verdict.color }}>
      {verdict.everyPage}
    </p>
  );
}
