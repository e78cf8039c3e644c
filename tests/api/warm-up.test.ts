import { beforeAll, describe, expect, it } from "vitest";
import type { SearchAnswer } from "../../lib/search-schemas";
import { closeDb, connection } from "../../server/db";
import { warmUp } from "../../server/warm-up";
import { migrateOnce, shopWithCrew } from "./helpers";
import { newCasting, newMelt } from "./notebook-fixtures";

/**
 * The warm-up a server runs before it listens (server/warm-up.ts): it opens connections and runs
 * the search code, reads no one's cases and writes nothing, and the searches after it answer as
 * they would have without it.
 */
beforeAll(migrateOnce);

const versionRows = async () =>
  (
    await connection().pool.query(
      `SELECT (SELECT count(*) FROM search_document_versions)::int AS documents,
        (SELECT count(*) FROM search_vocabularies)::int AS vocabularies`,
    )
  ).rows[0];

describe("warm-up before listening", () => {
  it("opens several pooled connections on a fresh pool and writes nothing", async () => {
    await closeDb();
    const before = await versionRows();
    await closeDb(); // counted on a pool that has not been used yet
    await warmUp();
    expect(connection().pool.totalCount).toBeGreaterThanOrEqual(3);
    expect(await versionRows()).toEqual(before);
  });

  it("leaves a shop's searches as they would be without it", async () => {
    const { caster } = await shopWithCrew("Warm Search Shop");
    const melt = await newMelt(caster);
    await newCasting(caster, melt.id, { partName: "Warm test porosity plate" });
    const ask = async () => (await caster.agent.get("/api/search").query({ q: "porosity" })).body as SearchAnswer;
    const cold = await ask();
    await warmUp();
    const warm = await ask();
    expect(warm.items.map((i) => i.id)).toEqual(cold.items.map((i) => i.id));
    expect(warm.total).toBe(1);
  });
});
