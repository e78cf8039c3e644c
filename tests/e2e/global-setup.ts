import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import type { TestProject } from "vitest/node";
import { freePort, startLocalPostgres } from "../../scripts/local-postgres";
import { ensureWebBuild } from "../../scripts/web-build";
import { applyMigrations } from "../../db/migrate";
import { closeDb, db } from "../../server/db";
import { listen } from "../../server/index";
import { seedDemoShop } from "../../server/seed/seed";
import { ensureChromium } from "../../scripts/debian-packages";
import { startMailCatcher } from "../../server/mail/catcher";
import { STAND_IN_KEYS, startLocalObjectStore } from "../../server/photos/store-stand-in";

const root = fileURLToPath(new URL("../..", import.meta.url));

/**
 * What `npm start` does, on throwaway ground: a new cluster, a mail catcher, an object store, migrations, the demo shop, the web
 * export (built when stale), and the real server on a free port. The tests get its address.
 */
export default async function setup(project: TestProject) {
  ensureChromium(process.env.CHROMIUM_PATH);
  const parent = mkdtempSync(join(tmpdir(), "casebook-e2e-"));
  const pg = startLocalPostgres({
    dataDir: join(parent, "pg"),
    port: await freePort(),
    database: "casebook_e2e",
    throwaway: true,
  });
  const port = await freePort();
  const mail = await startMailCatcher({ dir: join(parent, "mail") });
  // A stand-in unless S3_ENDPOINT names a store (with S3_BUCKET and keys) for the run.
  const store = process.env.S3_ENDPOINT
    ? undefined
    : await startLocalObjectStore({ dir: join(parent, "objects"), bucket: "casebook-photos" });
  if (store) {
    Object.assign(process.env, {
      S3_ENDPOINT: store.endpoint,
      S3_BUCKET: "casebook-photos",
      S3_ACCESS_KEY_ID: STAND_IN_KEYS.accessKeyId,
      S3_SECRET_ACCESS_KEY: STAND_IN_KEYS.secretAccessKey,
    });
  }
  Object.assign(process.env, {
    AUTH_SECRET_FILE: join(parent, "auth-secret"),
    SMTP_URL: mail.url,
    MAIL_DIR: mail.dir,
    DATABASE_URL: pg.url,
    PORT: String(port),
    NODE_ENV: "test",
    PUBLIC_URL: `http://127.0.0.1:${port}`,
    UPLOAD_DIR: join(parent, "uploads"),
    // Every browser signs in from 127.0.0.1: the sign-in limits have their own test (tests/api/rate-limit.test.ts).
    RATE_LIMIT: "off",
  });

  await applyMigrations(db);
  await seedDemoShop();
  const webDir = ensureWebBuild(root);
  const server = await listen({ port, host: "127.0.0.1", webDir });
  project.provide("baseUrl", `http://127.0.0.1:${port}`);
  project.provide("mailDir", mail.dir);

  return async () => {
    server.closeAllConnections();
    await new Promise((r) => server.close(r));
    await closeDb();
    await mail.close();
    await store?.close();
    pg.stop();
    rmSync(parent, { recursive: true, force: true });
    rmSync(pg.dataDir, { recursive: true, force: true });
  };
}

declare module "vitest" {
  export interface ProvidedContext {
    baseUrl: string;
    mailDir: string;
  }
}
