import { NextResponse } from "next/server";
import { handle, parseWith, readJson } from "@/app/api/_lib/respond";
import { requireCaller } from "@/db/access";
import { checkApprovedQuote, moveJob } from "@/db/jobs";
import { ApproveSchema } from "@/model/quote";

/**
 * The customer approves the plan shared with them and its quote with it: the body names the quote they
 * read (`{ quoteFingerprint }`, as the job's quote gives it); a quote changed since is refused with 409
 * and nothing is approved. A job with no quote takes no body (or `{}`). Recorded with the time and the person.
 */
export const POST = handle(async (req: Request, ctx: { params: Promise<{ id: string }> }) => {
  const caller = await requireCaller(["customer"]);
  // A job with no quote is approved without a body: none reads as `{}`.
  const body = parseWith(ApproveSchema, await readJson(req, undefined, {}));
  const { id } = await ctx.params;
  return NextResponse.json({ item: await moveJob(caller, id, "approved", undefined, (record) => checkApprovedQuote(record, body)) });
});
