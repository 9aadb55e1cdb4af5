import { integer, text } from "drizzle-orm/sqlite-core";
import { organization, user } from "./schema-auth";
import { createdAt, updatedAt } from "./schema-time";

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
/** The person who did something, by id (their name is kept beside it, so a history outlives the account's renaming). */
export const personRef = (column: string) =>
  text(column)
    .notNull()
    .references(() => user.id);

/** The columns a library row opens with: its id, its shop, its name and its notes. */
export const namedShopRow = () => ({
  id: text("id").primaryKey(),
  organizationId: shopRef(),
  name: text("name").notNull(),
  notes: text("notes").notNull().default(""),
});

/** The columns a library row closes with: its version, when it was made and last changed, who made it, when it was archived. */
export const rowStamps = () => ({
  version: version(),
  createdAt: createdAt(),
  updatedAt: updatedAt(),
  createdBy: createdByRef(),
  archivedAt: archivedAt(),
});
