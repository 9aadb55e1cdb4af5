import { NextResponse } from "next/server";
import { handle, parseWith, readJson } from "@/app/api/_lib/respond";
import { requireCaller } from "@/db/access";
import { casePhotoDownload, deleteCasePhoto, setCasePhotoReference } from "@/db/case-photos";
import { SHOP_STAFF } from "@/db/roles";
import { CasePhotoPatchSchema } from "@/model/schemas/case-photos";

type Ctx = { params: Promise<{ id: string; photoId: string }> };

/** Redirects to a fresh presigned download URL for one of the case profile's photos. */
export const GET = handle(async (_req: Request, ctx: Ctx) => {
  const caller = await requireCaller(SHOP_STAFF);
  const { id, photoId } = await ctx.params;
  return NextResponse.redirect(await casePhotoDownload(caller, id, photoId), 303);
});

/** Sets (or, with null, clears) the reference points the photo is scaled or squared up by: `{ reference }` → `{ item }`. */
export const PATCH = handle(async (req: Request, ctx: Ctx) => {
  const caller = await requireCaller(SHOP_STAFF);
  const { id, photoId } = await ctx.params;
  const body = parseWith(CasePhotoPatchSchema, await readJson(req));
  return NextResponse.json({ item: await setCasePhotoReference(caller, id, photoId, body.reference) });
});

/** Removes the photo and its file. */
export const DELETE = handle(async (_req: Request, ctx: Ctx) => {
  const caller = await requireCaller(SHOP_STAFF);
  const { id, photoId } = await ctx.params;
  await deleteCasePhoto(caller, id, photoId);
  return new NextResponse(null, { status: 204 });
});
