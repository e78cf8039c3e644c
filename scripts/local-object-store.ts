import { join, resolve } from "node:path";
import { STAND_IN_KEYS } from "../server/photos/stand-in-keys";
import type { LocalObjectStore } from "../server/photos/store-stand-in";

/**
 * When no S3_ENDPOINT is configured, starts the local object store (s3rver on 127.0.0.1, a free port)
 * with its data under UPLOAD_DIR/object-store (default uploads/object-store), its bucket made, and
 * points the S3_* settings at it.
 */
export async function ensureLocalObjectStore(root: string): Promise<LocalObjectStore | undefined> {
  if (process.env.S3_ENDPOINT) return undefined;
  // Loaded only when needed: a server with a real store never loads s3rver.
  const { startLocalObjectStore } = await import("../server/photos/store-stand-in");
  const dir = join(resolve(root, process.env.UPLOAD_DIR ?? "uploads"), "object-store");
  const bucket = (process.env.S3_BUCKET ??= "casebook-photos");
  const store = await startLocalObjectStore({ dir, bucket });
  Object.assign(process.env, {
    S3_ENDPOINT: store.endpoint,
    S3_ACCESS_KEY_ID: STAND_IN_KEYS.accessKeyId,
    S3_SECRET_ACCESS_KEY: STAND_IN_KEYS.secretAccessKey,
  });
  console.log(`Object store stand-in is listening on ${store.endpoint} (photos in ${store.dir}).`);
  return store;
}
