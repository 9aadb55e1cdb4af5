import { NextResponse } from "next/server";
import { handle, parseWith, readJson } from "@/app/api/_lib/respond";
import { requireCaller } from "@/db/access";
import { listPhotos, requestUpload } from "@/db/photos";
import { SHOP_STAFF } from "@/db/roles";
import { PhotoRequestSchema } from "@/model/schemas/jobs";

type Ctx = { params: Promise<{ id: string }> };

/** The job's photos with short-lived download URLs: all for the shop, the shared ones for the customer. */
export const GET = handle(async (_req: Request, ctx: Ctx) => {
  const caller = await requireCaller();
  const { id } = await ctx.params;
  return NextResponse.json({ items: await listPhotos(caller, id) });
});

/** Starts an upload: answers a presigned PUT URL; the browser sends the file straight to storage, then calls …/complete. */
export const POST = handle(async (req: Request, ctx: Ctx) => {
  const caller = await requireCaller(SHOP_STAFF);
  const { id } = await ctx.params;
  const body = parseWith(PhotoRequestSchema, await readJson(req));
  return NextResponse.json(await requestUpload(caller, id, body), { status: 201 });
});
