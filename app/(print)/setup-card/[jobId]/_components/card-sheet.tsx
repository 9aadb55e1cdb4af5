import Link from "next/link";
import type { CardDrawing, SetupCard } from "@/db/setup-card";
import { PrintButton } from "../print-button";
import { AfterCutBlanks, CardHead, ChecksAndCautions, DrawingsNote, JobAndPlan, RigSettings } from "./card-sections";
import { EveryPage, Verdict } from "./card-verdict";
import { DrawingPage } from "./drawing-page";

/**
 * The whole card as printed: the figures on the first page, then each drawing on a page of its own. The
 * links and buttons above it are for the screen only.
 */
export function CardSheet({ jobId, jobTitle, kitName, card, drawings }: { jobId: string; jobTitle: string; kitName: string; card: SetupCard; drawings: CardDrawing[] }) {
  return (
    <main className="setup-card mx-auto bg-white text-[#2b2f33]">
      <div className="no-print mb-4 flex items-center gap-3">
        <Link href={`/jobs/${jobId}`}>Back to the job</Link>
        <PrintButton />
        <a className="btn-quiet no-underline" href={`/api/v1/jobs/${jobId}/setup-card.pdf`}>Download the PDF</a>
      </div>
      <EveryPage verdict={card.verdict} />
      <CardHead card={card} jobTitle={jobTitle} />
      <Verdict verdict={card.verdict} kitName={kitName} />
      <JobAndPlan card={card} />
      <RigSettings card={card} />
      <DrawingsNote drawings={drawings} />
      <ChecksAndCautions card={card} />
      <AfterCutBlanks blanks={card.blanks} />
      <footer>Borewright plans cuts; it does not replace the kit maker&apos;s instructions, local regulations or a qualified machinist.</footer>
      {drawings.map((d, i) => (
        <DrawingPage key={d.title} drawing={d} page={i + 2} reference={card.reference} verdict={card.verdict} />
      ))}
    </main>
  );
}
