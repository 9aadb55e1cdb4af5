import { NextResponse } from "next/server";
import { handle } from "@/app/api/_lib/respond";
import { noBody } from "@/app/api/v1/_lib/http";
import { requireCaller } from "@/db/access";
import { completeCasePhotoUpload } from "@/db/case-photos";
import { SHOP_STAFF } from "@/db/roles";

/** Checks the uploaded file (type by its bytes, size) and keeps it, or deletes it and says why. */
export const POST = handle(async (req: Request, ctx: { params: Promise<{ id: string; photoId: string }> }) => {
  const caller = await requireCaller(SHOP_STAFF);
  await noBody(req);
  const { id, photoId } = await ctx.params;
  return NextResponse.json({ item: await completeCasePhotoUpload(caller, id, photoId) });
});
