import { sql } from "drizzle-orm";
import { searchQuery } from "../lib/search-schemas";
import { db } from "./db";
import { searchCases } from "./search/service";

/** No shop has this id (better-auth's are 32 letters and digits), so the warm-up reads no one's cases. */
const NO_SHOP = "(warm-up)";
const WARM_SEARCHES = 3;

/**
 * Run before a server takes requests: a few casebook searches for a shop that does not exist, side
 * by side, and a session look-up. It opens the pool's first connections (each a new PostgreSQL
 * backend, which loads the catalog entries of every table, index and function a statement names on
 * its first use of them) and compiles the search's own code, so the first person to search after a
 * restart does not pay for it: at 100,000 cases that first search took 206-273 ms against about 60 ms
 * once warm (`npm run bench:search`, "first search after a restart"). Reads only; a database that
 * is away only leaves the server cold.
 */
export async function warmUp(): Promise<void> {
  const params = searchQuery.parse({ q: "porosity misrun" });
  try {
    await Promise.all([
      ...Array.from({ length: WARM_SEARCHES }, () => searchCases(NO_SHOP, params)),
      db.execute(sql`SELECT s.id FROM session s JOIN "user" u ON u.id = s.user_id WHERE s.token = ${NO_SHOP}`),
    ]);
  } catch (err) {
    console.warn(`Warm-up skipped: ${(err as Error).message}`);
  }
}
