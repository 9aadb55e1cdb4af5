import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { AccessError } from "@/db/access";
import { jobDetail } from "@/db/jobs";
import { SHOP_STAFF } from "@/db/roles";
import { buildSetupCard, setupCardDrawings } from "@/db/setup-card";
import { requirePage } from "../../../_ui/guard";
import { PrintButton } from "./print-button";
import "./card.css";

export const metadata: Metadata = { title: "Setup card" };

/** The bench setup card: one A4 or Letter page in print, the same content as the PDF, with the studio's drawings. */
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
  const card = buildSetupCard(detail.job, detail.plan, caller.shopName, caller.units);
  const drawings = setupCardDrawings(detail.plan, card.kitIndex, caller.units);
  return (
    <main className="setup-card mx-auto bg-white text-[#2b2f33]">
      <div className="no-print mb-4 flex items-center gap-3">
        <Link href={`/jobs/${jobId}`}>Back to the job</Link>
        <PrintButton />
        <a className="btn-quiet no-underline" href={`/api/v1/jobs/${jobId}/setup-card.pdf`}>Download the PDF</a>
      </div>
      <header className="card-head">
        <div>
          <h1>{card.title}</h1>
          <p>{card.shopName} · bench setup card</p>
        </div>
        <p className="num">{detail.job.title}</p>
      </header>
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
        <section className="drawings">
          {drawings.map((d) => (
            <figure key={d.title} aria-label={d.title} dangerouslySetInnerHTML={{ __html: d.svg }} />
          ))}
        </section>
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
