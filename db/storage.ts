import "server-only";
import { DeleteObjectCommand, GetObjectCommand, HeadObjectCommand, PutObjectCommand, S3Client } from "@aws-sdk/client-s3";
import { getSignedUrl } from "@aws-sdk/s3-request-presigner";

// Object storage for job photos, through the S3 SDK. The browser uploads and downloads with presigned
// URLs, so the app server never streams a file; the server only reads the first bytes to check the type.
// Settings from the environment: S3_ENDPOINT (a local fake or a compatible service; empty for AWS itself),
// S3_BUCKET, S3_REGION, S3_ACCESS_KEY_ID, S3_SECRET_ACCESS_KEY.

export class StorageNotConfigured extends Error {
  constructor() {
    super("Photo storage is not set up on this server (S3_BUCKET is missing).");
    this.name = "StorageNotConfigured";
  }
}

let client: S3Client | undefined;

function settings() {
  const bucket = process.env.S3_BUCKET;
  if (!bucket) throw new StorageNotConfigured();
  return { bucket, endpoint: process.env.S3_ENDPOINT || undefined, region: process.env.S3_REGION || "us-east-1" };
}

/** The one S3 client of this process. Path-style addressing whenever an endpoint is given (the local fake needs it). */
export function storage(): { s3: S3Client; bucket: string } {
  const { bucket, endpoint, region } = settings();
  client ??= new S3Client({
    region,
    endpoint,
    forcePathStyle: Boolean(endpoint),
    credentials:
      process.env.S3_ACCESS_KEY_ID && process.env.S3_SECRET_ACCESS_KEY
        ? { accessKeyId: process.env.S3_ACCESS_KEY_ID, secretAccessKey: process.env.S3_SECRET_ACCESS_KEY }
        : undefined,
  });
  return { s3: client, bucket };
}

export function storageConfigured(): boolean {
  return Boolean(process.env.S3_BUCKET);
}

/** A URL the browser PUTs the file to, valid for a few minutes, bound to the declared type and size. */
export async function presignUpload(key: string, contentType: string, sizeBytes: number, expiresIn = 300): Promise<string> {
  const { s3, bucket } = storage();
  return getSignedUrl(s3, new PutObjectCommand({ Bucket: bucket, Key: key, ContentType: contentType, ContentLength: sizeBytes }), { expiresIn });
}

/** A URL the browser GETs the file from, valid for a few minutes. */
export async function presignDownload(key: string, expiresIn = 600): Promise<string> {
  const { s3, bucket } = storage();
  return getSignedUrl(s3, new GetObjectCommand({ Bucket: bucket, Key: key }), { expiresIn });
}

/** The stored object's size and first bytes, or null when nothing was uploaded under the key. */
export async function inspectObject(key: string, firstBytes = 16): Promise<{ sizeBytes: number; head: Uint8Array } | null> {
  const { s3, bucket } = storage();
  try {
    const head = await s3.send(new HeadObjectCommand({ Bucket: bucket, Key: key }));
    const size = head.ContentLength ?? 0;
    if (size === 0) return { sizeBytes: 0, head: new Uint8Array() };
    const got = await s3.send(new GetObjectCommand({ Bucket: bucket, Key: key, Range: `bytes=0-${firstBytes - 1}` }));
    const bytes = got.Body ? await got.Body.transformToByteArray() : new Uint8Array();
    return { sizeBytes: size, head: bytes.slice(0, firstBytes) };
  } catch (error) {
    const status = (error as { $metadata?: { httpStatusCode?: number } }).$metadata?.httpStatusCode;
    if (status === 404 || (error as { name?: string }).name === "NotFound" || (error as { name?: string }).name === "NoSuchKey") return null;
    throw error;
  }
}

export async function deleteObject(key: string): Promise<void> {
  const { s3, bucket } = storage();
  await s3.send(new DeleteObjectCommand({ Bucket: bucket, Key: key }));
}
