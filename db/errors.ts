import "server-only";

export type DataErrorCode = "invalid_input" | "conflict" | "in_use" | "study_incomplete" | "geometry";

const STATUS: Record<DataErrorCode, number> = { invalid_input: 400, conflict: 409, in_use: 409, study_incomplete: 422, geometry: 422 };

/** A refusal of the data layer that the caller can act on: bad references, a stale version, a row still in use. */
export class DataError extends Error {
  readonly status: number;
  constructor(
    readonly code: DataErrorCode,
    message: string,
    readonly fields?: Record<string, string>,
  ) {
    super(message);
    this.name = "DataError";
    this.status = STATUS[code];
  }
}

/** The message of a stale-version refusal. */
export const CONFLICT_MESSAGE =
  "Someone else changed this since you opened it. Reload to see their change; your edits are kept.";

export function conflict(): DataError {
  return new DataError("conflict", CONFLICT_MESSAGE);
}
