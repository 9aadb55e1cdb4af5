import "server-only";
import { and, desc, eq, ne } from "drizzle-orm";
import { pointsOutsidePhoto, PhotoReferenceSchema, type PhotoReference } from "@/model/schemas/case-photos";
import type { PhotoType } from "@/model/photo-files";
import { AccessError, type Caller } from "./access";
import { getDb, type Db } from "./client";
import { DataError } from "./errors";
import { SHOP_STAFF } from "./roles";
import { readColumn } from "./rows";
import * as schema from "./schema";
import { describeError, photoWhere, presignPhotoUpload, settleUploadedPhoto } from "./photo-files";
import { deleteObject, presignDownload, StorageNotConfigured } from "./storage";

// Photos of a case profile's deck, traced over in the case form. Same path as a job's photos: the browser asks
// for an upload URL, PUTs the file straight to storage, then asks the server to check it by its first bytes
// and its stored size. Shop staff only; a customer never sees them, another shop's case answers 404.

export type CasePhotoView = {
  id: string;
  state: "ready" | "refused";
  refusedReason: string | null;
  contentType: string;
  sizeBytes: number;
  widthPx: number | null;
  heightPx: number | null;
  /** The reference points the trace was scaled or squared up by, in the photo's pixels; null until set. */
  reference: PhotoReference | null;
  createdAt: string;
  url: string | null;
};

function assertStaff(caller: Caller) {
  if (!SHOP_STAFF.includes(caller.role)) throw new AccessError("forbidden", "Only the shop's owner and builders see a case profile's photos.");
}

/** An object store that is not set up or did not answer: the caller is told to try later (503); the cause is logged for the shop's admin. */
function storageError(error: unknown): never {
  if (error instanceof StorageNotConfigured) throw new DataError("storage_unavailable", error.message);
  console.error("case photos: the object store failed:", describeError(error));
  throw new DataError("storage_unavailable", "The photo store did not answer; nothing was changed. Try again in a moment.");
}

async function caseOr404(caller: Caller, caseId: string) {
  assertStaff(caller);
  const db = await getDb();
  const [row] = await db
    .select({ id: schema.caseProfile.id })
    .from(schema.caseProfile)
    .where(and(eq(schema.caseProfile.id, caseId), eq(schema.caseProfile.organizationId, caller.shopId)))
    .limit(1);
  if (!row) throw new AccessError("not_found", "No case profile with this id in your shop.");
}

async function photoOr404(caller: Caller, caseId: string, photoId: string) {
  await caseOr404(caller, caseId);
  const db = await getDb();
  const [p] = await db.select().from(schema.casePhoto).where(photoWhere(schema.casePhoto, schema.casePhoto.caseId, caseId, photoId, caller)).limit(1);
  if (!p) throw new AccessError("not_found", "No photo with this id on this case profile.");
  return p;
}

async function view(p: schema.CasePhotoRow): Promise<CasePhotoView> {
  return {
    id: p.id,
    state: p.state === "ready" ? "ready" : "refused",
    refusedReason: p.refusedReason,
    contentType: p.contentType,
    sizeBytes: p.sizeBytes,
    widthPx: p.widthPx,
    heightPx: p.heightPx,
    reference: readColumn(PhotoReferenceSchema.nullable(), p.referenceJson, null, "case photo reference"),
    createdAt: p.createdAt.toISOString(),
    url: p.state === "ready" ? await presignDownload(p.objectKey).catch(storageError) : null,
  };
}

/** The case profile's checked photos, newest first (refused ones too, with the reason). */
export async function listCasePhotos(caller: Caller, caseId: string): Promise<CasePhotoView[]> {
  await caseOr404(caller, caseId);
  const db = await getDb();
  const rows = await db
    .select()
    .from(schema.casePhoto)
    .where(and(eq(schema.casePhoto.caseId, caseId), eq(schema.casePhoto.organizationId, caller.shopId), ne(schema.casePhoto.state, "pending")))
    .orderBy(desc(schema.casePhoto.createdAt));
  return Promise.all(rows.map(view));
}

