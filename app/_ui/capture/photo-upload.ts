import { callApi } from "../api-client";

/** Keeps a deck photo with its case profile: a presigned upload straight to storage, then the server checks it. */
export async function storeCasePhoto(caseId: string, file: File, contentType: string, widthPx: number, heightPx: number): Promise<{ ok: true; id: string } | { ok: false; message: string }> {
  const start = await callApi<{ id: string; uploadUrl: string; headers: Record<string, string> }>(`/api/v1/cases/${caseId}/photos`, {
    body: { contentType, sizeBytes: file.size, widthPx, heightPx },
  });
  if (!start.ok) return { ok: false, message: start.error.fields?.contentType ?? start.error.fields?.sizeBytes ?? start.error.message };
  let put: Response;
  try {
    put = await fetch(start.data.uploadUrl, { method: "PUT", headers: start.data.headers, body: file });
  } catch {
    return { ok: false, message: "The photo store could not be reached." };
  }
  if (!put.ok) return { ok: false, message: `The photo store refused the upload (${put.status}).` };
  const done = await callApi(`/api/v1/cases/${caseId}/photos/${start.data.id}/complete`, { body: {} });
  if (!done.ok) return { ok: false, message: done.error.message };
  return { ok: true, id: start.data.id };
}
