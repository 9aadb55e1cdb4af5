import { NextResponse } from "next/server";
import { handle, parseWith, readJson } from "@/app/api/_lib/respond";
import { requireCaller } from "@/db/access";
import { DataError } from "@/db/errors";
import { moveJob, parseQuote } from "@/db/jobs";
import type { JobRecord } from "@/db/schema-jobs";
import { JobMoveSchema } from "@/model/schemas/jobs";

/** A customer approves a priced plan as read, through the consult approval that names the quote. */
function customerApproval(record: JobRecord): void {
  if (parseQuote(record.quoteJson))
    throw new DataError("move_refused", "The plan and its price are approved together on the plan's page (POST /api/v1/consult/{id}/approve with the quote's fingerprint).");
}

/** Moves the job to another status; the status machine decides, and a refusal says why. */
export const POST = handle(async (req: Request, ctx: { params: Promise<{ id: string }> }) => {
  const caller = await requireCaller();
  const { id } = await ctx.params;
  const body = parseWith(JobMoveSchema, await readJson(req));
  const check = caller.role === "customer" && body.to === "approved" ? customerApproval : undefined;
  return NextResponse.json({ item: await moveJob(caller, id, body.to, body.reason, check) });
});