/** Starts an upload: records the photo as pending and returns a presigned PUT bound to the declared type and size. */
export async function requestCasePhotoUpload(
  caller: Caller,
  caseId: string,
  body: { contentType: PhotoType; sizeBytes: number; widthPx?: number; heightPx?: number; reference?: PhotoReference },
) {
  await caseOr404(caller, caseId);
  const { row, answer } = await presignPhotoUpload(caller, `shops/${caller.shopId}/cases/${caseId}`, body, storageError);
  const db = await getDb();
  await db.insert(schema.casePhoto).values({
    ...row,
    caseId,
    widthPx: body.widthPx ?? null,
    heightPx: body.heightPx ?? null,
    referenceJson: body.reference ? JSON.stringify(body.reference) : null,
  });
  return answer;
}

/** Checks an uploaded file: an accepted image type by its bytes and within the size limit; else it is deleted and refused. */
export async function completeCasePhotoUpload(caller: Caller, caseId: string, photoId: string): Promise<CasePhotoView> {
  const p = await photoOr404(caller, caseId, photoId);
  if (p.state !== "pending") return view(p);
  const db = await getDb();
  const sizeBytes = await settleUploadedPhoto(p, "case photo", storageError, (check) => db.update(schema.casePhoto).set(check).where(eq(schema.casePhoto.id, p.id)));
  return view({ ...p, state: "ready", sizeBytes });
}

/** A fresh download URL for one checked photo. */
export async function casePhotoDownload(caller: Caller, caseId: string, photoId: string): Promise<string> {
  const p = await photoOr404(caller, caseId, photoId);
  if (p.state !== "ready") throw new AccessError("not_found", "No photo with this id on this case profile.");
  return presignDownload(p.objectKey).catch(storageError);
}

/** Sets or clears the reference points of a photo; every point must lie on the photo. */
export async function setCasePhotoReference(caller: Caller, caseId: string, photoId: string, reference: PhotoReference | null): Promise<CasePhotoView> {
  const p = await photoOr404(caller, caseId, photoId);
  if (p.state === "refused") throw new DataError("photo_refused", p.refusedReason ?? "This photo was refused; choose the file again.");
  if (reference) {
    if (p.widthPx === null || p.heightPx === null) {
      throw new DataError("invalid_input", "This photo's size in pixels is not known, so its reference points cannot be checked; upload it again.", { reference: "The photo's size is not known." });
    }
    const outside = pointsOutsidePhoto(reference, p.widthPx, p.heightPx);
    if (outside) {
      throw new DataError("invalid_input", "Some fields are not valid.", Object.fromEntries(Object.entries(outside).map(([path, message]) => [`reference.${path}`, message])));
    }
  }
  const referenceJson = reference ? JSON.stringify(reference) : null;
  const db = await getDb();
  await db.update(schema.casePhoto).set({ referenceJson }).where(eq(schema.casePhoto.id, p.id));
  return view({ ...p, referenceJson });
}

/** An error's words for a log line, without its stack. */
/**
 * Removes stored photo files whose rows are already gone. A file that cannot be removed is logged and
 * left: with its row deleted nothing links to it or presigns it any more, so it is unreachable and costs
 * only storage; the deletion the caller asked for has happened and stands.
 */
export async function removeCasePhotoFiles(objectKeys: readonly string[]): Promise<void> {
  for (const key of objectKeys) {
    await deleteObject(key).catch((error: unknown) => {
      console.warn(`case photo file ${key}: its row is deleted but the file could not be removed from the object store; it is unreachable and is left.`, describeError(error));
    });
  }
}

/**
 * Deletes a case profile and its photos' rows in one write batch (all or nothing); answers the deleted
 * photos' object keys, whose files the caller removes after the commit, so a file never goes while its row
 * could stay.
 */
export async function deleteCaseProfileRows(db: Db, shopId: string, caseId: string): Promise<string[]> {
  const [photos] = await db.batch([
    db
      .delete(schema.casePhoto)
      .where(and(eq(schema.casePhoto.caseId, caseId), eq(schema.casePhoto.organizationId, shopId)))
      .returning({ objectKey: schema.casePhoto.objectKey }),
    db.delete(schema.caseProfile).where(and(eq(schema.caseProfile.id, caseId), eq(schema.caseProfile.organizationId, shopId))),
  ]);
  return photos.map((p) => p.objectKey);
}

/** Removes a photo: its row, then its file. */
export async function deleteCasePhoto(caller: Caller, caseId: string, photoId: string): Promise<void> {
  const p = await photoOr404(caller, caseId, photoId);
  const db = await getDb();
  await db.delete(schema.casePhoto).where(eq(schema.casePhoto.id, p.id));
  await removeCasePhotoFiles([p.objectKey]);
}
