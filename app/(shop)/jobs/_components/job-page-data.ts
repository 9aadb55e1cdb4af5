import "server-only";
import { notFound } from "next/navigation";
import { AccessError, type Caller } from "@/db/access";
import { jobDetail } from "@/db/jobs";
import { listPhotos } from "@/db/photos";

/**
 * What the job page and the consult page both read of one job: its detail (another shop's job, or one the
 * caller may not see, answers 404) and its photos, which are an aside — without the object store the rest
 * of the job still shows.
 */
export async function jobPageData(caller: Caller, id: string, page: "job page" | "consult page") {
  const detail = await jobDetail(caller, id).catch((error: unknown) => {
    if (error instanceof AccessError && error.code === "not_found") notFound();
    throw error;
  });
  const photos = await listPhotos(caller, id).catch((error: unknown) => {
    console.warn(`${page}: the job's photos could not be listed; the page shows without them.`, error);
    return null;
  });
  return { detail, photos };
}
