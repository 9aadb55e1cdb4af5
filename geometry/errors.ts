/** Machine-readable codes for errors raised by the geometry core. */
export type GeometryErrorCode = "invalid-study" | "degenerate-geometry" | "invalid-thread" | "invalid-argument";

/** Base class of every error the core throws: an Error with a code. */
export class GeometryError extends Error {
  readonly code: GeometryErrorCode;
  constructor(code: GeometryErrorCode, message: string, options?: { cause?: unknown }) {
    super(message, options);
    this.name = "GeometryError";
    this.code = code;
  }
}

/** One bad field of a study: its path (e.g. "kits.0.boreMm") and the reason in words. */
export interface FieldIssue {
  readonly path: string;
  readonly message: string;
}

/** A study that failed validation; carries every bad field by path. */
export class StudyValidationError extends GeometryError {
  readonly issues: readonly FieldIssue[];
  constructor(issues: readonly FieldIssue[]) {
    super("invalid-study", `Invalid study: ${issues.map((i) => `${i.path || "(root)"}: ${i.message}`).join("; ")}`);
    this.name = "StudyValidationError";
    this.issues = issues;
  }
}

/** A thread designation the core cannot read (not an ISO metric "M<d>" or "M<d>x<pitch>"). */
export class ThreadDesignationError extends GeometryError {
  constructor(designation: string) {
    super("invalid-thread", `Not an ISO metric thread designation: "${designation}" (expected e.g. M8 or M8x1.25)`);
    this.name = "ThreadDesignationError";
  }
}

/** Geometry that has no meaningful answer (e.g. a plane through collinear points). */
export class DegenerateGeometryError extends GeometryError {
  constructor(message: string) {
    super("degenerate-geometry", message);
    this.name = "DegenerateGeometryError";
  }
}
