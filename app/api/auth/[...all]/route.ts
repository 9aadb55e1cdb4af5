import { toNextJsHandler } from "better-auth/next-js";
import { z } from "zod";
import { auth } from "@/db/auth";
import { clientAddress, CLIENT_ADDRESS_HEADER, failedSignIns } from "@/db/auth-guard";
import { customerView, roleIn } from "@/db/members";
import { PersonNameSchema, ShopNameSchema } from "@/model/names";
import { errorResponse, fieldsOf, MAX_BODY_BYTES, noStore } from "../../_lib/respond";

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

// ── What the product checks before the library sees a request ─────────────────────────────────────

const object = (shape: z.ZodRawShape) => z.object(shape, { error: "Send a JSON object." });
/** The product's own rules for the fields the library stores as free text. */
const BODY_RULES: Record<string, z.ZodType> = {
  "/sign-up/email": object({ name: PersonNameSchema }),
  // Of the person's own fields, only the name can be changed here (the units go through /api/v1/me).
  "/update-user": z.strictObject({ name: PersonNameSchema }, { error: "Only the name can be changed here." }),
  "/organization/create": object({ name: ShopNameSchema }),
  "/organization/update": object({ data: object({ name: ShopNameSchema.optional() }) }),
};

/** A customer of a shop sees its name and its staff's names, never the addresses of the staff or of other customers. */
const CUSTOMER_VIEWS = new Set(["/organization/list-members", "/organization/list-invitations", "/organization/get-full-organization"]);

const refuse = (status: number, code: string, message: string, fields?: Record<string, string>) => errorResponse(status, code, message, fields);

function jsonOf(text: string): unknown {
  try {
    return JSON.parse(text) as unknown;
  } catch {
    // A body that is not JSON carries no fields to check; the auth library then answers it as it does any bad body.
    return undefined;
  }
}

async function guarded(req: Request, method: keyof typeof inner): Promise<Response> {
  try {
    const url = new URL(req.url);
    const path = url.pathname.replace(/^\/api\/auth/, "");
    const headers = new Headers(req.headers);
    // The limiter keys on this header, which only the product sets: the client address that the trusted proxies saw.
    headers.delete(CLIENT_ADDRESS_HEADER);
    const address = clientAddress(req.headers);
    if (address) headers.set(CLIENT_ADDRESS_HEADER, address);

    let text: string | undefined;
    if (method === "POST") {
      text = await req.text();
      if (Buffer.byteLength(text) > MAX_BODY_BYTES) return refuse(413, "too_large", `The body is larger than ${Math.round(MAX_BODY_BYTES / 1024)} KB.`);
      const rule = BODY_RULES[path];
      if (rule) {
        const parsed = rule.safeParse(jsonOf(text));
        if (!parsed.success) return refuse(400, "invalid_input", "Some fields are not valid.", fieldsOf(parsed.error));
      }
      if (path === "/change-password") {
        // A new password ends every other session, whatever the client asked.
        const body = jsonOf(text);
        if (body && typeof body === "object" && !Array.isArray(body)) text = JSON.stringify({ ...body, revokeOtherSessions: true });
      }
    }

    const signInEmail = path === "/sign-in/email" ? emailOf(text) : null;
    if (signInEmail && failedSignIns.blocked(signInEmail)) {
      const res = refuse(429, "rate_limited", "Too many failed sign-ins for this account. Wait a quarter of an hour, or reset the password.");
      res.headers.set("retry-after", String(failedSignIns.retryAfterSeconds(signInEmail)));
      return res;
    }

    const request = new Request(url, { method: req.method, headers, body: text, signal: req.signal });
    let session: Awaited<ReturnType<typeof auth.api.getSession>> | undefined;
    const sessionOf = async () => (session ??= await auth.api.getSession({ headers }));

    if (CUSTOMER_VIEWS.has(path)) {
      const who = await sessionOf();
      if (who) {
        const body = text === undefined ? {} : (jsonOf(text) as Record<string, unknown> | undefined) ?? {};
        const shop = url.searchParams.get("organizationId") ?? (typeof body.organizationId === "string" ? body.organizationId : null);
        const slug = url.searchParams.get("organizationSlug");
        const role = await roleIn(who.user.id, { shopId: shop ?? (slug ? null : who.session.activeOrganizationId ?? null), slug });
        if (role === "customer") {
          if (path !== "/organization/get-full-organization") return refuse(403, "forbidden", "A customer of the shop does not see its members or invitations.");
          const view = await customerView(who.user.id, { shopId: shop ?? (slug ? null : who.session.activeOrganizationId ?? null), slug });
          return view ? Response.json(view) : refuse(404, "not_found", "No such shop.");
        }
      }
    }

    let res = await reshape(await inner[method](request));
    if (signInEmail) {
      if (res.status === 401) failedSignIns.record(signInEmail);
      else if (res.status === 200) failedSignIns.clear(signInEmail);
    }
    if (path === "/organization/get-invitation" && res.ok) res = await withoutInviterEmail(res);
    // Signed in but not allowed is a 403; the library answers 401 for both.
    if (res.status === 401 && path.startsWith("/organization/") && (await sessionOf())) {
      const body = (await res.clone().json().catch(() => null)) as { error?: { message?: string } } | null;
      res = withHeaders(refuse(403, "forbidden", body?.error?.message ?? "Your role in this shop does not allow this."), res);
    }
    return res;
  } catch (error) {
    console.error("auth request failed:", error instanceof Error ? error.message : error);
    return errorResponse(500, "internal", "Sign-in is unavailable right now. Nothing was changed.");
  }
}

function emailOf(text: string | undefined): string | null {
  const body = text === undefined ? undefined : jsonOf(text);
  if (!body || typeof body !== "object" || !("email" in body) || typeof body.email !== "string") return null;
  return body.email.trim().toLowerCase() || null;
}

/** The invitee learns the shop and who invited them by name, not the inviter's address. */
async function withoutInviterEmail(res: Response): Promise<Response> {
  const body = (await res.clone().json().catch(() => null)) as Record<string, unknown> | null;
  if (!body || typeof body !== "object") return res;
  delete body.inviterEmail;
  return withHeaders(Response.json(body, { status: res.status }), res);
}

/** A new answer that keeps the cookies and other headers of the library's answer. */
function withHeaders(reshaped: Response, from: Response): Response {
  from.headers.forEach((value, key) => {
    if (key === "content-type" || key === "content-length") return;
    reshaped.headers.append(key, value);
  });
  return reshaped;
}

/** Sign-in answers are private to one person: no cache keeps them. */
async function privately(res: Promise<Response>): Promise<Response> {
  return noStore(await res);
}

export const GET = (req: Request) => privately(guarded(req, "GET"));
export const POST = (req: Request) => privately(guarded(req, "POST"));
