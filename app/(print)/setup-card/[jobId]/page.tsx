import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { AccessError } from "@/db/access";
import { jobDetail } from "@/db/jobs";
import { SHOP_STAFF } from "@/db/roles";
import { buildSetupCard, setupCardDrawings, type CardDrawing, type CardVerdict } from "@/db/setup-card";
import { shopTimeZone } from "@/db/settings";
import { requirePage } from "../../../_ui/guard";
import { PrintButton } from "./print-button";
import "./card.css";

export const metadata: Metadata = { title: "Setup card" };

/**
 * The bench setup card: the figures on one A4 or Letter page, then each drawing on a landscape page of its
 * own at a stated scale (full size when it fits) — the same content as the PDF.
 */
export default async function SetupCardPage({ params }: { params: Promise<{ jobId: string }> }) {
  const { jobId } = await params;
  const caller = await requirePage(`/setup-card/${jobId}`, SHOP_STAFF);
  const detail = await jobDetail(caller, jobId).catch((error: unknown) => {
    if (error instanceof AccessError && error.code === "not_found") notFound();
    throw error;
  });
  if (!detail.plan) {
    return (
      <main className="mx-auto max-w-xl p-8">
        <h1 className="text-2xl font-semibold">No plan to print</h1>
        <p className="text-ink-2">Attach a study and choose its kit on the <Link href={`/jobs/${jobId}`}>job</Link> first.</p>
      </main>
    );
  }
  const card = buildSetupCard(detail.job, detail.plan, caller.shopName, caller.units, { timeZone: shopTimeZone() });
  const drawings = setupCardDrawings(detail.plan, card.kitIndex, caller.units);
  return (
    <main className="setup-card mx-auto bg-white text-[#2b2f33]">
      <div className="no-print mb-4 flex items-center gap-3">
        <Link href={`/jobs/${jobId}`}>Back to the job</Link>
        <PrintButton />
        <a className="btn-quiet no-underline" href={`/api/v1/jobs/${jobId}/setup-card.pdf`}>Download the PDF</a>
      </div>
      <EveryPage verdict={card.verdict} />
      <header className="card-head">
        <div>
          <h1>{card.title}</h1>
          <p>{card.shopName} · bench setup card</p>
        </div>
        <p className="num">{detail.job.title}</p>
      </header>
      <Verdict verdict={card.verdict} kitName={detail.plan.kitName} />
      <section className="grid-2">
        <div>
          <h2>Job</h2>
          <dl>{card.header.map((l) => <Line key={l.label} {...l} />)}</dl>
        </div>
        <div>
          <h2>The plan</h2>
          <dl>{card.plan.map((l) => <Line key={l.label} {...l} />)}</dl>
        </div>
      </section>
      <section>
        <h2>Rig settings</h2>
        {card.rig ? <dl className="rig" data-testid="rig-settings">{card.rig.map((l) => <Line key={l.label} {...l} />)}</dl> : <p className="warn">{card.rigMissing}</p>}
      </section>
      {drawings.length ? (
        <p className="drawings-note">
          Drawings: {drawings.map((d, i) => `${d.title} (${d.scaleText}, page ${i + 2})`).join("; ")}.
        </p>
      ) : null}
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
      <section>
        <h2>After-cut readings</h2>
        <table className="blanks">
          <tbody>
            {card.blanks.map((b) => (
              <tr key={b.label}>
                <th scope="row">{b.label}</th>
                {Array.from({ length: b.cells }, (_, i) => <td key={i}>{b.cellLabels?.[i] ? <span className="cell-tag">{b.cellLabels[i]}</span> : null}</td>)}
              </tr>
            ))}
          </tbody>
        </table>
      </section>
      <footer>Borewright plans cuts; it does not replace the kit maker&apos;s instructions, local regulations or a qualified machinist.</footer>
      {drawings.map((d, i) => (
        <DrawingPage key={d.title} drawing={d} page={i + 2} reference={card.reference} verdict={card.verdict} />
      ))}
    </main>
  );
}

function Line({ label, value, warn }: { label: string; value: string; warn?: boolean }) {
  return (
    <div className="line">
      <dt>{label}</dt>
      <dd className={`num ${warn ? "warn" : ""}`}>{value}</dd>
    </div>
  );
}

/** The verdict for the planned kit, at the top of the card, in its words and colour. */
function Verdict({ verdict, kitName }: { verdict: CardVerdict; kitName: string }) {
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
function EveryPage({ verdict }: { verdict: CardVerdict }) {
  if (!verdict.everyPage) return null;
  return (
    <p className="every-page" data-testid="every-page" style={{ color: verdict.color, borderColor: verdict.color }}>
      {verdict.everyPage}
    </p>
  );
}

/** One drawing on a landscape page of its own, at its stated scale, with the bar to check the print by. */
function DrawingPage({ drawing: d, page, reference, verdict }: { drawing: CardDrawing; page: number; reference: string; verdict: CardVerdict }) {
  const w = d.widthMm * d.scale;
  const h = d.heightMm * d.scale;
  // The drawing's own size attributes are its true size in mm; on the page it is printed at its scale.
  const svg = d.svg.replace(/^<svg([^>]*?) width="[^"]*" height="[^"]*"/, `<svg$1 width="${w.toFixed(3)}mm" height="${h.toFixed(3)}mm"`);
  const bar = d.barMm * d.scale;
  return (
    <section className="sheet-page" data-testid="drawing-page" data-scale={d.scale} data-width-mm={w.toFixed(3)}>
      <EveryPage verdict={verdict} />
      <h2>
        {d.title} — {reference}, page {page}
      </h2>
      <figure aria-label={d.title} dangerouslySetInnerHTML={{ __html: svg }} />
      <div className="scale-row">
        <svg className="scale-bar" width={`${bar.toFixed(3)}mm`} height="4mm" viewBox={`0 0 ${bar.toFixed(3)} 4`} role="img" aria-label={`Scale bar: ${d.barLabel}`}>
          <rect x="0" y="0.5" width={bar.toFixed(3)} height="1.6" fill="#2b2f33" />
          <rect x={(bar / 2).toFixed(3)} y="0.5" width={(bar / 2).toFixed(3)} height="1.6" fill="#ffffff" stroke="#2b2f33" strokeWidth="0.25" />
        </svg>
        <span className="num">{d.barLabel}</span>
        <span>{d.caption}</span>
      </div>
    </section>
  );
}
