import { NextResponse } from "next/server";
import { handle, parseWith, readJson } from "@/app/api/_lib/respond";
import { requireCaller } from "@/db/access";
import { quoteFor, saveQuote } from "@/db/jobs";
import { SHOP_STAFF } from "@/db/roles";
import { QuotePutSchema } from "@/model/quote";

type Ctx = { params: Promise<{ id: string }> };

/** The job's quote with its figures; for staff also the shop's rates now and the library's kit price. The job's customer sees it once shared. */
export const GET = handle(async (_req: Request, ctx: Ctx) => {
  const caller = await requireCaller();
  const { id } = await ctx.params;
  return NextResponse.json(await quoteFor(caller, id));
});

/** Writes the quote (owner or builder; a deposit other than the shop's share is the owner's, with a reason). Fixed once approved. */
export const PUT = handle(async (req: Request, ctx: Ctx) => {
  const caller = await requireCaller(SHOP_STAFF);
  const { id } = await ctx.params;
  const body = parseWith(QuotePutSchema, await readJson(req));
  return NextResponse.json(await saveQuote(caller, id, body));
});
