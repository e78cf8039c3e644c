import { drizzle } from "drizzle-orm/node-postgres";
import pg from "pg";
import * as schema from "./schema";

export type DbOptions = {
  /** How long a request waits for a connection before failing (so an absent database answers, not hangs). */
  connectionTimeoutMs?: number;
  max?: number;
  /** Called when an idle pooled connection drops (the database restarted); the pool replaces it. */
  onIdleError?: (err: Error) => void;
};

/**
 * A pool and its Drizzle client for one database URL. The caller says which URL, so this layer
 * reads no configuration of its own. Connects lazily on the first query.
 */
export function createDb(url: string, opts: DbOptions = {}) {
  const pool = new pg.Pool({
    connectionString: url,
    max: opts.max ?? 10,
    connectionTimeoutMillis: opts.connectionTimeoutMs ?? 5000,
  });
  // Without a listener an idle client's error (e.g. 57P01 on a database restart) kills the process.
  pool.on("error", opts.onIdleError ?? ((err) => console.warn(`database connection dropped: ${err.message}`)));
  const db = drizzle(pool, { schema });
  return { pool, db };
}

export type Db = ReturnType<typeof createDb>["db"];
