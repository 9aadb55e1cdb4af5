import type { CardDrawing, SetupCard } from "@/db/setup-card";
import { Lines } from "./card-verdict";

/** The card's title, the shop, and the job it is for. */
export function CardHead({ card, jobTitle }: { card: SetupCard; jobTitle: string }) {
  return (
    <header className="card-head">
      <div>
        <h1>{card.title}</h1>
        <p>{card.shopName} · bench setup card</p>
      </div>
      <p className="num">{jobTitle}</p>
    </header>
  );
}

/** The job's particulars beside the plan's figures. */
export function JobAndPlan({ card }: { card: SetupCard }) {
  return (
    <section className="grid-2">
      <div>
        <h2>Job</h2>
        <Lines lines={card.header} />
      </div>
      <div>
        <h2>The plan</h2>
        <Lines lines={card.plan} />
      </div>
    </section>
  );
}

/** How to set the rig for the cut, or why the card cannot say. */
export function RigSettings({ card }: { card: SetupCard }) {
  return (
    <section>
      <h2>Rig settings</h2>
      {card.rig ? <Lines lines={card.rig} className="rig" testId="rig-settings" /> : <p className="warn">{card.rigMissing}</p>}
    </section>
  );
}

/** Which drawings follow, at what scale and on which page (the figures are page 1). */
export function DrawingsNote({ drawings }: { drawings: CardDrawing[] }) {
  if (!drawings.length) return null;
  return <p className="drawings-note">Drawings: {drawings.map((d, i) => `${d.title} (${d.scaleText}, page ${i + 2})`).join("; ")}.</p>;
}

/** The set-up checks in the order of the work, beside the cautions and the plan's warnings. */
export function ChecksAndCautions({ card }: { card: SetupCard }) {
  return (
    <section className="grid-2">
      <div>
        <h2>Set-up checks, in order</h2>
        <ol className="checks">{card.checks.map((c) => <li key={c}>{c}</li>)}</ol>
      </div>
      <div>
        <h2>Cautions</h2>
        <ul className="cautions" data-testid="cautions">{card.cautions.map((c) => <li key={c}>{c}</li>)}</ul>
        {card.warnings.length ? (
          <>
            <h2>Warnings from the plan</h2>
            <ul className="warnings">{card.warnings.map((w) => <li key={w}>{w}</li>)}</ul>
          </>
        ) : null}
      </div>
    </section>
  );
}

/** Empty cells to write the after-cut readings in by hand, each tagged where the card names it. */
export function AfterCutBlanks({ blanks }: { blanks: SetupCard["blanks"] }) {
  return (
    <section>
      <h2>After-cut readings</h2>
      <table className="blanks">
        <tbody>
          {blanks.map((b) => (
            <tr key={b.label}>
              <th scope="row">{b.label}</th>
              {Array.from({ length: b.cells }, (_, i) => <td key={i}>{b.cellLabels?.[i] ? <span className="cell-tag">{b.cellLabels[i]}</span> : null}</td>)}
            </tr>
          ))}
        </tbody>
      </table>
    </section>
  );
}
