import { mkdirSync } from "node:fs";
import S3rver from "s3rver";

export { STAND_IN_KEYS } from "./stand-in-keys";

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
