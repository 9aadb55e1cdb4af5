import { NextResponse } from "next/server";
import { handle, parseWith, readJson } from "@/app/api/_lib/respond";
import { requireCaller } from "@/db/access";
import { startDepositCheckout } from "@/db/payments";
import { CheckoutSchema } from "../../_lib/account-schemas";


/** Starts (or resumes) the hosted checkout for a job's deposit; answers its URL. */
export const POST = handle(async (req: Request) => {
  const caller = await requireCaller(["customer"]);
  const { jobId } = parseWith(CheckoutSchema, await readJson(req));
  return NextResponse.json(await startDepositCheckout(caller, jobId), { status: 201 });
});
