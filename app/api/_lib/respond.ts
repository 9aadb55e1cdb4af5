import "server-only";
import { NextResponse } from "next/server";
import { z } from "zod";
import { AccessError } from "@/db/access";
import { trustedOrigins } from "@/db/config";
import { DataError } from "@/db/errors";
import { GeometryError } from "@/geometry/errors";
import { ApiProblem } from "@/model/api-problem";

/** The one JSON error shape every API route answers with. */
export type ApiErrorBody = { error: { code: string; message: string; fields?: Record<string, string> } };

/** A refusal a route handler throws; `handle` answers it in the one error shape. */
export class ApiError extends ApiProblem {
  override name = "ApiError";
}

export function errorResponse(status: number, code: string, message: string, fields?: Record<string, string>) {
  const body: ApiErrorBody = { error: { code, message, ...(fields ? { fields } : {}) } };
  return NextResponse.json(body, { status, headers: { "cache-control": "no-store" } });
}

/** Each failing field by its dotted path, with zod's reason. */
export function fieldsOf(error: z.ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const path = issue.path.map(String).join(".") || "(body)";
    fields[path] ??= issue.message;
  }
  return fields;
}

const STATUS: Record<AccessError["code"], number> = { unauthenticated: 401, forbidden: 403, not_found: 404 };

/** Maps a thrown error to the JSON error shape; anything unexpected is logged and answered 500 without details. */
export function toErrorResponse(error: unknown) {
  if (error instanceof ApiError) return errorResponse(error.status, error.code, error.message, error.fields);
  if (error instanceof AccessError) return errorResponse(STATUS[error.code], error.code, error.message);
  if (error instanceof DataError) return errorResponse(error.status, error.code, error.message, error.fields);
  if (error instanceof z.ZodError) return errorResponse(400, "invalid_input", "Some fields are not valid.", fieldsOf(error));
  if (error instanceof GeometryError) return errorResponse(422, "geometry", error.message);
  console.error("unexpected error in an API route:", error);
  return errorResponse(500, "internal", "Something went wrong on the server. Nothing was saved.");
}

export const MAX_BODY_BYTES = 256 * 1024;

/**
 * Reads a JSON body as unknown: 413 when too large, 400 when it is not JSON. An empty body is refused,
 * or answers `whenEmpty` where the route takes none as a value of its own.
 */
export async function readJson(req: Request, maxBytes = MAX_BODY_BYTES, whenEmpty?: unknown): Promise<unknown> {
  const declared = Number(req.headers.get("content-length") ?? "0");
  if (declared > maxBytes) throw new ApiError(413, "too_large", `The body is larger than ${Math.round(maxBytes / 1024)} KB.`);
  const text = await req.text().catch(() => undefined);
  if (text === undefined) throw new ApiError(400, "invalid_body", "The body could not be read.");
  if (Buffer.byteLength(text) > maxBytes) throw new ApiError(413, "too_large", `The body is larger than ${Math.round(maxBytes / 1024)} KB.`);
  if (!text.trim()) {
    if (whenEmpty !== undefined) return whenEmpty;
    throw new ApiError(400, "invalid_body", "The body is empty; send JSON.");
  }
  try {
    return JSON.parse(text) as unknown;
  } catch {
    throw new ApiError(400, "invalid_json", "The body is not valid JSON.");
  }
}

/** Parses a body with a schema, or throws the 400 with each bad field named. */
export function parseWith<T extends z.ZodType>(schema: T, body: unknown): z.infer<T> {
  const result = schema.safeParse(body);
  if (!result.success) throw new ApiError(400, "invalid_input", "Some fields are not valid.", fieldsOf(result.error));
  return result.data;
}

const CHANGES_STATE = new Set(["POST", "PUT", "PATCH", "DELETE"]);

/** What a route accepts from browsers: its own origin only (the default), or any origin for a signed call. */
export type RouteOptions = {
  /** "same-origin": a browser call must come from a trusted origin; "signed": any origin, the route checks a signature. */
  callers?: "same-origin" | "signed";
  /** The body types a state-changing call may send: JSON by default; "multipart" adds multipart/form-data for uploads. */
  body?: "json" | "multipart";
};

/** The media type of a Content-Type header, lower case, without parameters. */
function mediaType(header: string | null): string | null {
  if (header === null) return null;
  return header.split(";")[0].trim().toLowerCase();
}

/**
 * Refuses a state-changing call from another site (403) or with a body that is not JSON (415): a form or a
 * script on another site can send text/plain or form bodies without asking, but not application/json.
 */
export function checkCrossSite(req: Request, options: RouteOptions = {}): void {
  if (!CHANGES_STATE.has(req.method.toUpperCase())) return;
  if (options.callers !== "signed") {
    const origin = req.headers.get("origin");
    if (origin !== null) {
      if (!trustedOrigins().includes(origin)) throw new ApiError(403, "cross_site", "Requests from another site are not accepted.");
    } else {
      const site = req.headers.get("sec-fetch-site");
      if (site !== null && site !== "same-origin" && site !== "none") throw new ApiError(403, "cross_site", "Requests from another site are not accepted.");
    }
  }
  const type = mediaType(req.headers.get("content-type"));
  const allowed = options.body === "multipart" ? ["application/json", "multipart/form-data"] : ["application/json"];
  const length = req.headers.get("content-length");
  const hasBody = req.headers.has("transfer-encoding") || (length !== null && Number(length) > 0);
  if ((type !== null && !allowed.includes(type)) || (type === null && hasBody)) {
    throw new ApiError(415, "unsupported_media_type", `Send the body as ${allowed.join(" or ")}.`);
  }
}

/** Every API answer is private to its caller and current: no cache may keep it. */
export function noStore(res: Response): Response {
  try {
    res.headers.set("cache-control", "no-store");
    return res;
  } catch {
    // A Response.redirect() has immutable headers: copy it.
    const copy = new Response(res.body, res);
    copy.headers.set("cache-control", "no-store");
    return copy;
  }
}

/** Wraps a route handler so every thrown error leaves in the one JSON shape. */
export function handle<C>(fn: (req: Request, ctx: C) => Promise<Response>, options: RouteOptions = {}) {
  return async (req: Request, ctx: C): Promise<Response> => {
    try {
      checkCrossSite(req, options);
      return noStore(await fn(req, ctx));
    } catch (error) {
      return toErrorResponse(error);
    }
  };
}
