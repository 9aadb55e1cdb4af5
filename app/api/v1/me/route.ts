import { NextResponse } from "next/server";
import { z } from "zod";
import { requireCaller } from "@/db/access";
import { setUnits } from "@/db/members";
import { handle, parseWith, readJson } from "../../_lib/respond";

const MePatch = z.object({ units: z.enum(["mm", "in"]) }).strict();

/** The caller: who, which shop, which role, which units. */
export const GET = handle(async () => {
  const caller = await requireCaller();
  return NextResponse.json({ me: caller });
});

/** Changes the caller's own preferences (units). */
export const POST = handle(async (req: Request) => {
  const caller = await requireCaller();
  const body = parseWith(MePatch, await readJson(req));
  await setUnits(caller, body.units);
  return NextResponse.json({ me: { ...caller, units: body.units } });
});
