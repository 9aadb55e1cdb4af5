import "server-only";
import { and, asc, desc, eq } from "drizzle-orm";
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
