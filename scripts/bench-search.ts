/**
 * `npm run bench:search`: seeds 10,000 and 100,000 synthetic cases (two shops) in a throwaway
 * PostgreSQL, then times the search service (what GET /api/search runs after the session check:
 * change-log check, filters, ranking, one page with names and marked words) for text, filter and
 * combined queries; compares with plain Fuse over every case of the shop, and checks that the top
 * ten of each text query are Fuse's. Target: p95 ≤ 50 ms at 100,000. Figures only, no assertions.
 */
import Fuse from "fuse.js";
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { performance } from "node:perf_hooks";
import { freePort, startLocalPostgres } from "./local-postgres";
import { seedShop, type Seeded } from "./bench-search-data";

const parent = mkdtempSync(join(tmpdir(), "casebook-bench-"));
const pg = startLocalPostgres({
  dataDir: join(parent, "pg"),
  port: await freePort(),
  database: "casebook_bench",
  throwaway: true,
});
process.env.DATABASE_URL = pg.url;
const { connection, closeDb } = await import("../server/db");
const { db, pool } = connection();
const { comments } = await import("../db/schema");
const { applyMigrations } = await import("../db/migrate");
const { ensureBuiltInAlloys } = await import("../server/alloys/service");
const { searchQuery } = await import("../lib/search-schemas");
const { searchCases, similarTo } = await import("../server/search/service");
const { forgetShopIndexes, shopIndex } = await import("../server/search/index-cache");
const { slotFilter } = await import("../server/search/filters");
const { FUSE_OPTIONS } = await import("../server/search/fuzzy");

type Q = Record<string, unknown>;
const TEXT: Q[] = [
  "porosty",
  "misrnu",
  "mis-run",
  "cold shut",
  "ribbed cover plate",
  "pinholes",
  "sprue too short",
  "hot tear",
  "lost foam 319.0",
  "degas longer",
  "coating wet",
  "impeler",
].map((q) => ({ q }));
const FILTER: Q[] = [
  { defect: "misrun" },
  { alloy: "319.0", outcome: "scrap" },
  { process: "lost-foam", from: "2022-01-01", to: "2023-12-31" },
  { defect: "gas-porosity,blowhole", sort: "date-asc", page: 3 },
  { cause: "cold-pour" },
  { outcome: "rework", process: "green-sand" },
];
const COMBINED: Q[] = [
  { q: "porosity", alloy: "A356.0" },
  { q: "plate", process: "lost-foam", outcome: "scrap" },
  { q: "misrun thin", from: "2020-01-01" },
  { q: "cold shut", defect: "cold-shut" },
  { q: "damp sand", process: "green-sand" },
  { q: "riser", defect: "shrinkage", sort: "date-desc" },
];
const ROUNDS = 15;
const ms = (x: number) => `${x.toFixed(1)} ms`;
const q = (sorted: number[], p: number) => sorted[Math.min(sorted.length - 1, Math.floor(p * sorted.length))];
const stats = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  return { p50: q(s, 0.5), p95: q(s, 0.95) };
};
async function time(fn: () => unknown) {
  const t0 = performance.now();
  await fn();
  return performance.now() - t0;
}

