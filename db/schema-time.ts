import { sql } from "drizzle-orm";
import { integer } from "drizzle-orm/sqlite-core";

// Timestamps are stored as Unix milliseconds; the auth adapter reads and writes them as Dates.

/** When the row was made. */
export const createdAt = () =>
  integer("created_at", { mode: "timestamp_ms" })
    .notNull()
    .default(sql`(cast(unixepoch('subsecond') * 1000 as integer))`);
/** When the row was last changed. */
export const updatedAt = () =>
  integer("updated_at", { mode: "timestamp_ms" })
    .notNull()
    .default(sql`(cast(unixepoch('subsecond') * 1000 as integer))`);
