import { sql } from "drizzle-orm";
import { db } from "../../server/db";

/** Tables a request may touch without changing anything a person wrote (sign-in bookkeeping). */
const BOOKKEEPING = new Set(["session", "verification", "rate_limit", "__drizzle_migrations"]);

/**
 * A hash of every row of every table: equal before and after means a request changed nothing.
 * Each test file has its own database (tests/api/setup.ts), so other files' writes never show here.
 */
export async function dbFingerprint(): Promise<Record<string, string>> {
  const tables = await db.execute<{ name: string }>(
    sql`select tablename as name from pg_tables where schemaname = 'public' order by 1`,
  );
  const out: Record<string, string> = {};
  for (const { name } of tables.rows) {
    if (BOOKKEEPING.has(name)) continue;
    const t = sql.identifier(name);
    const [row] = (
      await db.execute<{ n: number; h: string }>(
        sql`select count(*)::int as n, md5(coalesce(string_agg(x::text, '|' order by x::text), '')) as h from ${t} x`,
      )
    ).rows;
    out[name] = `${row.n}:${row.h}`;
  }
  return out;
}
