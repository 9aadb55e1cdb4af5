import { uploadPhoto } from "../query/photo-upload";

/** Keeps a deck photo with its case profile: a presigned upload straight to storage, then the server checks it. */
export async function storeCasePhoto(caseId: string, file: File, contentType: string, widthPx: number, heightPx: number): Promise<{ ok: true; id: string } | { ok: false; message: string }> {
  return uploadPhoto(`/api/v1/cases/${caseId}/photos`, file, { contentType, sizeBytes: file.size, widthPx, heightPx });
}
