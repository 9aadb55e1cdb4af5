import { handle, ApiError } from "@/app/api/_lib/respond";
import { requireCaller } from "@/db/access";
import { jobDetail } from "@/db/jobs";
import { SHOP_STAFF } from "@/db/roles";
import { buildSetupCard, setupCardDrawings } from "@/db/setup-card";
import { setupCardPdf } from "@/db/setup-card-pdf";
import { shopTimeZone } from "@/db/settings";

/** The job's bench setup card as a PDF (the figures, then each drawing at its stated scale), made on the server with the app's fonts embedded. */
export const GET = handle(async (_req: Request, ctx: { params: Promise<{ id: string }> }) => {
  const caller = await requireCaller(SHOP_STAFF);
  const { id } = await ctx.params;
  const detail = await jobDetail(caller, id);
  if (!detail.plan) throw new ApiError(409, "no_plan", "The job has no plan yet: attach a study and choose its kit first.");
  const card = buildSetupCard(detail.job, detail.plan, caller.shopName, caller.units, { timeZone: shopTimeZone() });
  const drawings = setupCardDrawings(detail.plan, card.kitIndex, caller.units);
  const pdf = await setupCardPdf(card, drawings);
  return new Response(new Uint8Array(pdf), {
    headers: {
      "content-type": "application/pdf",
      "content-disposition": `attachment; filename="setup-card-${detail.job.reference}.pdf"`,
      "cache-control": "private, no-store",
    },
  });
});
