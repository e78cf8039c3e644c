// For one-off commands on npm start's data (photos:sweep, photos:to-object-store): with no DATABASE_URL
// they use npm start's local cluster, and with no S3_ENDPOINT its local object store (stop `npm start`
// first, or point both settings at the running services). Whatever this starts, it stops afterwards.
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import pg from "pg";
import { closeDb } from "../server/db";
import { startLocalPostgres, type LocalPostgres } from "./local-postgres";
import { ensureLocalObjectStore } from "./local-object-store";

const root = fileURLToPath(new URL("..", import.meta.url));

export async function withLocalServices(work: () => Promise<void>): Promise<void> {
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
    await work();
  } finally {
    await closeDb();
    await objectStore?.close();
    localDb?.stop();
  }
}
