import { integer, text } from "drizzle-orm/sqlite-core";
import { organization, user } from "./schema-auth";

// Columns every library row carries: its shop, who made it, its version and when it was archived.

/** The shop the row belongs to. */
export const shopRef = () =>
  text("organization_id")
    .notNull()
    .references(() => organization.id, { onDelete: "cascade" });
/** Who made the row. */
export const createdByRef = () =>
  text("created_by")
    .notNull()
    .references(() => user.id);
/** The version each update must name (a stale one is refused). */
export const version = () => integer("version").notNull().default(1);
/** When the row was archived, or null. */
export const archivedAt = () => integer("archived_at", { mode: "timestamp_ms" });
