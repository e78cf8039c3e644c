import { rmSync } from "node:fs";
import { mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import type { TestProject } from "vitest/node";
import { freePort, startLocalPostgres } from "../../scripts/local-postgres";

/**
 * A throwaway PostgreSQL cluster for the API tests: its own folder and port, never the
 * `npm start` database, removed when the run ends. Migrations are applied by tests/api/setup.ts.
 */
export default async function setup(project: TestProject) {
  const parent = mkdtempSync(join(tmpdir(), "casebook-test-"));
  const pg = startLocalPostgres({
    dataDir: join(parent, "pg"),
    port: await freePort(),
    database: "casebook_test",
    throwaway: true,
  });
  project.provide("databaseUrl", pg.url);
  return () => {
    pg.stop();
    rmSync(parent, { recursive: true, force: true });
    rmSync(pg.dataDir, { recursive: true, force: true });
  };
}

declare module "vitest" {
  export interface ProvidedContext {
    databaseUrl: string;
  }
}
