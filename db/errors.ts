import "server-only";

const STATUS = {
  invalid_input: 400,
  conflict: 409,
  in_use: 409,
  study_incomplete: 422,
  geometry: 422,
  // Jobs: a move or change the job's state does not allow, or that needs a recorded reason.
  reason_required: 400,
  move_refused: 409,
  wrong_status: 409,
  plan_fixed: 409,
  quote_fixed: 409,
  quote_changed: 409,
  quote_stale: 409,
  no_plan: 409,
  no_cut: 422,
  paid: 409,
  customer_is_staff: 409,
  // Deposits.
  already_paid: 409,
  not_approved: 409,
  no_deposit: 409,
  // Photos.
  not_uploaded: 409,
  photo_refused: 422,
  // A service the product relies on (mail, payments, object store) refused or is not set up.
  mail_failed: 502,
  payments_failed: 502,
  payments_unavailable: 503,
  storage_unavailable: 503,
} as const satisfies Record<string, number>;

export type DataErrorCode = keyof typeof STATUS;

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
