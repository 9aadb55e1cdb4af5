import { callApi } from "../api-client";

/** How an upload ended: the photo's id once the server kept it, or at which step it stopped and why, in words. */
export type PhotoUpload = { ok: true; id: string } | { ok: false; step: "request" | "store" | "check"; message: string };

/**
 * Uploads a photo to one of the API's photo collections (a job's or a case profile's): asks for a presigned
 * address, PUTs the file straight to storage, then has the server check the stored bytes.
 */
export async function uploadPhoto(collectionUrl: string, file: File, request: Record<string, unknown>): Promise<PhotoUpload> {
  const start = await callApi<{ id: string; uploadUrl: string; headers: Record<string, string> }>(collectionUrl, { body: request });
  if (!start.ok) {
    const fields = start.error.fields ?? {};
    return { ok: false, step: "request", message: fields.contentType ?? fields.sizeBytes ?? Object.values(fields)[0] ?? start.error.message };
  }
  let put: Response;
  try {
    put = await fetch(start.data.uploadUrl, { method: "PUT", headers: start.data.headers, body: file });
  } catch {
    // fetch rejects only when the store cannot be reached at all: the photo row stays pending and is never shown.
    return { ok: false, step: "store", message: "The photo store could not be reached." };
  }
  if (!put.ok) return { ok: false, step: "store", message: `The photo store refused the upload (${put.status}).` };
  const done = await callApi(`${collectionUrl}/${start.data.id}/complete`, { body: {} });
  if (!done.ok) return { ok: false, step: "check", message: done.error.message };
  return { ok: true, id: start.data.id };
}
