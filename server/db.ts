import { createDb, type Db } from "../db/client";
import { requireDatabaseUrl } from "./env";

/**
 * The process's one database connection, made on first use from the environment (not at import,
 * so a script may set DATABASE_URL after importing the server).
 */
let current: ReturnType<typeof createDb> | undefined;

export function connection() {
  current ??= createDb(requireDatabaseUrl());
  return current;
}

/** Closes the pool; the next use opens a new one. */
export async function closeDb() {
  const c = current;
  current = undefined;
  await c?.pool.end();
}

/** `db` for services: every property is looked up on the real client when used. */
export const db: Db = new Proxy({} as Db, {
  get(_target, key) {
    const real = connection().db;
    const value = Reflect.get(real, key, real);
    return typeof value === "function" ? value.bind(real) : value;
  },
});
