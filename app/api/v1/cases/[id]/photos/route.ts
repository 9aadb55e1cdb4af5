import { NextResponse } from "next/server";
import { handle, parseWith, readJson } from "@/app/api/_lib/respond";
import { requireCaller } from "@/db/access";
import { listCasePhotos, requestCasePhotoUpload } from "@/db/case-photos";
import { SHOP_STAFF } from "@/db/roles";
import { CasePhotoRequestSchema } from "@/model/schemas/case-photos";

type Ctx = { params: Promise<{ id: string }> };

/** The case profile's deck photos with short-lived download URLs, newest first. Shop staff only. */
export const GET = handle(async (_req: Request, ctx: Ctx) => {
  const caller = await requireCaller(SHOP_STAFF);
  const { id } = await ctx.params;
  return NextResponse.json({ items: await listCasePhotos(caller, id) });
});

/** Starts an upload: answers a presigned PUT URL; the browser sends the file straight to storage, then calls …/complete. */
export const POST = handle(async (req: Request, ctx: Ctx) => {
  const caller = await requireCaller(SHOP_STAFF);
  const { id } = await ctx.params;
  const body = parseWith(CasePhotoRequestSchema, await readJson(req));
  return NextResponse.json(await requestCasePhotoUpload(caller, id, body), { status: 201 });
});
