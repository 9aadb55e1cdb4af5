import { setStudyArchived } from "@/db/study-writes";
import { api, idOf, json, noBody, staff, type IdContext } from "../../../_lib/http";

export const POST = api(async (req: Request, ctx: IdContext) => {
  const caller = await staff();
  await noBody(req);
  return json({ item: await setStudyArchived(caller, await idOf(ctx), true) });
});
