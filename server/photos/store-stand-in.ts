import { mkdirSync } from "node:fs";
import { BucketAlreadyOwnedByYou, CreateBucketCommand, S3Client } from "@aws-sdk/client-s3";
import S3rver from "s3rver";

/** s3rver accepts these fixed keys and checks the signature made with them. */
export const STAND_IN_KEYS = { accessKeyId: "S3RVER", secretAccessKey: "S3RVER" } as const;

export type LocalObjectStore = { endpoint: string; dir: string; close: () => Promise<void> };

/**
 * The local stand-in for an object store: s3rver (the S3 API over plain files) on loopback, a free
 * port, its objects under `dir`. `npm start`, `npm run dev` and the tests start one when S3_ENDPOINT
 * is not set, as they start a mail catcher when SMTP_URL is not.
 */
export async function startLocalObjectStore(opts: {
  dir: string;
  bucket: string;
  port?: number;
}): Promise<LocalObjectStore> {
  mkdirSync(opts.dir, { recursive: true });
  const server = new S3rver({
    address: "127.0.0.1",
    port: opts.port ?? 0,
    directory: opts.dir,
    silent: true,
    configureBuckets: [{ name: opts.bucket, configs: [] }],
  });
  const { port } = await server.run();
  return { endpoint: `http://127.0.0.1:${port}`, dir: opts.dir, close: () => server.close() };
}

/** For tests that give each file a bucket of its own on the one store (any region: buckets are made path-style). */
export async function createBucket(
  endpoint: string,
  bucket: string,
  credentials: { accessKeyId: string; secretAccessKey: string } = STAND_IN_KEYS,
) {
  const s3 = new S3Client({
    endpoint,
    region: "us-east-1",
    forcePathStyle: true,
    credentials,
  });
  try {
    await s3.send(new CreateBucketCommand({ Bucket: bucket }));
  } catch (err) {
    if (!(err instanceof BucketAlreadyOwnedByYou)) throw err;
  } finally {
    s3.destroy();
  }
}
