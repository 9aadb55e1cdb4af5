import { importStudy } from "@/db/study-writes";
import { StudySchema } from "@/model/schemas";
import { api, bodyOf, json, staff } from "../../_lib/http";

export const MAX_STUDY_FILE_BYTES = 1024 * 1024;

/** A study file (the fit CLI's format) becomes a study, with its case, kits and rig as new library rows. */
export const POST = api(async (req: Request) => {
  const caller = await staff();
  const study = await bodyOf(req, StudySchema, MAX_STUDY_FILE_BYTES);
  return json({ item: await importStudy(caller, study) }, 201);
});
