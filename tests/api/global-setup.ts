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
  return async () => {
    await mail.close();
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
  }
}
