// `npm start`: the whole product on one machine. Starts (and first initialises) a PostgreSQL
// cluster under .data/ unless DATABASE_URL is set, applies migrations, seeds the demo shop into
// an empty database, starts a local mail catcher unless SMTP_URL is set and a local object store
// for photos unless S3_ENDPOINT is set, builds the web app when
// stale, and serves API and app from one process.
import { fileURLToPath } from "node:url";
import { join } from "node:path";
import { applyMigrations } from "../db/migrate";
import { closeDb, db } from "../server/db";
import { env } from "../server/env";
import { listen } from "../server/index";
import { DEMO_PEOPLE } from "../server/seed/demo-people";
import { seedDemoShop } from "../server/seed/seed";
import { startLocalPostgres, type LocalPostgres } from "./local-postgres";
import { ensureLocalMail } from "./local-mail";
import { ensureLocalObjectStore } from "./local-object-store";
import { ensureWebBuild } from "./web-build";

const root = fileURLToPath(new URL("..", import.meta.url));
let localDb: LocalPostgres | undefined;

try {
  if (!process.env.DATABASE_URL) {
    const port = Number(process.env.LOCAL_PG_PORT ?? 54329);
    localDb = startLocalPostgres({ dataDir: join(root, ".data", "pg"), port, database: "casebook" });
    process.env.DATABASE_URL = localDb.url;
    console.log(`PostgreSQL is running on 127.0.0.1:${port} (data in ${localDb.dataDir}).`);
  }
} catch (err) {
  console.error((err as Error).message);
  process.exit(1);
}

const mailCatcher = await ensureLocalMail(root);
const objectStore = await ensureLocalObjectStore(root);
await applyMigrations(db);
const seeded = await seedDemoShop();
const webDir = ensureWebBuild(root);
const server = await listen({ port: env.PORT, host: env.HOST, webDir });

console.log(`\nShakeout Casebook is running at ${env.PUBLIC_URL}`);
if (seeded) console.log("The demo shop was added to the empty database.");
if (env.NODE_ENV !== "production") {
  console.log("Demo accounts (local only):");
  for (const p of DEMO_PEOPLE) console.log(`  ${p.role.padEnd(7)} ${p.email}  ${p.password}`);
}
console.log("Press Ctrl-C to stop.");

let stopping = false;
async function stop() {
  if (stopping) return;
  stopping = true;
  console.log("\nStopping...");
  server.closeAllConnections?.();
  await new Promise((r) => server.close(r));
  await mailCatcher?.close();
  await objectStore?.close();
  await closeDb();
  localDb?.stop();
  process.exit(0);
}
process.on("SIGINT", stop);
process.on("SIGTERM", stop);
