import "server-only";
import { and, asc, eq } from "drizzle-orm";
import { DataError } from "./errors";
import type { PhotoType } from "@/model/photo-files";
import { AccessError, type Caller } from "./access";
import { getDb } from "./client";
import { jobFor } from "./jobs";
import { SHOP_STAFF } from "./roles";
import * as jobs from "./schema-jobs";
import { photoWhere, presignPhotoUpload, settleUploadedPhoto } from "./photo-files";
import { presignDownload, StorageNotConfigured } from "./storage";

// Job photos in object storage. The browser asks for an upload URL, PUTs the file straight to storage,
// then asks the server to check it: the type is read from the file's first bytes, never trusted from the
// name or the header, and the size from storage itself. A refused file is deleted and says why.

export type PhotoView = {
  id: string;
  caption: string;
  kind: string;
  shared: boolean;
  state: "pending" | "ready" | "refused";
  refusedReason: string | null;
  contentType: string;
  sizeBytes: number;
  createdAt: string;
  url: string | null;
};

const staff = (c: Caller) => SHOP_STAFF.includes(c.role);

function storageError(error: unknown): never {
  if (error instanceof StorageNotConfigured) throw new DataError("storage_unavailable", error.message);
  throw error;
}

async function photoView(p: jobs.JobPhotoRecord): Promise<PhotoView> {
  let url: string | null = null;
  if (p.state === "ready") url = await presignDownload(p.objectKey).catch(storageError);
  return {
    id: p.id,
    caption: p.caption,
    kind: p.kind,
    shared: p.shared,
    state: p.state as PhotoView["state"],
    refusedReason: p.refusedReason,
    contentType: p.contentType,
    sizeBytes: p.sizeBytes,
    createdAt: p.createdAt.toISOString(),
    url,
  };
}

/** The job's photos: every checked one for staff (with those refused), only shared ones for its customer. */
export async function listPhotos(caller: Caller, jobId: string): Promise<PhotoView[]> {
  await jobFor(caller, jobId);
  const db = await getDb();
  const where = staff(caller)
    ? and(eq(jobs.jobPhoto.jobId, jobId), eq(jobs.jobPhoto.organizationId, caller.shopId))
    : and(eq(jobs.jobPhoto.jobId, jobId), eq(jobs.jobPhoto.organizationId, caller.shopId), eq(jobs.jobPhoto.shared, true), eq(jobs.jobPhoto.state, "ready"));
  const rows = await db.select().from(jobs.jobPhoto).where(where).orderBy(asc(jobs.jobPhoto.createdAt));
  return Promise.all(rows.filter((r) => staff(caller) ? r.state !== "pending" : true).map(photoView));
}

/** Starts an upload: records the photo as pending and returns a presigned PUT bound to the declared type and size. */
export async function requestUpload(
  caller: Caller,
  jobId: string,
  body: { contentType: PhotoType; sizeBytes: number; caption?: string; kind?: string; shared?: boolean },
) {
  if (!staff(caller)) throw new AccessError("forbidden", "Only the shop adds photos to a job.");
  await jobFor(caller, jobId);
  const { row, answer } = await presignPhotoUpload(caller, `shops/${caller.shopId}/jobs/${jobId}`, body, storageError);
  const db = await getDb();
  await db.insert(jobs.jobPhoto).values({ ...row, jobId, caption: body.caption ?? "", kind: body.kind ?? "other", shared: body.shared ?? false });
  return answer;
}

async function photoOr404(caller: Caller, jobId: string, photoId: string) {
  await jobFor(caller, jobId);
  const db = await getDb();
  const [p] = await db.select().from(jobs.jobPhoto).where(photoWhere(jobs.jobPhoto, jobs.jobPhoto.jobId, jobId, photoId, caller)).limit(1);
  if (!p || (!staff(caller) && !(p.shared && p.state === "ready"))) throw new AccessError("not_found", "No photo with this id on this job.");
  return p;
}

/** Checks an uploaded file: its bytes must be an accepted image type and its size within the limit; else it is deleted and refused. */
export async function completeUpload(caller: Caller, jobId: string, photoId: string): Promise<PhotoView> {
  if (!staff(caller)) throw new AccessError("forbidden", "Only the shop adds photos to a job.");
  const p = await photoOr404(caller, jobId, photoId);
  if (p.state !== "pending") return photoView(p);
  const db = await getDb();
  const sizeBytes = await settleUploadedPhoto(p, "job photo", storageError, (check) => db.update(jobs.jobPhoto).set(check).where(eq(jobs.jobPhoto.id, p.id)));
  return photoView({ ...p, state: "ready", sizeBytes });
}

/** Marks a photo shared with the customer or not, or changes its caption. */
export async function updatePhoto(caller: Caller, jobId: string, photoId: string, patch: { shared?: boolean; caption?: string }): Promise<PhotoView> {
  if (!staff(caller)) throw new AccessError("forbidden", "Only the shop changes a job's photos.");
  const p = await photoOr404(caller, jobId, photoId);
  const db = await getDb();
  const set = { ...(patch.shared !== undefined ? { shared: patch.shared } : {}), ...(patch.caption !== undefined ? { caption: patch.caption } : {}) };
  if (Object.keys(set).length) await db.update(jobs.jobPhoto).set(set).where(eq(jobs.jobPhoto.id, p.id));
  return photoView({ ...p, ...set });
}

/** A fresh download URL for one photo the caller may see. */
export async function photoDownload(caller: Caller, jobId: string, photoId: string): Promise<string> {
  const p = await photoOr404(caller, jobId, photoId);
  if (p.state !== "ready") throw new AccessError("not_found", "No photo with this id on this job.");
  return presignDownload(p.objectKey).catch(storageError);
}
