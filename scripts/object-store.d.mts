export const OBJECT_STORE_CREDENTIALS: { accessKeyId: string; secretAccessKey: string };
export function startObjectStore(opts?: { host?: string; port?: number; bucket?: string; directory?: string; quiet?: boolean }): Promise<{
  endpoint: string;
  port: number;
  bucket: string;
  region: string;
  directory: string;
  accessKeyId: string;
  secretAccessKey: string;
  env: Record<"S3_ENDPOINT" | "S3_BUCKET" | "S3_REGION" | "S3_ACCESS_KEY_ID" | "S3_SECRET_ACCESS_KEY", string>;
  stop: () => Promise<unknown>;
}>;
