import { migrate } from "drizzle-orm/node-postgres/migrator";
import { fileURLToPath } from "node:url";
import type { Db } from "./client";

const migrationsFolder = fileURLToPath(new URL("../drizzle", import.meta.url));

/** Applies the generated SQL migrations under drizzle/ that the database has not seen yet. */
export async function applyMigrations(db: Db) {
  await migrate(db, { migrationsFolder });
}
