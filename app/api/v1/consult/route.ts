import { NextResponse } from "next/server";
import { handle } from "@/app/api/_lib/respond";
import { requireCaller } from "@/db/access";
import { listJobs } from "@/db/jobs";

/** The plans shared with the signed-in customer. */
export const GET = handle(async () => {
  const caller = await requireCaller(["customer"]);
  return NextResponse.json(await listJobs(caller, { page: 1, pageSize: 100 }));
});
