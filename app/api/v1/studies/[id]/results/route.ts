import { studyResultsJson } from "@/db/studies";
import { api, idOf, staff, type IdContext } from "../../../_lib/http";

/** The stored study evaluated by the core on the server: { study, result }. */
export const GET = api(async (_req: Request, ctx: IdContext) => {
  const caller = await staff();
  const body = await studyResultsJson(caller, await idOf(ctx));
  return new Response(body, { headers: { "content-type": "application/json" } });
});
