// `npm run photos:sweep`: removes from the photo store every object no photo row names and older than
// ORPHAN_PHOTO_GRACE_MINUTES (server/photos/orphan-sweep.ts); every server also does this when it starts.
// With no DATABASE_URL it uses npm start's local cluster, and with no S3_ENDPOINT npm start's local
// object store (stop `npm start` first, or point both settings at the running services).
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import pg from "pg";
import { closeDb } from "../server/db";
import { sweepOrphanPhotos } from "../server/photos/orphan-sweep";
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
  await sweepOrphanPhotos();
} finally {
  await closeDb();
  await objectStore?.close();
  localDb?.stop();
}
