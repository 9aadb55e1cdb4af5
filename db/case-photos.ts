import "server-only";
import { randomUUID } from "node:crypto";
import { and, desc, eq, ne } from "drizzle-orm";
import { MAX_PHOTO_BYTES, PHOTO_TYPES } from "@/model/schemas/jobs";
import { AccessError, type Caller } from "./access";
import { getDb } from "./client";
import { DataError } from "./errors";
import { sniffImageType } from "./photos";
import { SHOP_STAFF } from "./roles";
import * as schema from "./schema";
import { deleteObject, inspectObject, presignDownload, presignUpload, StorageNotConfigured } from "./storage";

// Photos of a case profile's deck, traced over in the case form. Same path as a job's photos: the browser asks
// for an upload URL, PUTs the file straight to storage, then asks the server to check it by its first bytes
// and its stored size. Shop staff only; a customer never sees them, another shop's case answers 404.

type PhotoType = (typeof PHOTO_TYPES)[number];

export type CasePhotoView = {
  id: string;
  state: "ready" | "refused";
  refusedReason: string | null;
  contentType: string;
  sizeBytes: number;
  widthPx: number | null;
  heightPx: number | null;
  createdAt: string;
  url: string | null;
};

function assertStaff(caller: Caller) {
  if (!SHOP_STAFF.includes(caller.role)) throw new AccessError("forbidden", "Only the shop's owner and builders see a case profile's photos.");
}

function storageError(error: unknown): never {
  if (error instanceof StorageNotConfigured) throw new DataError("storage_unavailable", error.message);
  throw error;
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
  const [p] = await db
    .select()
    .from(schema.casePhoto)
    .where(and(eq(schema.casePhoto.id, photoId), eq(schema.casePhoto.caseId, caseId), eq(schema.casePhoto.organizationId, caller.shopId)))
    .limit(1);
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
  body: { contentType: PhotoType; sizeBytes: number; widthPx?: number; heightPx?: number },
) {
  await caseOr404(caller, caseId);
  const id = randomUUID();
  const ext = body.contentType === "image/jpeg" ? "jpg" : body.contentType === "image/png" ? "png" : "webp";
  const objectKey = `shops/${caller.shopId}/cases/${caseId}/${id}.${ext}`;
  const uploadUrl = await presignUpload(objectKey, body.contentType, body.sizeBytes).catch(storageError);
  const db = await getDb();
  await db.insert(schema.casePhoto).values({
    id,
    caseId,
    organizationId: caller.shopId,
    objectKey,
    contentType: body.contentType,
    sizeBytes: body.sizeBytes,
    widthPx: body.widthPx ?? null,
    heightPx: body.heightPx ?? null,
    state: "pending",
    createdBy: caller.userId,
  });
  return { id, uploadUrl, method: "PUT" as const, headers: { "content-type": body.contentType } };
}

/** Checks an uploaded file: an accepted image type by its bytes and within the size limit; else it is deleted and refused. */
export async function completeCasePhotoUpload(caller: Caller, caseId: string, photoId: string): Promise<CasePhotoView> {
  const p = await photoOr404(caller, caseId, photoId);
  if (p.state !== "pending") return view(p);
  const found = await inspectObject(p.objectKey).catch(storageError);
  if (!found) throw new DataError("not_uploaded", "Nothing was uploaded for this photo yet; upload the file, then try again.");
  const sniffed = sniffImageType(found.head);
  let reason: string | null = null;
  if (found.sizeBytes > MAX_PHOTO_BYTES) reason = `The file is ${(found.sizeBytes / 1024 / 1024).toFixed(1)} MB; photos are limited to ${MAX_PHOTO_BYTES / 1024 / 1024} MB.`;
  else if (!sniffed) reason = "The file is not a JPEG, PNG or WebP image (its contents say otherwise, whatever its name).";
  else if (sniffed !== p.contentType) reason = `The file is a ${sniffed.slice(6).toUpperCase()} image but was declared as ${p.contentType.slice(6).toUpperCase()}; choose the file again.`;
  const db = await getDb();
  if (reason) {
    await deleteObject(p.objectKey).catch(() => undefined);
    await db.update(schema.casePhoto).set({ state: "refused", refusedReason: reason, sizeBytes: found.sizeBytes }).where(eq(schema.casePhoto.id, p.id));
    throw new DataError("photo_refused", reason);
  }
  await db.update(schema.casePhoto).set({ state: "ready", sizeBytes: found.sizeBytes }).where(eq(schema.casePhoto.id, p.id));
  return view({ ...p, state: "ready", sizeBytes: found.sizeBytes });
}

/** A fresh download URL for one checked photo. */
export async function casePhotoDownload(caller: Caller, caseId: string, photoId: string): Promise<string> {
  const p = await photoOr404(caller, caseId, photoId);
  if (p.state !== "ready") throw new AccessError("not_found", "No photo with this id on this case profile.");
  return presignDownload(p.objectKey).catch(storageError);
}

/** Removes a photo: its row and its file. */
export async function deleteCasePhoto(caller: Caller, caseId: string, photoId: string): Promise<void> {
  const p = await photoOr404(caller, caseId, photoId);
  const db = await getDb();
  await db.delete(schema.casePhoto).where(eq(schema.casePhoto.id, p.id));
  await deleteObject(p.objectKey).catch(() => undefined);
}
