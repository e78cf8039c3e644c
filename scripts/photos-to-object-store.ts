// `npm run photos:to-object-store`: the one-time move of photos from the server's disk (UPLOAD_DIR, the
// old layout) into the object store (S3_*). Safe to run again: what is already in the store is skipped.
// With no DATABASE_URL it uses npm start's local cluster, and with no S3_ENDPOINT npm start's local
// object store (stop `npm start` first, or point both settings at the running services).
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import pg from "pg";
import { closeDb } from "../server/db";
import { movePhotosToObjectStore } from "../server/photos/move-to-store";
import { startLocalPostgres, type LocalPostgres } from "./local-postgres";
import { ensureLocalObjectStore } from "./local-object-store";

const root = fileURLToPath(new URL("..", import.meta.url));
let localDb: LocalPostgres | undefined;
if (!process.env.DATABASE_URL) {
  const port = Number(process.env.LOCAL_PG_PORT ?? 54329);
  const url = `postgres://postgres@127.0.0.1:${port}/casebook`;
  // Already running (npm start is up): use it and leave it running.
  const probe = new pg.Client(url);
  const running = await probe.connect().then(
    () => probe.end().then(() => true),
    () => false,
  );
  if (!running) localDb = startLocalPostgres({ dataDir: join(root, ".data", "pg"), port, database: "casebook" });
  process.env.DATABASE_URL = url;
}
const objectStore = await ensureLocalObjectStore(root);
try {
  const report = await movePhotosToObjectStore(console.log);
  console.log(
    `${report.moved.length} file(s) moved into the store, ${report.alreadyInStore.length} already there, ` +
      `${report.missing.length} missing from both.`,
  );
} finally {
  await closeDb();
  await objectStore?.close();
  localDb?.stop();
}
