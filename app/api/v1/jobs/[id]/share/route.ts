import { NextResponse } from "next/server";
import { handle } from "@/app/api/_lib/respond";
import { requireCaller } from "@/db/access";
import { noBody } from "@/app/api/v1/_lib/http";
import { shareJob } from "@/db/jobs";
import { SHOP_STAFF } from "@/db/roles";

/** Shares the plan with the job's customer by e-mail, inviting them into the shop when they have no account there. */
export const POST = handle(async (req: Request, ctx: { params: Promise<{ id: string }> }) => {
  const caller = await requireCaller(SHOP_STAFF);
  await noBody(req);
  const { id } = await ctx.params;
  return NextResponse.json(await shareJob(caller, id));
});
