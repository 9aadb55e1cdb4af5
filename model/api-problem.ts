// An answer of the API in its one error shape `{ error: { code, message, fields? } }`, as an error: thrown
// by the route handlers (ApiError) and by the browser's client when the API refuses a call (ApiFailure).

export class ApiProblem extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string>,
  ) {
    super(message);
    this.name = "ApiProblem";
  }
}
