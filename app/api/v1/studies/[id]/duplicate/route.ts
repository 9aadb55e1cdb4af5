import { duplicateStudy } from "@/db/study-writes";
import { api, idOf, json, noBody, staff, type IdContext } from "../../../_lib/http";

/** A copy of the study, named "… (copy)". */
export const POST = api(async (req: Request, ctx: IdContext) => {
  const caller = await staff();
  await noBody(req);
  return json({ item: await duplicateStudy(caller, await idOf(ctx)) }, 201);
});
