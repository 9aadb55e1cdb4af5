import "server-only";
import { asc, eq } from "drizzle-orm";
import { headers } from "next/headers";
import { sessionAndShopOf, sessionOf } from "./auth";
import { getDb } from "./client";
import { isRole, type Role } from "./roles";
import * as schema from "./schema";

export type AccessCode = "unauthenticated" | "forbidden" | "not_found";

/** Refused access: unauthenticated (401), forbidden (403) or not found (404, also for another shop's rows). */
export class AccessError extends Error {
  constructor(
    readonly code: AccessCode,
    message: string,
  ) {
    super(message);
    this.name = "AccessError";
  }
}

/** Who is calling, in which shop, with which role — read from the database, never from the client. */
export type Caller = {
  userId: string;
  name: string;
  email: string;
  emailVerified: boolean;
  units: "mm" | "in";
  shopId: string;
  shopName: string;
  role: Role;
};

/** The signed-in person without a shop check, or null. */
export async function getSessionUser() {
  const session = await sessionOf(await headers());
  return session ?? null;
}

/** The caller in their active shop (else their first), or null when signed out or in no shop. */
export async function getCaller(): Promise<Caller | null> {
  const found = await sessionAndShopOf(await headers());
  if (!found) return null;
  const { session, membership } = found;
  if (!membership || !isRole(membership.role)) return null;
  const units = (session.user as { units?: string }).units === "in" ? "in" : "mm";
  return {
    userId: session.user.id,
    name: session.user.name,
    email: session.user.email,
    emailVerified: session.user.emailVerified,
    units,
    shopId: membership.shopId,
    shopName: membership.shopName,
    role: membership.role,
  };
}

/** The caller, or an AccessError: 401 when signed out, 403 when the role is not among those allowed. */
export async function requireCaller(allowed?: readonly Role[]): Promise<Caller> {
  const caller = await getCaller();
  if (!caller) throw new AccessError("unauthenticated", "Sign in to continue.");
  if (allowed && !allowed.includes(caller.role)) {
    throw new AccessError("forbidden", "Your role in this shop does not allow this.");
  }
  return caller;
}

/** The shops a person belongs to, with their role in each. */
export async function listMyShops(userId: string) {
  const db = await getDb();
  return db
    .select({ id: schema.organization.id, name: schema.organization.name, role: schema.member.role })
    .from(schema.member)
    .innerJoin(schema.organization, eq(schema.member.organizationId, schema.organization.id))
    .where(eq(schema.member.userId, userId))
    .orderBy(asc(schema.organization.name));
}
