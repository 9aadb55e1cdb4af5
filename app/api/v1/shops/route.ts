import { NextResponse } from "next/server";
import { getSessionUser, listMyShops } from "@/db/access";
import { getDb } from "@/db/client";
import { createShopFor } from "@/db/shops";
import { ApiError, handle, parseWith, readJson } from "../../_lib/respond";
import { NewShopSchema } from "../_lib/account-schemas";


/** The shops the caller belongs to. */
export const GET = handle(async () => {
  const session = await getSessionUser();
  if (!session) throw new ApiError(401, "unauthenticated", "Sign in to continue.");
  return NextResponse.json({ shops: await listMyShops(session.user.id) });
});

/** Starts a new shop with the caller as its owner. */
export const POST = handle(async (req: Request) => {
  const session = await getSessionUser();
  if (!session) throw new ApiError(401, "unauthenticated", "Sign in to continue.");
  const body = parseWith(NewShopSchema, await readJson(req));
  const shopId = await createShopFor(await getDb(), { id: session.user.id, name: session.user.name }, body.name);
  return NextResponse.json({ shop: { id: shopId } }, { status: 201 });
});
