import { drizzle } from "drizzle-orm/node-postgres";
import pg from "pg";
import { env } from "../server/env";
import * as schema from "./schema";

/** One pool per process; connects lazily on the first query. */
export const pool = new pg.Pool({ connectionString: env.DATABASE_URL, max: 10 });
export const db = drizzle(pool, { schema });
export type Db = typeof db;
