import { getStudy } from "@/db/studies";
import { updateStudy } from "@/db/study-writes";
import { StudyPatchSchema } from "@/model/schemas";
import { readRoute, writeRoute } from "../../_lib/http";

/** The study's row and the assembled Study the core evaluates. */
export const GET = readRoute("staff", getStudy);

/** Changes the study; the body names the version it was read at (409 when someone else changed it since). */
export const PATCH = writeRoute(StudyPatchSchema, async (caller, id, patch) => ({ item: await updateStudy(caller, id, patch) }));
