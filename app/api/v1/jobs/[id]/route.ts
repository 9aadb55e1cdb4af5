import { NextResponse } from "next/server";
import { handle, parseWith, readJson } from "@/app/api/_lib/respond";
import { requireCaller } from "@/db/access";
import { jobDetail, updateJob } from "@/db/jobs";
import { SHOP_STAFF } from "@/db/roles";
import { JobPatchSchema } from "@/model/schemas/jobs";

type Ctx = { params: Promise<{ id: string }> };

/** The job with its plan, latest readings and verification, history and questions. */
export const GET = handle(async (_req: Request, ctx: Ctx) => {
  const caller = await requireCaller();
  const { id } = await ctx.params;
  return NextResponse.json(await jobDetail(caller, id));
});

export const PATCH = handle(async (req: Request, ctx: Ctx) => {
  const caller = await requireCaller(SHOP_STAFF);
  const { id } = await ctx.params;
  const patch = parseWith(JobPatchSchema, await readJson(req));
  return NextResponse.json({ item: await updateJob(caller, id, patch) });
});
