import { getStudy } from "@/db/studies";
import { updateStudy } from "@/db/study-writes";
import { StudyPatchSchema } from "@/model/schemas";
import { api, bodyOf, idOf, json, staff, type IdContext } from "../../_lib/http";

/** The study's row and the assembled Study the core evaluates. */
export const GET = api(async (_req: Request, ctx: IdContext) => {
  const caller = await staff();
  return json(await getStudy(caller, await idOf(ctx)));
});

/** Changes the study; the body names the version it was read at (409 when someone else changed it since). */
export const PATCH = api(async (req: Request, ctx: IdContext) => {
  const caller = await staff();
  const id = await idOf(ctx);
  return json({ item: await updateStudy(caller, id, await bodyOf(req, StudyPatchSchema)) });
});
