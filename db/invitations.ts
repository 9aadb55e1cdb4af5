import "server-only";
import { eq } from "drizzle-orm";
import { getDb } from "./client";
import * as schema from "./schema";

/** An invitation with its shop's name, for the accept page (which anyone holding the link may open). */
export async function findInvitation(id: string) {
  const db = await getDb();
  const rows = await db
    .select({
      id: schema.invitation.id,
      email: schema.invitation.email,
      role: schema.invitation.role,
      status: schema.invitation.status,
      expiresAt: schema.invitation.expiresAt,
      shopName: schema.organization.name,
    })
    .from(schema.invitation)
    .innerJoin(schema.organization, eq(schema.invitation.organizationId, schema.organization.id))
    .where(eq(schema.invitation.id, id))
    .limit(1);
  return rows[0] ?? null;
}
