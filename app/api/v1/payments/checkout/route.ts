import { NextResponse } from "next/server";
import { z } from "zod";
import { handle, parseWith, readJson } from "@/app/api/_lib/respond";
import { requireCaller } from "@/db/access";
import { startDepositCheckout } from "@/db/payments";

const Body = z.strictObject({ jobId: z.string({ error: "Name the job." }).min(1, "Name the job.").max(100) });

/** Starts (or resumes) the hosted checkout for a job's deposit; answers its URL. */
export const POST = handle(async (req: Request) => {
  const caller = await requireCaller(["customer"]);
  const { jobId } = parseWith(Body, await readJson(req));
  return NextResponse.json(await startDepositCheckout(caller, jobId), { status: 201 });
});
