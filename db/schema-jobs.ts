// Tables for jobs, their readings, photos and payments. Kept apart from schema.ts so the two can grow side by side.
export {};
