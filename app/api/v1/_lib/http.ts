import "server-only";
import { NextResponse } from "next/server";
import type { z } from "zod";
import { requireCaller, type Caller } from "@/db/access";
import { DataError } from "@/db/errors";
import { SHOP_STAFF } from "@/db/roles";
import { ApiError, MAX_BODY_BYTES, handle, parseWith, readJson } from "../../_lib/respond";

/** The context Next.js hands a handler under a dynamic [id] segment. */
export type IdContext = { params: Promise<{ id: string }> };

/** Wraps a handler: the data layer's refusals leave as their status in the one JSON error shape. */
export function api<C>(fn: (req: Request, ctx: C) => Promise<Response>) {
  return handle<C>(async (req, ctx) => {
    try {
      return await fn(req, ctx);
    } catch (error) {
      if (error instanceof DataError) throw new ApiError(error.status, error.code, error.message, error.fields);
      throw error;
    }
  });
}

/** The caller, who must be the shop's owner or a builder (401 signed out, 403 for a customer). */
export const staff = (): Promise<Caller> => requireCaller(SHOP_STAFF);

/** The row id of the route. */
export async function idOf(ctx: IdContext): Promise<string> {
  return (await ctx.params).id;
}

/** The query string parsed by a schema (400 naming each bad parameter). */
export function queryOf<T extends z.ZodType>(req: Request, schema: T): z.infer<T> {
  const params = Object.fromEntries(new URL(req.url).searchParams);
  return parseWith(schema, params);
}

/** The JSON body parsed by a schema: 413 when too large, 400 naming each bad field. */
export async function bodyOf<T extends z.ZodType>(req: Request, schema: T, maxBytes?: number): Promise<z.infer<T>> {
  return parseWith(schema, await readJson(req, maxBytes));
}

export const json = (data: unknown, status = 200) => NextResponse.json(data, { status });

/** GET on one row: `read` answers what the caller may see of it (the data layer answers another shop's row, or one the caller may not see, with 404). */
export function readRoute(who: "signed-in" | "staff", read: (caller: Caller, id: string) => Promise<unknown>) {
  return api(async (_req: Request, ctx: IdContext) => {
    const caller = who === "staff" ? await staff() : await requireCaller();
    return json(await read(caller, await idOf(ctx)));
  });
}

/** A write on one row by the shop's staff, its JSON body parsed by `schema` first (413 when too large, 400 naming each bad field). */
export function writeRoute<T extends z.ZodType>(schema: T, write: (caller: Caller, id: string, body: z.infer<T>) => Promise<unknown>) {
  return api(async (req: Request, ctx: IdContext) => {
    const caller = await staff();
    const id = await idOf(ctx);
    return json(await write(caller, id, await bodyOf(req, schema)));
  });
}

/** For actions that take no body: nothing, or an empty JSON object; anything else is refused with 400. */
export async function noBody(req: Request): Promise<void> {
  const declared = Number(req.headers.get("content-length") ?? "0");
  if (declared > MAX_BODY_BYTES) throw new ApiError(413, "too_large", "This action takes no body.");
  // A body that cannot be read carries nothing this action would refuse: it goes on as with no body.
  const text = (await req.text().catch(() => "")).trim();
  if (text === "") return;
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch {
    throw new ApiError(400, "invalid_json", "The body is not valid JSON; this action takes no body.");
  }
  if (value && typeof value === "object" && !Array.isArray(value) && Object.keys(value).length === 0) return;
  throw new ApiError(400, "invalid_body", "This action takes no body.", { "(body)": "Send no body, or {}." });
}
