// The database's tables, by concern: sign-in and shops (schema-auth.ts), the library and its studies
// (schema-library.ts), case photos (schema-photos.ts); jobs live in schema-jobs.ts. drizzle.config.ts reads the
// tables through this file, so a new schema file is added to the list below.

export * from "./schema-auth";
export * from "./schema-library";
export * from "./schema-photos";
