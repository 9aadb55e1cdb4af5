import "server-only";
import { NextResponse } from "next/server";
import { z } from "zod";
import { AccessError } from "@/db/access";
import { DataError } from "@/db/errors";

/** The one JSON error shape every API route answers with. */
export type ApiErrorBody = { error: { code: string; message: string; fields?: Record<string, string> } };

export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string>,
  ) {
    super(message);
    this.name = "ApiError";
  }
}

export function errorResponse(status: number, code: string, message: string, fields?: Record<string, string>) {
  const body: ApiErrorBody = { error: { code, message, ...(fields ? { fields } : {}) } };
  return NextResponse.json(body, { status });
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
  console.error("unexpected error in an API route:", error);
  return errorResponse(500, "internal", "Something went wrong on the server. Nothing was saved.");
}

export const MAX_BODY_BYTES = 256 * 1024;

/** Reads a JSON body as unknown: 413 when too large, 400 when it is not JSON. */
export async function readJson(req: Request, maxBytes = MAX_BODY_BYTES): Promise<unknown> {
  const declared = Number(req.headers.get("content-length") ?? "0");
  if (declared > maxBytes) throw new ApiError(413, "too_large", `The body is larger than ${Math.round(maxBytes / 1024)} KB.`);
  const text = await req.text().catch(() => undefined);
  if (text === undefined) throw new ApiError(400, "invalid_body", "The body could not be read.");
  if (Buffer.byteLength(text) > maxBytes) throw new ApiError(413, "too_large", `The body is larger than ${Math.round(maxBytes / 1024)} KB.`);
  if (!text.trim()) throw new ApiError(400, "invalid_body", "The body is empty; send JSON.");
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

/** Wraps a route handler so every thrown error leaves in the one JSON shape. */
export function handle<C>(fn: (req: Request, ctx: C) => Promise<Response>) {
  return async (req: Request, ctx: C): Promise<Response> => {
    try {
      return await fn(req, ctx);
    } catch (error) {
      return toErrorResponse(error);
    }
  };
}
