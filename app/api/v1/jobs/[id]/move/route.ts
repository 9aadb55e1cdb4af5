import { NextResponse } from "next/server";
import { handle, parseWith, readJson } from "@/app/api/_lib/respond";
import { requireCaller } from "@/db/access";
import { moveJob } from "@/db/jobs";
import { JobMoveSchema } from "@/model/schemas/jobs";

/** Moves the job to another status; the status machine decides, and a refusal says why. */
export const POST = handle(async (req: Request, ctx: { params: Promise<{ id: string }> }) => {
  const caller = await requireCaller();
  const { id } = await ctx.params;
  const body = parseWith(JobMoveSchema, await readJson(req));
  return NextResponse.json({ item: await moveJob(caller, id, body.to, body.reason) });
});
