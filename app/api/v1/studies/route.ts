import { listStudies } from "@/db/studies";
import { createStudy } from "@/db/study-writes";
import { StudyCreateSchema, listQuerySchema } from "@/model/schemas";
import { api, bodyOf, json, queryOf, staff } from "../_lib/http";

const query = listQuerySchema("studies");

/** A page of the shop's studies. */
export const GET = api(async (req: Request) => {
  const caller = await staff();
  return json(await listStudies(caller, queryOf(req, query)));
});

/** A new study from the shop's case profiles, kits and rigs. */
export const POST = api(async (req: Request) => {
  const caller = await staff();
  return json({ item: await createStudy(caller, await bodyOf(req, StudyCreateSchema)) }, 201);
});
