// `npm run dev`: the local database (as npm start), the API with reload on 127.0.0.1:8080, and the
// Expo dev server on :8081 for the app, which talks to the API across origins (CORS allowed for it).
import { spawn, type ChildProcess } from "node:child_process";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { applyMigrations } from "../db/migrate";
import { closeDb, db } from "../server/db";
import { seedDemoShop } from "../server/seed/seed";
import { startLocalPostgres, type LocalPostgres } from "./local-postgres";

const root = fileURLToPath(new URL("..", import.meta.url));
let localDb: LocalPostgres | undefined;
if (!process.env.DATABASE_URL) {
  localDb = startLocalPostgres({
    dataDir: join(root, ".data", "pg"),
    port: Number(process.env.LOCAL_PG_PORT ?? 54329),
    database: "casebook",
  });
  process.env.DATABASE_URL = localDb.url;
}
const apiPort = process.env.PORT ?? "8080";
const devWebOrigin = "http://localhost:8081";
const childEnv = {
  ...process.env,
  PORT: apiPort,
  DEV_WEB_ORIGIN: devWebOrigin,
  EXPO_PUBLIC_API_URL: `http://127.0.0.1:${apiPort}`,
};

await applyMigrations(db);
await seedDemoShop();
await closeDb();

const children: ChildProcess[] = [
  spawn("npx", ["tsx", "watch", "--clear-screen=false", "server/dev-server.ts"], {
    cwd: root,
    env: childEnv,
    stdio: "inherit",
  }),
  spawn("npx", ["expo", "start", "--web", "--port", "8081"], {
    cwd: root,
    env: { ...childEnv, EXPO_OFFLINE: "1" },
    stdio: "inherit",
  }),
];

function stop() {
  for (const c of children) c.kill("SIGINT");
  localDb?.stop();
  process.exit(0);
}
process.on("SIGINT", stop);
process.on("SIGTERM", stop);
