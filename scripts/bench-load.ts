/**
 * `npm run bench:load [-- --seconds=30 --cases=100000]`: many people at once. autocannon keeps 50
 * connections busy for 30 s (--seconds for shorter) on each of the melts list, a casting's page, a
 * casebook search and the castings list, signed in, against a shop of 100,000 cases seeded by bulk
 * SQL (scripts/bench-search-data.ts) on a throwaway PostgreSQL, the server in a child process of its
 * own (scripts/bench-harness.ts). Then the lists deep inside (row 50,000) by keyset, beside the
 * previous design's offset paging with a count of the shop (scripts/bench-previous-lists.ts), as a
 * ratio. Prints requests/s, p50/p95/p99 latency and errors for each, with the load average; asserts nothing.
 * First the floor under every request: a signed-in GET /api/shops/current (the session and membership
 * check and a small JSON answer). `--only=floor,search` runs only the targets named (floor, melts,
 * casting, search, computed, castings, deep); BENCH_CPU_PROF=<folder> profiles the server (bench-harness.ts).
 */
import autocannon from "autocannon";
import { availableParallelism, loadavg } from "node:os";
import { performance } from "node:perf_hooks";
import { benchGround, benchShop } from "./bench-harness";

const flag = (name: string, fallback: number) =>
  Number(process.argv.find((a) => a.startsWith(`--${name}=`))?.split("=")[1] ?? fallback);
const SECONDS = flag("seconds", 30);
const CASES = flag("cases", 100_000);
const CONNECTIONS = 50;
const AIM_RPS = 200;
const ONLY = process.argv
  .find((a) => a.startsWith("--only="))
  ?.split("=")[1]
  ?.split(",");
const wanted = (target: string) => !ONLY || ONLY.includes(target);
/**
 * Requests/s before the shop gate read session and membership in one query (2026-12-03, this
 * machine, 100,000 cases, other jobs running: load average about 3-6). The floor was measured then
 * on a 100,000-case copy, old and new servers side by side at the same load (load average 7): 349 req/s.
 * The casebook search, before each server kept answers and similar words (2026-12-04, 6 queries in
 * turn, every one computed): 33 req/s; both search targets are compared with that.
 */
const BEFORE: Record<string, number> = {
  floor: 349,
  melts: 391,
  casting: 255,
  search: 33,
  computed: 33,
  castings: 177,
};

const ground = await benchGround({ name: "load", child: true, env: { RATE_LIMIT: "off" } });
const { sql } = await import("drizzle-orm");
const { encodeCursor } = await import("../server/notebook/keyset");

type Figures = { name: string; rps: number; p50: number; p95: number; p99: number; errors: number; requests: number };
const at = (sorted: number[], p: number) => sorted[Math.min(sorted.length - 1, Math.floor(p * sorted.length))] ?? NaN;

/** One target under load; `paths` are taken in turn, one per request. */
async function load(name: string, cookie: string, paths: string[], target?: string): Promise<Figures> {
  let n = 0;
  const times: number[] = [];
  const result = await new Promise<autocannon.Result>((resolve, reject) => {
    const instance = autocannon(
      {
        url: ground.origin,
        connections: CONNECTIONS,
        duration: SECONDS,
        headers: { cookie },
        requests: [{ method: "GET", setupRequest: (req) => ({ ...req, path: paths[n++ % paths.length] }) }],
      },
      (err, res) => (err ? reject(err) : resolve(res)),
    );
    instance.on("response", (_client, _status, _bytes, responseTime) => times.push(responseTime));
  });
  times.sort((a, b) => a - b);
  const figures = {
    name,
    rps: result.requests.total / result.duration,
    p50: at(times, 0.5),
    p95: at(times, 0.95),
    p99: at(times, 0.99),
    errors: result.errors + result.timeouts + result.non2xx,
    requests: result.requests.total,
  };
  const aim = figures.errors === 0 && figures.rps >= AIM_RPS ? "met" : "missed";
  console.log(
    `${name.padEnd(52)} ${figures.rps.toFixed(0).padStart(6)} req/s   p50 ${figures.p50.toFixed(0).padStart(5)} ms   ` +
      `p95 ${figures.p95.toFixed(0).padStart(5)} ms   p99 ${figures.p99.toFixed(0).padStart(5)} ms   ` +
      `errors ${figures.errors}   (aim 0 errors, ≥ ${AIM_RPS} req/s: ${aim}; load average ${loadavg()[0].toFixed(1)})` +
      (target && BEFORE[target]
        ? `   before: ${BEFORE[target]} req/s, ${(figures.rps / BEFORE[target]).toFixed(1)}x`
        : ""),
  );
  return figures;
}

/** A GET that must answer 200 before the load starts, so a broken route is not measured as fast. */
async function check(cookie: string, path: string) {
  const res = await fetch(`${ground.origin}${path}`, { headers: { cookie } });
  if (res.status !== 200) throw new Error(`${path} answered ${res.status}: ${(await res.text()).slice(0, 200)}`);
}

