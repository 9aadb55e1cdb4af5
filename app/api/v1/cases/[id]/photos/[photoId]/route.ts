import { NextResponse } from "next/server";
import { handle } from "@/app/api/_lib/respond";
import { requireCaller } from "@/db/access";
import { casePhotoDownload, deleteCasePhoto } from "@/db/case-photos";
import { SHOP_STAFF } from "@/db/roles";

type Ctx = { params: Promise<{ id: string; photoId: string }> };

/** Redirects to a fresh presigned download URL for one of the case profile's photos. */
export const GET = handle(async (_req: Request, ctx: Ctx) => {
  const caller = await requireCaller(SHOP_STAFF);
  const { id, photoId } = await ctx.params;
  return NextResponse.redirect(await casePhotoDownload(caller, id, photoId), 303);
});

/** Removes the photo and its file. */
export const DELETE = handle(async (_req: Request, ctx: Ctx) => {
  const caller = await requireCaller(SHOP_STAFF);
  const { id, photoId } = await ctx.params;
  await deleteCasePhoto(caller, id, photoId);
  return new NextResponse(null, { status: 204 });
});
