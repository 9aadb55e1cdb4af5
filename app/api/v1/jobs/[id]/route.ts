import { readRoute, writeRoute } from "@/app/api/v1/_lib/http";
import { jobDetail, updateJob } from "@/db/jobs";
import { JobPatchSchema } from "@/model/schemas/jobs";

/** The job with its plan, latest readings and verification, history and questions (its customer sees it once shared). */
export const GET = readRoute("signed-in", jobDetail);

/** Changes the job's details (owner or builder); the body names the version it was read at. */
export const PATCH = writeRoute(JobPatchSchema, async (caller, id, patch) => ({ item: await updateJob(caller, id, patch) }));
