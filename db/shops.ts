import "server-only";
import { randomUUID } from "node:crypto";
import type { Db } from "./client";
import * as schema from "./schema";

/** A URL-safe slug from a shop name, made unique with a short random tail. */
export function shopSlug(name: string): string {
  const base = name.toLowerCase().normalize("NFKD").replace(/[^a-z0-9]+/g, "-").replace(/^-+|-+$/g, "").slice(0, 40) || "shop";
  return `${base}-${randomUUID().slice(0, 6)}`;
}

/** Creates a shop with its settings and the given person as owner, all in one transaction. */
export async function createShopFor(db: Db, owner: { id: string; name: string }, name?: string): Promise<string> {
  const shopName = name?.trim() || `${owner.name.trim() || "My"}'s shop`;
  const shopId = randomUUID();
  await db.transaction(async (tx) => {
    await tx.insert(schema.organization).values({ id: shopId, name: shopName, slug: shopSlug(shopName), createdAt: new Date() });
    await tx.insert(schema.member).values({ id: randomUUID(), organizationId: shopId, userId: owner.id, role: "owner", createdAt: new Date() });
    await tx.insert(schema.shopSettings).values({ organizationId: shopId });
  });
  return shopId;
}
