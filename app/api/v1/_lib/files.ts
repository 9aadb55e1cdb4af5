/** A Content-Disposition header for a download: a plain fallback name and the exact one (RFC 6266, RFC 5987). */
export function attachmentName(filename: string): string {
  const plain = filename.replace(/[^A-Za-z0-9._ -]+/g, "_").replace(/\s+/g, " ").trim() || "download";
  return `attachment; filename="${plain.replace(/"/g, "")}"; filename*=UTF-8''${encodeURIComponent(filename)}`;
}
