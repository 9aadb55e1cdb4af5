import { NextResponse } from "next/server";
import { handle, parseWith, readJson } from "@/app/api/_lib/respond";
import { requireCaller } from "@/db/access";
import { photoDownload, updatePhoto } from "@/db/photos";
import { SHOP_STAFF } from "@/db/roles";
import { PhotoPatchSchema } from "@/model/schemas/jobs";

type Ctx = { params: Promise<{ id: string; photoId: string }> };

/** Redirects to a fresh presigned download URL for a photo the caller may see. */
export const GET = handle(async (_req: Request, ctx: Ctx) => {
  const caller = await requireCaller();
  const { id, photoId } = await ctx.params;
  return NextResponse.redirect(await photoDownload(caller, id, photoId), 303);
});

/** Shares a photo with the customer (or stops sharing it), or changes its caption. */
export const PATCH = handle(async (req: Request, ctx: Ctx) => {
  const caller = await requireCaller(SHOP_STAFF);
  const { id, photoId } = await ctx.params;
  const body = parseWith(PhotoPatchSchema, await readJson(req));
  return NextResponse.json({ item: await updatePhoto(caller, id, photoId, body) });
});
