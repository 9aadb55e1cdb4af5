// A local S3-compatible object store (s3rver) for development, the demo and the tests: one bucket for
// job photos, reachable from the browser for presigned uploads and downloads (CORS open to any origin on
// loopback). Listens on 127.0.0.1; files live in a folder of the caller's choice.
import { mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import S3rver from "s3rver";

const CORS = `<CORSConfiguration>
  <CORSRule>
    <AllowedOrigin>*</AllowedOrigin>
    <AllowedMethod>GET</AllowedMethod>
    <AllowedMethod>PUT</AllowedMethod>
    <AllowedMethod>HEAD</AllowedMethod>
    <AllowedHeader>*</AllowedHeader>
    <ExposeHeader>ETag</ExposeHeader>
    <MaxAgeSeconds>3000</MaxAgeSeconds>
  </CORSRule>
</CORSConfiguration>`;

/** The credentials s3rver accepts (it checks signatures made with them). */
export const OBJECT_STORE_CREDENTIALS = { accessKeyId: "S3RVER", secretAccessKey: "S3RVER" };

/** Starts the store; resolves with its endpoint, bucket, credentials and a stop function. Port 0 picks a free port. */
export async function startObjectStore({ host = "127.0.0.1", port = 4569, bucket = "borewright-photos", directory, quiet = true } = {}) {
  const dir = directory ?? mkdtempSync(join(tmpdir(), "borewright-objects-"));
  const server = new S3rver({
    address: host,
    port,
    silent: quiet,
    directory: dir,
    // Path-style addressing only: the app's client sets forcePathStyle.
    vhostBuckets: false,
    configureBuckets: [{ name: bucket, configs: [CORS] }],
  });
  const info = await server.run();
  const endpoint = `http://${host}:${info.port}`;
  return {
    endpoint,
    port: info.port,
    bucket,
    region: "us-east-1",
    directory: dir,
    ...OBJECT_STORE_CREDENTIALS,
    /** The environment the app reads (db/storage.ts). */
    env: {
      S3_ENDPOINT: endpoint,
      S3_BUCKET: bucket,
      S3_REGION: "us-east-1",
      S3_ACCESS_KEY_ID: OBJECT_STORE_CREDENTIALS.accessKeyId,
      S3_SECRET_ACCESS_KEY: OBJECT_STORE_CREDENTIALS.secretAccessKey,
    },
    stop: () => server.close(),
  };
}

if (process.argv[1] === fileURLToPath(import.meta.url)) {
  const store = await startObjectStore({
    port: Number(process.env.OBJECT_STORE_PORT ?? 4569),
    bucket: process.env.S3_BUCKET ?? "borewright-photos",
    directory: process.env.OBJECT_STORE_DIR,
    quiet: false,
  });
  console.log(`object store: ${store.endpoint}, bucket ${store.bucket}, files in ${store.directory}`);
}
