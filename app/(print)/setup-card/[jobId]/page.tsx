import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { AccessError } from "@/db/access";
import { jobDetail } from "@/db/jobs";
import { SHOP_STAFF } from "@/db/roles";
import { buildSetupCard, setupCardDrawings } from "@/db/setup-card";
import { shopTimeZone } from "@/db/settings";
import { requirePage } from "../../../_ui/guard";
import { CardSheet } from "./_components/card-sheet";
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
  if (!detail.plan) return <NoPlanToPrint jobId={jobId} />;
  const card = buildSetupCard(detail.job, detail.plan, caller.shopName, caller.units, { timeZone: shopTimeZone() });
  const drawings = setupCardDrawings(detail.plan, card.kitIndex, caller.units);
  return <CardSheet jobId={jobId} jobTitle={detail.job.title} kitName={detail.plan.kitName} card={card} drawings={drawings} />;
}

/** A job with no plan yet has no card: the page says where to make one. */
function NoPlanToPrint({ jobId }: { jobId: string }) {
  return (
    <main className="mx-auto max-w-xl p-8">
      <h1 className="text-2xl font-semibold">No plan to print</h1>
      <p className="text-ink-2">Attach a study and choose its kit on the <Link href={`/jobs/${jobId}`}>job</Link> first.</p>
    </main>
  );
}
