// `npm run db:migrate`: applies drizzle/ migrations to DATABASE_URL.
import { db, pool } from "../db/client";
import { applyMigrations } from "../db/migrate";
import { requireDatabaseUrl } from "../server/env";

requireDatabaseUrl();
await applyMigrations(db);
await pool.end();
console.log("Migrations applied.");
