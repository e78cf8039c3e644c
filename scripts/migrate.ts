// `npm run db:migrate`: applies drizzle/ migrations to DATABASE_URL.
import { createDb } from "../db/client";
import { applyMigrations } from "../db/migrate";
import { requireDatabaseUrl } from "../server/env";

const { db, pool } = createDb(requireDatabaseUrl());
await applyMigrations(db);
await pool.end();
console.log("Migrations applied.");
