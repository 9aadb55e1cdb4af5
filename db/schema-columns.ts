import { sql } from "drizzle-orm";
import { integer, text, type AnySQLiteColumn } from "drizzle-orm/sqlite-core";

// Column builders every schema file uses; this file names no table, so each schema file may import it.
// Timestamps are stored as Unix milliseconds; the auth adapter reads and writes them as Dates.

/** A moment in the column named `column`, null until set (add `.notNull()` for one every row has). */
export const timestamp = (column: string) => integer(column, { mode: "timestamp_ms" });
/** The database's clock at the insert, in Unix milliseconds. */
const now = sql`(cast(unixepoch('subsecond') * 1000 as integer))`;
/** When the row was made. */
export const createdAt = () => timestamp("created_at").notNull().default(now);
/** When the row was last changed. */
export const updatedAt = () => timestamp("updated_at").notNull().default(now);

/** The row this one is part of, by id in the column named `column`: removing that row removes this one. */
export const partOf = (column: string, parentId: () => AnySQLiteColumn) =>
  text(column).notNull().references(parentId, { onDelete: "cascade" });
