import "server-only";
import { randomUUID } from "node:crypto";
import { and, eq } from "drizzle-orm";
import type { AnySQLiteColumn } from "drizzle-orm/sqlite-core";
import { photoExtension, uploadedPhotoProblem, type PhotoType } from "@/model/photo-files";
import type { Caller } from "./access";
import { DataError } from "./errors";
import { deleteObject, inspectObject, presignUpload } from "./storage";

// The object-store side of every photo the product keeps (a job's, a case profile's): a presigned upload
// straight to storage, then a check of the stored bytes. The rows are their modules' own.

/** What a storage failure becomes for the caller: each photo module says how it answers one. */
export type StorageFailure = (error: unknown) => never;

/** An error as one log line. */
export function describeError(error: unknown): string {
  return error instanceof Error ? `${error.name}: ${error.message}` : String(error);
}

/**
 * A new photo under `folder`: the columns its row starts with (its id, the caller's shop, its object key, the
 * declared type and size, pending until its file is checked, who added it) and the answer to the browser,
 * the presigned PUT bound to that type and size.
 */
export async function presignPhotoUpload(caller: Caller, folder: string, body: { contentType: PhotoType; sizeBytes: number }, storageError: StorageFailure) {
  const id = randomUUID();
  const objectKey = `${folder}/${id}.${photoExtension(body.contentType)}`;
  const uploadUrl = await presignUpload(objectKey, body.contentType, body.sizeBytes).catch(storageError);
  const row = { id, organizationId: caller.shopId, objectKey, contentType: body.contentType, sizeBytes: body.sizeBytes, state: "pending", createdBy: caller.userId };
  return { row, answer: { id, uploadUrl, method: "PUT" as const, headers: { "content-type": body.contentType } } };
}

/** Where a photo is looked up: this id, on this job or case profile (its `owner` column), in the caller's shop, so another shop's photo is never found. */
export function photoWhere(photos: { id: AnySQLiteColumn; organizationId: AnySQLiteColumn }, owner: AnySQLiteColumn, ownerId: string, photoId: string, caller: Caller) {
  return and(eq(photos.id, photoId), eq(owner, ownerId), eq(photos.organizationId, caller.shopId));
}

/** How a photo's row is marked once its file is checked. */
export type PhotoCheck = { state: "ready"; sizeBytes: number } | { state: "refused"; refusedReason: string; sizeBytes: number };

/**
 * Checks an uploaded photo and marks its row with `record`: ready, with the stored size (which it answers),
 * or refused with the reason, which is then thrown as a DataError "photo_refused".
 */
export async function settleUploadedPhoto(p: { id: string; objectKey: string; contentType: string }, what: string, storageError: StorageFailure, record: (check: PhotoCheck) => Promise<unknown>): Promise<number> {
  const { sizeBytes, refusal } = await checkUploadedPhoto(p, what, storageError);
  if (refusal) {
    await record({ state: "refused", refusedReason: refusal, sizeBytes });
    throw new DataError("photo_refused", refusal);
  }
  await record({ state: "ready", sizeBytes });
  return sizeBytes;
}

/**
 * The stored file's size and why it is refused (its bytes are not the declared image type, or it is too
 * large), or null when it is kept. A refused file is deleted; `what` names the photo in the log.
 */
async function checkUploadedPhoto(p: { id: string; objectKey: string; contentType: string }, what: string, storageError: StorageFailure): Promise<{ sizeBytes: number; refusal: string | null }> {
  const found = await inspectObject(p.objectKey).catch(storageError);
  if (!found) throw new DataError("not_uploaded", "Nothing was uploaded for this photo yet; upload the file, then try again.");
  const refusal = uploadedPhotoProblem(found.sizeBytes, found.head, p.contentType);
  if (refusal) {
    await deleteObject(p.objectKey).catch((error: unknown) => {
      // The refusal stands either way: a refused row is never presigned for download again, so the file
      // left behind is unreachable; it costs only storage until the store's own clean-up.
      console.warn(`${what} ${p.id} refused: its file could not be deleted from the object store; the refusal stands.`, describeError(error));
    });
  }
  return { sizeBytes: found.sizeBytes, refusal };
}
