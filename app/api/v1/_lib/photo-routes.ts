import "server-only";
import { NextResponse } from "next/server";
import type { z } from "zod";
import { requireCaller, type Caller } from "@/db/access";
import {
  casePhotoDownload,
  completeCasePhotoUpload,
  deleteCasePhoto,
  listCasePhotos,
  requestCasePhotoUpload,
  setCasePhotoReference,
} from "@/db/case-photos";
import { completeUpload, listPhotos, photoDownload, requestUpload, updatePhoto } from "@/db/photos";
import { SHOP_STAFF, type Role } from "@/db/roles";
import { CasePhotoPatchSchema, CasePhotoRequestSchema } from "@/model/schemas/case-photos";
import { PhotoPatchSchema, PhotoRequestSchema } from "@/model/schemas/jobs";
import { api, bodyOf, json, noBody, staff } from "./http";

// The handlers of the photo routes of a job and of a case profile: …/photos (list, start an upload),
// …/photos/[photoId] (download, change, remove) and …/photos/[photoId]/complete (check the uploaded file).
// Each one reads the session and checks the role here; the data layer checks that the job or the case
// profile and the photo are the caller's shop's (another shop's answers 404).

type OwnerContext = { params: Promise<{ id: string }> };
type PhotoContext = { params: Promise<{ id: string; photoId: string }> };

/** What the routes of one owner's photos ask the data layer, with the request shapes it reads. */
export type PhotoShelf<Upload extends z.ZodType, Change extends z.ZodType> = {
  /** Who may list and download the photos: all signed-in callers (the data layer shows each what is theirs), or only these roles. */
  viewers?: readonly Role[];
  uploadSchema: Upload;
  changeSchema: Change;
  list(caller: Caller, ownerId: string): Promise<unknown[]>;
  requestUpload(caller: Caller, ownerId: string, body: z.infer<Upload>): Promise<unknown>;
  completeUpload(caller: Caller, ownerId: string, photoId: string): Promise<unknown>;
  download(caller: Caller, ownerId: string, photoId: string): Promise<string>;
  change(caller: Caller, ownerId: string, photoId: string, body: z.infer<Change>): Promise<unknown>;
};

/** The route handlers of one owner's photos: `collection`, `item` and `complete`, each exported by its route file. */
export function photoRoutes<Upload extends z.ZodType, Change extends z.ZodType>(shelf: PhotoShelf<Upload, Change>) {
  const viewer = () => requireCaller(shelf.viewers);
  return {
    collection: {
      /** The owner's photos with short-lived download URLs. */
      GET: api(async (_req: Request, ctx: OwnerContext) => {
        const caller = await viewer();
        return json({ items: await shelf.list(caller, (await ctx.params).id) });
      }),
      /** Starts an upload: answers a presigned PUT URL; the browser sends the file straight to storage, then calls …/complete. */
      POST: api(async (req: Request, ctx: OwnerContext) => {
        const caller = await staff();
        const { id } = await ctx.params;
        return json(await shelf.requestUpload(caller, id, await bodyOf(req, shelf.uploadSchema)), 201);
      }),
    },
    item: {
      /** Redirects to a fresh presigned download URL for a photo the caller may see. */
      GET: api(async (_req: Request, ctx: PhotoContext) => {
        const caller = await viewer();
        const { id, photoId } = await ctx.params;
        return NextResponse.redirect(await shelf.download(caller, id, photoId), 303);
      }),
      /** Changes what the owner's photos let a caller change: `{ item }` as it is now. */
      PATCH: api(async (req: Request, ctx: PhotoContext) => {
        const caller = await staff();
        const { id, photoId } = await ctx.params;
        return json({ item: await shelf.change(caller, id, photoId, await bodyOf(req, shelf.changeSchema)) });
      }),
    },
    complete: {
      /** Checks the uploaded file (type by its bytes, size) and keeps it, or deletes it and says why. */
      POST: api(async (req: Request, ctx: PhotoContext) => {
        const caller = await staff();
        await noBody(req);
        const { id, photoId } = await ctx.params;
        return json({ item: await shelf.completeUpload(caller, id, photoId) });
      }),
    },
  };
}

/** A job's photos: the shop's staff add and change them; the job's customer lists and downloads the shared ones. */
export const JOB_PHOTOS = photoRoutes({
  uploadSchema: PhotoRequestSchema,
  changeSchema: PhotoPatchSchema,
  list: listPhotos,
  requestUpload,
  completeUpload,
  download: photoDownload,
  change: updatePhoto,
});

/** DELETE on one photo: the shop's staff remove it and its file. */
export function photoRemoval(remove: (caller: Caller, ownerId: string, photoId: string) => Promise<void>) {
  return api(async (_req: Request, ctx: PhotoContext) => {
    const caller = await staff();
    const { id, photoId } = await ctx.params;
    await remove(caller, id, photoId);
    return new NextResponse(null, { status: 204 });
  });
}

/** A case profile's deck photos, newest first: shop staff only. A change sets (or, with null, clears) the photo's reference points. */
export const CASE_PHOTOS = {
  ...photoRoutes({
    viewers: SHOP_STAFF,
    uploadSchema: CasePhotoRequestSchema,
    changeSchema: CasePhotoPatchSchema,
    list: listCasePhotos,
    requestUpload: requestCasePhotoUpload,
    completeUpload: completeCasePhotoUpload,
    download: casePhotoDownload,
    change: (caller, id, photoId, body) => setCasePhotoReference(caller, id, photoId, body.reference),
  }),
  remove: photoRemoval(deleteCasePhoto),
};
