import { NextResponse } from "next/server";
import { handle, parseWith, readJson } from "@/app/api/_lib/respond";
import { requireCaller } from "@/db/access";
import { createJob, listJobs } from "@/db/jobs";
import { SHOP_STAFF } from "@/db/roles";
import { JobCreateSchema, JobListQuerySchema } from "@/model/schemas/jobs";

/** The jobs board: the shop's jobs for staff, the caller's own shared jobs for a customer. */
export const GET = handle(async (req: Request) => {
  const caller = await requireCaller();
  const query = parseWith(JobListQuerySchema, Object.fromEntries(new URL(req.url).searchParams));
  return NextResponse.json(await listJobs(caller, query));
});

export const POST = handle(async (req: Request) => {
  const caller = await requireCaller(SHOP_STAFF);
  const body = parseWith(JobCreateSchema, await readJson(req));
  return NextResponse.json({ item: await createJob(caller, body) }, { status: 201 });
});
