import "server-only";
import { and, asc, desc, eq, inArray } from "drizzle-orm";
import { AccessError, type Caller } from "./access";
import { getDb } from "./client";
import * as schema from "./schema";

function ownerOnly(caller: Caller) {
  if (caller.role !== "owner") throw new AccessError("forbidden", "Only the shop's owner manages its members.");
}

/** The shop's members with their roles (owner only). */
export async function listMembers(caller: Caller) {
  ownerOnly(caller);
  const db = await getDb();
  return db
    .select({ id: schema.member.id, role: schema.member.role, joinedAt: schema.member.createdAt, name: schema.user.name, email: schema.user.email, userId: schema.user.id })
    .from(schema.member)
    .innerJoin(schema.user, eq(schema.member.userId, schema.user.id))
    .where(eq(schema.member.organizationId, caller.shopId))
    .orderBy(asc(schema.member.createdAt));
}

/** The shop's pending invitations (owner only). */
export async function listPendingInvitations(caller: Caller) {
  ownerOnly(caller);
  const db = await getDb();
  return db
    .select({ id: schema.invitation.id, email: schema.invitation.email, role: schema.invitation.role, expiresAt: schema.invitation.expiresAt })
    .from(schema.invitation)
    .where(and(eq(schema.invitation.organizationId, caller.shopId), eq(schema.invitation.status, "pending")))
    .orderBy(desc(schema.invitation.createdAt));
}

/** Sets the caller's preferred length units. */
export async function setUnits(caller: { userId: string }, units: "mm" | "in") {
  const db = await getDb();
  await db.update(schema.user).set({ units, updatedAt: new Date() }).where(eq(schema.user.id, caller.userId));
}

type ShopRef = { shopId: string | null; slug: string | null };

async function shopIdOf(ref: ShopRef): Promise<string | null> {
  if (ref.shopId) return ref.shopId;
  if (!ref.slug) return null;
  const db = await getDb();
  const [row] = await db.select({ id: schema.organization.id }).from(schema.organization).where(eq(schema.organization.slug, ref.slug)).limit(1);
  return row?.id ?? null;
}

/** The person's role in a shop (by id or slug), or null when they are not a member of it. */
export async function roleIn(userId: string, ref: ShopRef): Promise<string | null> {
  const shopId = await shopIdOf(ref);
  if (!shopId) return null;
  const db = await getDb();
  const [row] = await db
    .select({ role: schema.member.role })
    .from(schema.member)
    .where(and(eq(schema.member.organizationId, shopId), eq(schema.member.userId, userId)))
    .limit(1);
  return row?.role ?? null;
}

/** What a customer may see of a shop: its name and its staff's names and roles; no addresses, no other customers. */
export async function customerView(userId: string, ref: ShopRef) {
  const shopId = await shopIdOf(ref);
  if (!shopId || (await roleIn(userId, { shopId, slug: null })) === null) return null;
  const db = await getDb();
  const [shop] = await db
    .select({ id: schema.organization.id, name: schema.organization.name, slug: schema.organization.slug })
    .from(schema.organization)
    .where(eq(schema.organization.id, shopId))
    .limit(1);
  if (!shop) return null;
  const staff = await db
    .select({ role: schema.member.role, name: schema.user.name })
    .from(schema.member)
    .innerJoin(schema.user, eq(schema.member.userId, schema.user.id))
    .where(and(eq(schema.member.organizationId, shopId), inArray(schema.member.role, ["owner", "builder"])))
    .orderBy(asc(schema.member.createdAt));
  return { ...shop, members: staff.map((s) => ({ role: s.role, user: { name: s.name } })), invitations: [] };
}
