import "server-only";
import type { z } from "zod";
import { getLibraryItem, listLibrary, type LibraryCreate, type LibraryKind, type LibraryPatch } from "@/db/library";
import { createLibraryItem, deleteLibraryItem, setLibraryArchived, updateLibraryItem } from "@/db/library-writes";
import {
  CaseCreateSchema,
  CasePatchSchema,
  KitCreateSchema,
  KitPatchSchema,
  RigCreateSchema,
  RigPatchSchema,
  listQuerySchema,
} from "@/model/schemas";
import { api, bodyOf, idOf, json, noBody, queryOf, staff, type IdContext } from "./http";

// The handlers of /api/v1/{cases,kits,rigs}: each one reads the session, checks the role, parses its
// input with the shared schemas, and leaves the shop check to the data layer.

const BODIES: Record<LibraryKind, { create: z.ZodType; patch: z.ZodType }> = {
  cases: { create: CaseCreateSchema, patch: CasePatchSchema },
  kits: { create: KitCreateSchema, patch: KitPatchSchema },
  rigs: { create: RigCreateSchema, patch: RigPatchSchema },
};

/** GET (a page of rows) and POST (a new row) on the collection. */
export function collectionRoutes<K extends LibraryKind>(kind: K) {
  const query = listQuerySchema(kind);
  return {
    GET: api(async (req: Request) => {
      const caller = await staff();
      return json(await listLibrary(caller, kind, queryOf(req, query)));
    }),
    POST: api(async (req: Request) => {
      const caller = await staff();
      const body = (await bodyOf(req, BODIES[kind].create)) as LibraryCreate[K];
      return json({ item: await createLibraryItem(caller, kind, body) }, 201);
    }),
  };
}

/** GET, PATCH (naming the version read) and DELETE (refused while a study uses the row) on one row. */
export function itemRoutes<K extends LibraryKind>(kind: K) {
  return {
    GET: api(async (_req: Request, ctx: IdContext) => {
      const caller = await staff();
      return json({ item: await getLibraryItem(caller, kind, await idOf(ctx)) });
    }),
    PATCH: api(async (req: Request, ctx: IdContext) => {
      const caller = await staff();
      const id = await idOf(ctx);
      const patch = (await bodyOf(req, BODIES[kind].patch)) as LibraryPatch[K];
      return json({ item: await updateLibraryItem(caller, kind, id, patch) });
    }),
    DELETE: api(async (_req: Request, ctx: IdContext) => {
      const caller = await staff();
      await deleteLibraryItem(caller, kind, await idOf(ctx));
      return new Response(null, { status: 204 });
    }),
  };
}

/** POST …/archive or …/restore on one row. */
export function archiveRoute(kind: LibraryKind, archived: boolean) {
  return api(async (req: Request, ctx: IdContext) => {
    const caller = await staff();
    await noBody(req);
    return json({ item: await setLibraryArchived(caller, kind, await idOf(ctx), archived) });
  });
}
