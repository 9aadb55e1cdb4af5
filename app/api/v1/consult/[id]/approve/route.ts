import { NextResponse } from "next/server";
import { handle } from "@/app/api/_lib/respond";
import { requireCaller } from "@/db/access";
import { noBody } from "@/app/api/v1/_lib/http";
import { moveJob } from "@/db/jobs";

/** The customer approves the plan shared with them; recorded with the time and the person. */
export const POST = handle(async (req: Request, ctx: { params: Promise<{ id: string }> }) => {
  const caller = await requireCaller(["customer"]);
  await noBody(req);
  const { id } = await ctx.params;
  return NextResponse.json({ item: await moveJob(caller, id, "approved") });
});
