import { NextResponse } from "next/server";
import { handle, parseWith, readJson } from "@/app/api/_lib/respond";
import { requireCaller } from "@/db/access";
import { recordReadings } from "@/db/jobs";
import { SHOP_STAFF } from "@/db/roles";
import { ReadingsBodySchema } from "@/model/schemas/jobs";

/** Records the after-cut readings and answers with their verification against the plan. */
export const POST = handle(async (req: Request, ctx: { params: Promise<{ id: string }> }) => {
  const caller = await requireCaller(SHOP_STAFF);
  const { id } = await ctx.params;
  const body = parseWith(ReadingsBodySchema, await readJson(req));
  return NextResponse.json(await recordReadings(caller, id, body), { status: 201 });
});
