import { NextResponse } from "next/server";
import { requireCaller } from "@/db/access";
import { setUnits } from "@/db/members";
import { handle, parseWith, readJson } from "../../_lib/respond";
import { MePatchSchema } from "../_lib/account-schemas";


/** The caller: who, which shop, which role, which units. */
export const GET = handle(async () => {
  const caller = await requireCaller();
  return NextResponse.json({ me: caller });
});

/** Changes the caller's own preferences (units). */
export const POST = handle(async (req: Request) => {
  const caller = await requireCaller();
  const body = parseWith(MePatchSchema, await readJson(req));
  await setUnits(caller, body.units);
  return NextResponse.json({ me: { ...caller, units: body.units } });
});
