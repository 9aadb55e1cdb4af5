import { exportStudy } from "@/db/studies";
import { api, idOf, staff, type IdContext } from "../../../_lib/http";
import { attachmentName } from "../../../_lib/files";

/** The study as a file: the JSON that `npm run fit` reads. */
export const GET = api(async (_req: Request, ctx: IdContext) => {
  const caller = await staff();
  const { name, study } = await exportStudy(caller, await idOf(ctx));
  return new Response(`${JSON.stringify(study, null, 2)}\n`, {
    status: 200,
    headers: { "content-type": "application/json; charset=utf-8", "content-disposition": attachmentName(`${name}.study.json`) },
  });
});
