// `npm run dev`: the local database (as npm start), then the app and the API on ONE origin,
// http://127.0.0.1:PORT (default 8080): server/dev-server.ts answers /api (reloaded by tsx watch)
// and passes everything else to the Expo dev server on METRO_PORT (default 8081). One origin means
// the session cookie set at sign-in comes back on every call. Ctrl-C stops every child, then the database.
import { spawn, type ChildProcess } from "node:child_process";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { applyMigrations } from "../db/migrate";
import { closeDb, db } from "../server/db";
import { seedDemoShop } from "../server/seed/seed";
import { startLocalPostgres, type LocalPostgres } from "./local-postgres";
import { ensureLocalMail } from "./local-mail";
import { ensureLocalObjectStore } from "./local-object-store";

const root = fileURLToPath(new URL("..", import.meta.url));
let localDb: LocalPostgres | undefined;
if (!process.env.DATABASE_URL) {
  localDb = startLocalPostgres({
    dataDir: process.env.LOCAL_PG_DIR ?? join(root, ".data", "pg"),
    port: Number(process.env.LOCAL_PG_PORT ?? 54329),
    database: "casebook",
  });
  process.env.DATABASE_URL = localDb.url;
}
// The catcher and the object store live in this process, so they outlast the server's reloads.
const mailCatcher = await ensureLocalMail(root);
const objectStore = await ensureLocalObjectStore(root);
const port = process.env.PORT ?? "8080";
const metroPort = process.env.METRO_PORT ?? "8081";
const childEnv = { ...process.env, PORT: port, METRO_URL: `http://127.0.0.1:${metroPort}` };

await applyMigrations(db);
await seedDemoShop();
await closeDb();

const bin = (name: string) => join(root, "node_modules", ".bin", name);
// Each child leads a process group of its own (detached), so stopping it reaches its children too
// (tsx watch runs the server in a grandchild that would otherwise keep the port).
const children: ChildProcess[] = [
  spawn(bin("tsx"), ["watch", "--clear-screen=false", "server/dev-server.ts"], {
    cwd: root,
    env: childEnv,
    stdio: "inherit",
    detached: true,
  }),
  spawn(bin("expo"), ["start", "--web", "--port", metroPort], {
    cwd: root,
    env: { ...childEnv, EXPO_OFFLINE: "1", BROWSER: "none" },
    stdio: ["ignore", "inherit", "inherit"],
    detached: true,
  }),
];
console.log(`\nShakeout Casebook (dev) will be at http://127.0.0.1:${port} once the bundler is ready.`);

const exited = children.map((c) => new Promise<void>((r) => (c.exitCode !== null ? r() : c.once("exit", () => r()))));
let stopping = false;
async function stop() {
  if (stopping) return;
  stopping = true;
  for (const c of children) signalGroup(c, "SIGTERM");
  const late = setTimeout(() => children.forEach((c) => signalGroup(c, "SIGKILL")), 5000);
  await Promise.all(exited);
  clearTimeout(late);
  await mailCatcher?.close();
  await objectStore?.close();
  localDb?.stop();
  process.exit(0);
}
function signalGroup(c: ChildProcess, signal: NodeJS.Signals) {
  try {
    if (c.pid) process.kill(-c.pid, signal);
  } catch {
    /* the group has already gone */
  }
}
process.on("SIGINT", stop);
process.on("SIGTERM", stop);
// One child dying (a port in use, say) ends the whole dev session rather than leaving half of it.
for (const c of children) c.once("exit", () => void stop());
