import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { drizzle } from "drizzle-orm/node-postgres";
import { migrate } from "drizzle-orm/node-postgres/migrator";
import pg from "pg";
import type { TestProject } from "vitest/node";
import { freePort, startLocalPostgres } from "../../scripts/local-postgres";
import { startMailCatcher } from "../../server/mail/catcher";
import { startLocalObjectStore } from "../../server/photos/store-stand-in";

const migrationsFolder = fileURLToPath(new URL("../../drizzle", import.meta.url));

/**
 * A throwaway PostgreSQL cluster for the API tests: its own folder and port, never the `npm start`
 * database, removed when the run ends. One database `casebook_template` is migrated here once;
 * tests/api/setup.ts clones it for each test file, so files run in parallel without sharing rows.
 */
export default async function setup(project: TestProject) {
  const parent = mkdtempSync(join(tmpdir(), "casebook-test-"));
  const pg15 = startLocalPostgres({
    dataDir: join(parent, "pg"),
    port: await freePort(),
    database: "casebook_template",
    throwaway: true,
  });
  // No connection may stay open on a template while it is cloned, so this pool ends at once.
  const pool = new pg.Pool({ connectionString: pg15.url, max: 1 });
  await migrate(drizzle(pool), { migrationsFolder });
  await pool.end();
  project.provide("templateUrl", pg15.url);
  // One real SMTP catcher for the run; tests find their messages by their own unique recipients.
  const mail = await startMailCatcher({ dir: join(parent, "mail") });
  project.provide("smtpUrl", mail.url);
  project.provide("mailDir", mail.dir);
  // One object store for the run (a stand-in unless S3_ENDPOINT names one); each file makes a bucket
  // of its own on it (tests/api/setup.ts).
  const store = process.env.S3_ENDPOINT
    ? undefined
    : await startLocalObjectStore({ dir: join(parent, "objects"), bucket: "casebook-photos" });
  project.provide("s3Endpoint", store?.endpoint ?? process.env.S3_ENDPOINT!);
  // The session secret every in-process app and child server of this run generates and shares.
  project.provide("authSecretFile", join(parent, "auth-secret"));
  return async () => {
    await mail.close();
    await store?.close();
    pg15.stop();
    rmSync(parent, { recursive: true, force: true });
    rmSync(pg15.dataDir, { recursive: true, force: true });
  };
}

declare module "vitest" {
  export interface ProvidedContext {
    templateUrl: string;
    smtpUrl: string;
    mailDir: string;
    s3Endpoint: string;
    authSecretFile: string;
  }
}
