import { ApiProblem } from "@/model/api-problem";
import { callApi } from "../api-client";

/** A refused or failed API call, in the product's one error shape. */
export class ApiFailure extends ApiProblem {
  override name = "ApiFailure";
}

/** Reads JSON from the API; throws ApiFailure for any answer that is not 2xx. */
export async function getJson<T>(url: string): Promise<T> {
  return sendJson<T>("GET", url);
}

/** Sends JSON to the API; throws ApiFailure for any answer that is not 2xx. */
export async function sendJson<T>(method: string, url: string, body?: unknown): Promise<T> {
  const r = await callApi<T>(url, { method, body });
  if (!r.ok) throw new ApiFailure(r.status, r.error.code, r.error.message, r.error.fields);
  return r.data;
}

/** Query string from a record, leaving out empty values. */
export function queryString(params: Record<string, string | number | boolean | undefined | null>): string {
  const search = new URLSearchParams();
  for (const [k, v] of Object.entries(params)) {
    if (v === undefined || v === null || v === "") continue;
    search.set(k, typeof v === "boolean" ? (v ? "1" : "0") : String(v));
  }
  const s = search.toString();
  return s ? `?${s}` : "";
}

/** The words to show for an error from a query or mutation. */
export function errorText(error: unknown): string {
  if (error instanceof ApiFailure) return error.message;
  if (error instanceof Error) return error.message;
  return "Something went wrong; nothing was lost. Try again.";
}
