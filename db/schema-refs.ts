import { integer, text } from "drizzle-orm/sqlite-core";
import { shopRef, user } from "./schema-auth";
import { createdAt, timestamp, updatedAt } from "./schema-columns";

// Columns every library row carries: its shop, who made it, its version and when it was archived.

/** The shop the row belongs to. */
export { shopRef };
/** The person who did something, by id (their name is kept beside it, so a history outlives the account's renaming). */
export const personRef = (column: string) =>
  text(column)
    .notNull()
    .references(() => user.id);
/** Who made the row. */
export const createdByRef = () => personRef("created_by");
/** The version each update must name (a stale one is refused). */
export const version = () => integer("version").notNull().default(1);
/** When the row was archived, or null. */
export const archivedAt = () => timestamp("archived_at");
/** Who did it, by id and by name, and when: the columns of a history's entry. */
export const byWhomAndWhen = () => ({
  at: timestamp("at").notNull(),
  byId: personRef("by_id"),
  byName: text("by_name").notNull(),
});

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