try {
  const t0 = performance.now();
  const shop = await benchShop(ground, CASES, { triggersOff: true });
  console.log(
    `\nLoad: ${CONNECTIONS} connections for ${SECONDS} s each, a shop of ${CASES.toLocaleString("en")} cases ` +
      `(seeded in ${((performance.now() - t0) / 1000).toFixed(0)} s); ${availableParallelism()} cores, load average ${loadavg()
        .map((x) => x.toFixed(1))
        .join(" ")}\n`,
  );
  const cookie = await ground.signedInto(shop.shopId);
  const { rows: picked } = await ground.pool.query<{ id: number }>(
    "select id from castings where shop_id = $1 order by md5(id::text) limit 200",
    [shop.shopId],
  );
  const details = picked.map((r) => `/api/castings/${r.id}`);
  const searches = ["porosity", "misrun thin", "cold shut", "riser", "pinholes", "damp sand"].map(
    (q) => `/api/search?${new URLSearchParams({ q })}`,
  );
  // Row 50,000 (or the middle) of each list, as the cursor a person paging that far would send.
  const deepRow = Math.min(50_000, Math.floor(CASES / 2));
  const castingAt = await ground.db.execute<{ day: string; id: number }>(sql`
    select c.poured_on::text as day, c.id from castings c join melts m on m.id = c.melt_id
    where c.shop_id = ${shop.shopId} and c.archived_at is null and m.archived_at is null
    order by c.poured_on desc, c.id desc offset ${deepRow - 1} limit 1`);
  const meltsDeep = Math.floor(deepRow / 3);
  const meltAt = await ground.db.execute<{ day: string; id: number }>(sql`
    select poured_on::text as day, id from melts where shop_id = ${shop.shopId} and archived_at is null
    order by poured_on desc, id desc offset ${meltsDeep - 1} limit 1`);
  const c = castingAt.rows[0];
  const m = meltAt.rows[0];
  const deepCastings = `/api/castings?after=${encodeCursor("castings:date-desc", [c.day, c.id])}`;
  const deepMelts = `/api/melts?after=${encodeCursor("melts:date-desc", [m.day, m.id])}`;
  const previousCastings = `/api/bench-previous/castings?page=${deepRow / 20 + 1}`;
  const previousMelts = `/api/bench-previous/melts?page=${meltsDeep / 20 + 1}`;
  for (const path of [
    "/api/melts",
    details[0],
    searches[0],
    "/api/castings",
    deepCastings,
    previousCastings,
    deepMelts,
    previousMelts,
  ])
    await check(cookie, path);

  if (wanted("floor")) await load("signed-in floor: GET /api/shops/current", cookie, ["/api/shops/current"], "floor");
  if (wanted("melts")) await load("melts list, first page (keyset)", cookie, ["/api/melts"], "melts");
  if (wanted("casting")) await load("a casting's page (200 castings in turn)", cookie, details, "casting");
  if (wanted("search")) await load("casebook search (6 queries in turn, kept answers)", cookie, searches, "search");
  // More distinct searches than a server keeps answers for (server/search/answers.ts), taken in turn,
  // so each is computed: what the casebook costs when its searches do not repeat.
  const distinct = [
    "porosity",
    "misrun thin",
    "cold shut",
    "riser",
    "pinholes",
    "damp sand",
    "gate",
    "coating",
  ].flatMap((q) =>
    Array.from({ length: 50 }, (_, i) => `/api/search?${new URLSearchParams({ q, page: String(i + 1) })}`),
  );
  if (wanted("computed"))
    await load(
      `casebook search (${distinct.length} distinct searches in turn, computed)`,
      cookie,
      distinct,
      "computed",
    );
  const first =
    wanted("castings") || wanted("deep")
      ? await load("castings list, first page (keyset)", cookie, ["/api/castings"], "castings")
      : null;
  if (wanted("deep") && first) {
    const firstOld = await load("castings list, first page (previous: offset + count)", cookie, [
      "/api/bench-previous/castings?page=1",
    ]);
    const deep = await load(`castings list at row ${deepRow.toLocaleString("en")} (keyset)`, cookie, [deepCastings]);
    const deepOld = await load(
      `castings list at row ${deepRow.toLocaleString("en")} (previous: offset + count)`,
      cookie,
      [previousCastings],
    );
    const melts = await load(`melts list at row ${meltsDeep.toLocaleString("en")} (keyset)`, cookie, [deepMelts]);
    const meltsOld = await load(
      `melts list at row ${meltsDeep.toLocaleString("en")} (previous: offset + count)`,
      cookie,
      [previousMelts],
    );
    const ratio = (a: Figures, b: Figures) =>
      `${(a.rps / b.rps).toFixed(1)}x the requests/s, p95 ${(b.p95 / a.p95).toFixed(1)}x shorter`;
    console.log(
      `\nkeyset against the previous offset paging:` +
        `\n  castings list, first page: ${ratio(first, firstOld)}` +
        `\n  castings list, row ${deepRow.toLocaleString("en")}: ${ratio(deep, deepOld)}` +
        `\n  melts list, row ${meltsDeep.toLocaleString("en")}: ${ratio(melts, meltsOld)}` +
        `\n  (issue 11 recorded 9.6 req/s for GET /api/castings at 100,000 cases before either change)`,
    );
  }
} finally {
  await ground.stop();
}
