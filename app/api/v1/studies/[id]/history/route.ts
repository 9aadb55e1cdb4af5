import { studyHistory } from "@/db/studies";
import { api, idOf, json, staff, type IdContext } from "../../../_lib/http";

/** Who changed what in the study, newest first. */
export const GET = api(async (_req: Request, ctx: IdContext) => {
  const caller = await staff();
  return json(await studyHistory(caller, await idOf(ctx)));
});
