import { toNextJsHandler } from "better-auth/next-js";
import { auth } from "@/db/auth";
import { errorResponse } from "../../_lib/respond";

const inner = toNextJsHandler(auth);

const FIELD_OF_CODE: Record<string, string> = {
  USER_ALREADY_EXISTS: "email",
  USER_ALREADY_EXISTS_USE_ANOTHER_EMAIL: "email",
  INVALID_EMAIL: "email",
  PASSWORD_TOO_SHORT: "password",
  PASSWORD_TOO_LONG: "password",
  INVALID_EMAIL_OR_PASSWORD: "password",
};

const MESSAGE_OF_CODE: Record<string, string> = {
  USER_ALREADY_EXISTS: "An account with this e-mail already exists. Sign in, or reset the password.",
  USER_ALREADY_EXISTS_USE_ANOTHER_EMAIL: "An account with this e-mail already exists. Sign in, or reset the password.",
  INVALID_EMAIL_OR_PASSWORD: "That e-mail and password do not match an account.",
  PASSWORD_TOO_SHORT: "Use at least 10 characters.",
  PASSWORD_TOO_LONG: "Use at most 128 characters.",
  INVALID_TOKEN: "This link has expired or was already used.",
};

/** Rewrites the auth library's error answers into the product's one JSON error shape. */
async function reshape(res: Response): Promise<Response> {
  if (res.status < 400 || !(res.headers.get("content-type") ?? "").includes("application/json")) return res;
  const body = (await res.clone().json().catch(() => null)) as { code?: string; message?: string } | null;
  const code = body?.code ?? (res.status === 429 ? "RATE_LIMITED" : `HTTP_${res.status}`);
  let message =
    MESSAGE_OF_CODE[code] ?? (res.status === 429 ? "Too many attempts. Wait a few seconds and try again." : body?.message ?? res.statusText);
  // Validation answers name the field as "[body.email] reason".
  const named = body?.message?.match(/^\[body\.(\w+)\]\s*(.*)$/);
  const field = named?.[1] ?? FIELD_OF_CODE[code];
  if (named) message = "Some fields are not valid.";
  const fieldMessage = named ? `${named[1] === "email" ? "That does not look like an e-mail address." : named[2]}` : message;
  const reshaped = errorResponse(res.status, code.toLowerCase(), message, field ? { [field]: fieldMessage } : undefined);
  res.headers.forEach((value, key) => {
    if (key === "content-type" || key === "content-length") return;
    reshaped.headers.append(key, value);
  });
  return reshaped;
}

async function guarded(req: Request, method: keyof typeof inner): Promise<Response> {
  try {
    return await reshape(await inner[method](req));
  } catch (error) {
    console.error("auth request failed:", error instanceof Error ? error.message : error);
    return errorResponse(500, "internal", "Sign-in is unavailable right now. Nothing was changed.");
  }
}

export const GET = (req: Request) => guarded(req, "GET");
export const POST = (req: Request) => guarded(req, "POST");
