import { NextResponse } from "next/server";
import { ApiError, handle, MAX_BODY_BYTES, parseWith } from "@/app/api/_lib/respond";
import { requireCaller } from "@/db/access";
import { checkApprovedQuote, moveJob } from "@/db/jobs";
import { ApproveSchema } from "@/model/quote";

/** The body, or `{}` when none was sent (a job with no quote is approved without one). */
async function optionalJson(req: Request): Promise<unknown> {
  if (Number(req.headers.get("content-length") ?? "0") > MAX_BODY_BYTES) throw new ApiError(413, "too_large", `The body is larger than ${Math.round(MAX_BODY_BYTES / 1024)} KB.`);
  const text = await req.text().catch(() => undefined);
  if (text === undefined) throw new ApiError(400, "invalid_body", "The body could not be read.");
  if (Buffer.byteLength(text) > MAX_BODY_BYTES) throw new ApiError(413, "too_large", `The body is larger than ${Math.round(MAX_BODY_BYTES / 1024)} KB.`);
  if (!text.trim()) return {};
  try {
    return JSON.parse(text) as unknown;
  } catch {
    throw new ApiError(400, "invalid_json", "The body is not valid JSON.");
  }
}

/**
 * The customer approves the plan shared with them and its quote with it: the body names the quote they
 * read (`{ quoteFingerprint }`, as the job's quote gives it); a quote changed since is refused with 409
 * and nothing is approved. A job with no quote takes no body (or `{}`). Recorded with the time and the person.
 */
export const POST = handle(async (req: Request, ctx: { params: Promise<{ id: string }> }) => {
  const caller = await requireCaller(["customer"]);
  const body = parseWith(ApproveSchema, await optionalJson(req));
  const { id } = await ctx.params;
  return NextResponse.json({ item: await moveJob(caller, id, "approved", undefined, (record) => checkApprovedQuote(record, body)) });
});
