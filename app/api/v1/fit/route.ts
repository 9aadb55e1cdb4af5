import { GeometryError, evaluateStudy } from "@/geometry";
import { requireCaller } from "@/db/access";
import { ApiError } from "../../_lib/respond";
import { StudySchema } from "@/model/schemas";
import { api, bodyOf, json } from "../_lib/http";

const MAX_STUDY_BYTES = 1024 * 1024;

/** Evaluates a study sent in the body (the fit CLI's format), for any signed-in member of a shop. */
export const POST = api(async (req: Request) => {
  await requireCaller();
  const study = await bodyOf(req, StudySchema, MAX_STUDY_BYTES);
  try {
    return json({ result: evaluateStudy(study) });
  } catch (error) {
    if (error instanceof GeometryError) throw new ApiError(422, "geometry", error.message);
    throw error;
  }
});