async function bench(shop: Seeded) {
  console.log(`\n== ${shop.count.toLocaleString("en")} cases ==`);
  forgetShopIndexes();
  const build = await time(() => shopIndex(shop.shopId));
  const index = await shopIndex(shop.shopId);
  console.log(
    `first search builds the index: ${ms(build)}; ${index.fuzzy.unitCount.toLocaleString("en")} distinct words and phrases; heap in use ${Math.round(process.memoryUsage().heapUsed / 1e6)} MB`,
  );

  const cases = index.live();
  let fuse!: Fuse<(typeof cases)[number]["fields"]>;
  const fuseBuild = await time(
    () =>
      (fuse = new Fuse(
        cases.map((c) => c.fields),
        FUSE_OPTIONS,
      )),
  );
  const plain = (raw: Q) => {
    const p = searchQuery.parse(raw);
    const f = slotFilter(index, p);
    const keep = (pos: number) => f.other(index.order[pos]) && !f.failed(index.order[pos]);
    const hits = p.q
      ? fuse
          .search(p.q)
          .map((r) => r.refIndex)
          .filter(keep)
      : cases.map((_, i) => i).filter(keep);
    if (p.q && p.sort?.startsWith("date")) hits.sort((x, y) => x - y); // cases are newest first
    if (p.sort === "date-asc") hits.reverse();
    return hits.slice((p.page - 1) * p.pageSize, p.page * p.pageSize).map((i) => cases[i].id);
  };
  console.log(`plain Fuse index over every case: built in ${ms(fuseBuild)}`);

  const all: number[] = [];
  for (const [name, queries] of [
    ["text", TEXT],
    ["filter", FILTER],
    ["combined", COMBINED],
  ] as const) {
    const ours: number[] = [];
    const theirs: number[] = [];
    for (const raw of queries) await searchCases(shop.shopId, searchQuery.parse(raw)); // warm
    for (let round = 0; round < ROUNDS; round++)
      for (const raw of queries) ours.push(await time(() => searchCases(shop.shopId, searchQuery.parse(raw))));
    for (const raw of queries) theirs.push(await time(() => plain(raw)));
    all.push(...ours);
    const a = stats(ours);
    const b = stats(theirs);
    console.log(
      `${name.padEnd(8)} search p50 ${ms(a.p50)}, p95 ${ms(a.p95)} | plain Fuse p50 ${ms(b.p50)}, p95 ${ms(b.p95)} | plain/search ${(b.p50 / a.p50).toFixed(1)}x at p50`,
    );
  }
  const total = stats(all);
  console.log(
    `all queries: p50 ${ms(total.p50)}, p95 ${ms(total.p95)} (target p95 ≤ 50 ms: ${total.p95 <= 50 ? "met" : "missed"})`,
  );

  let same = 0;
  for (const raw of TEXT) {
    const ours = (await searchCases(shop.shopId, searchQuery.parse({ ...raw, pageSize: 10 }))).items.map((i) => i.id);
    const theirs = plain({ ...raw, pageSize: 10 });
    const equal = ours.length === theirs.length && ours.every((id, i) => id === theirs[i]);
    if (equal) same++;
    else console.log(`  top ten differ for "${raw.q}": search ${ours.join(",")} | Fuse ${theirs.join(",")}`);
  }
  console.log(`top ten equal to plain Fuse's: ${same} of ${TEXT.length} text queries`);

  const afterWrite: number[] = [];
  for (let i = 0; i < 20; i++) {
    await db
      .insert(comments)
      .values({ shopId: shop.shopId, castingId: cases[i * 7].id, body: `bench note ${i}`, createdBy: shop.people[0] });
    afterWrite.push(await time(() => searchCases(shop.shopId, searchQuery.parse({ q: `bench note ${i}` }))));
  }
  const w = stats(afterWrite);
  console.log(`search right after a write (reloads that casting): p50 ${ms(w.p50)}, p95 ${ms(w.p95)}`);
  const similar: number[] = [];
  for (let i = 0; i < 20; i++) similar.push(await time(() => similarTo(shop.shopId, cases[i * 13].id)));
  const s = stats(similar);
  console.log(`cases like this one: p50 ${ms(s.p50)}, p95 ${ms(s.p95)}`);
  const counting = await time(() =>
    pool.query(
      `select (select count(*) from castings where shop_id = $1), (select max(updated_at) from castings where shop_id = $1),
            (select count(*) from defect_marks where shop_id = $1), (select count(*) from comments where shop_id = $1),
            (select count(*) from diagnosis_snapshots where shop_id = $1)`,
      [shop.shopId],
    ),
  );
  console.log(
    `for comparison, a count-and-latest revision check over the notebook's tables: ${ms(counting)} per search`,
  );
}

try {
  await applyMigrations(db);
  await ensureBuiltInAlloys();
  const t0 = performance.now();
  const small = await seedShop(db, 10_000, 1);
  const large = await seedShop(db, 100_000, 2);
  console.log(
    `seeded 110,000 cases in ${((performance.now() - t0) / 1000).toFixed(0)} s (PostgreSQL ${pg.url.split("@")[1]})`,
  );
  await pool.query("analyze");
  await bench(small);
  await bench(large);
} finally {
  await closeDb();
  pg.stop();
  rmSync(parent, { recursive: true, force: true });
  rmSync(pg.dataDir, { recursive: true, force: true });
}
