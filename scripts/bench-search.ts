/**
 * `npm run bench:search [-- --sizes=1000,10000,100000]`: the casebook search through HTTP on a warm
 * server (a child process on a throwaway PostgreSQL). For each size it makes a shop through the API,
 * seeds that many cases with bulk SQL (free-text notes, bench-search-data.ts), then times text,
 * filter and combined searches and "cases like this one", and reads the server's resident memory.
 * Each search is timed computed (a write before each round makes every kept answer stale) and kept
 * (asked again with nothing changed: server/search/answers.ts), and once the first time it is asked.
 * Then it restarts the server and times the first search, and measures what keeping the documents
 * current costs a write: triggers against the same refresh called by a service layer. Prints the
 * previous design's recorded figures beside the new ones. Figures only, no assertions.
 */
import { spawn, type ChildProcess } from "node:child_process";
import { mkdtempSync, readFileSync, rmSync } from "node:fs";
import { availableParallelism, loadavg, tmpdir } from "node:os";
import { join } from "node:path";
import { performance } from "node:perf_hooks";
import { fileURLToPath } from "node:url";
import { buildDocuments, seedShop } from "./bench-search-data";
import { freePort, startLocalPostgres } from "./local-postgres";

const sizesFlag = process.argv.find((a) => a.startsWith("--sizes="));
const SIZES = (sizesFlag?.slice(8) ?? "1000,10000,100000").split(",").map(Number);
const root = fileURLToPath(new URL("..", import.meta.url));
const parent = mkdtempSync(join(tmpdir(), "casebook-bench-"));
const pg = startLocalPostgres({
  dataDir: join(parent, "pg"),
  port: await freePort(),
  database: "casebook_bench",
  throwaway: true,
});
const port = await freePort();
const base = `http://127.0.0.1:${port}`;
const serverEnv = {
  ...process.env,
  DATABASE_URL: pg.url,
  PORT: String(port),
  NODE_ENV: "test" as const,
  PUBLIC_URL: base,
  // One secret for both server runs, so the sessions survive the restart.
  BETTER_AUTH_SECRET: "bench-search-secret-0123456789abcdef0123456789",
  UPLOAD_DIR: join(parent, "uploads"),
};
process.env.DATABASE_URL = pg.url;
const { connection, closeDb } = await import("../server/db");
const { db, pool } = connection();
const { createDb } = await import("../db/client");
const { applyMigrations } = await import("../db/migrate");
const { ensureBuiltInAlloys } = await import("../server/alloys/service");

type Q = Record<string, string | number>;
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
  {},
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
const ROUNDS = 10;
/**
 * The figures before the counts were bounded and "cases like this one" scored only indexed
 * candidates: measured on this machine on 2026-12-03 with the previous statement (counts and chips
 * over every match, one materialised set of all of them), under heavy load from other jobs (load
 * average not recorded then; read the ratios as rough). Printed beside the new ones.
 */
const BEFORE: Record<number, { searchP95: number; similarP50: number }> = {
  100000: { searchP95: 422, similarP50: 538 },
};
const BEFORE_FIRST_SEARCH = 262;
/**
 * Before each server kept answers and similar words under versions PostgreSQL keeps: the previous
 * commit measured on 2026-12-04 on this machine at load average 2.2 (2 cores, another worker's jobs
 * around): every search computed, p50 58.7 ms, p95 108.2 ms; first search after a restart 158.0 ms;
 * cases like this one p50 25.3 ms. (At load average 4.0 the same code measured p50 93.4, p95 191.5.)
 */
const BEFORE_KEPT: Record<number, { searchP95: number; searchP50: number; similarP50: number }> = {
  100000: { searchP95: 108.2, searchP50: 58.7, similarP50: 25.3 },
};
const BEFORE_KEPT_FIRST_SEARCH = 158.0;
const ratio = (before: number | undefined, now: number) =>
  before === undefined ? "" : ` (before ${ms(before)}: ${(before / now).toFixed(1)}x faster)`;
const measured: Record<
  number,
  { searchP50: number; searchP95: number; keptP50: number; keptP95: number; similarP50: number }
> = {};
const ms = (x: number) => `${x.toFixed(1)} ms`;
const at = (sorted: number[], p: number) => sorted[Math.min(sorted.length - 1, Math.floor(p * sorted.length))];
const stats = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  return { p50: at(s, 0.5), p95: at(s, 0.95) };
};
const rssMb = (pid: number) => {
  const line = readFileSync(`/proc/${pid}/status`, "utf8").match(/VmRSS:\s+(\d+)/);
  return line ? Math.round(Number(line[1]) / 1024) : NaN;
};

let server: ChildProcess | undefined;
async function startServer() {
  const child = spawn(process.execPath, ["--import", "tsx", join(root, "scripts/bench-server.ts")], {
    env: serverEnv,
    stdio: ["ignore", "pipe", "inherit"],
  });
  await new Promise<void>((resolve, reject) => {
    child.stdout!.on("data", (b: Buffer) => b.toString().includes("listening") && resolve());
    child.on("exit", (code) => reject(new Error(`server exited ${code}`)));
  });
  server = child;
  return child;
}
async function stopServer() {
  const child = server;
  if (!child || child.exitCode !== null) return;
  const gone = new Promise((r) => child.once("exit", r));
  child.kill("SIGTERM");
  await gone;
}

async function call(cookie: string, path: string, body?: unknown) {
  const res = await fetch(`${base}${path}`, {
    method: body ? "POST" : "GET",
    headers: { cookie, origin: base, ...(body ? { "content-type": "application/json" } : {}) },
    body: body ? JSON.stringify(body) : undefined,
  });
  const text = await res.text();
  if (res.status >= 300) throw new Error(`${path}: ${res.status} ${text.slice(0, 200)}`);
  return { res, json: text ? JSON.parse(text) : null };
}
const query = (q: Q) => `/api/search?${new URLSearchParams(Object.entries(q).map(([k, v]) => [k, String(v)]))}`;
async function timed(cookie: string, q: Q) {
  const t0 = performance.now();
  await call(cookie, query(q));
  return performance.now() - t0;
}

/** A person and a shop through the API, then `count` cases by bulk SQL with the triggers off. */
async function shopOf(count: number, seed: number) {
  const email = `bench-${count}-${Date.now()}@bench.example`;
  await call("", "/api/auth/sign-up/email", { name: `Bench ${count}`, email, password: "bench-pass-9174" });
  // Sign-up makes no session (server/people/auth-hooks.ts): sign in as the app does.
  const signUp = await call("", "/api/auth/sign-in/email", { email, password: "bench-pass-9174" });
  const cookie = signUp.res.headers
    .getSetCookie()
    .map((c) => c.split(";")[0])
    .join("; ");
  const shop = await call(cookie, "/api/auth/organization/create", {
    name: `Bench ${count}`,
    slug: `bench-${count}-${seed}`,
  });
  const seeding = createDb(pg.url, { max: 1 });
  const t0 = performance.now();
  await seeding.pool.query("set session_replication_role = replica"); // no triggers for the bulk rows
  const seeded = await seedShop(seeding.db, count, seed, shop.json.id, signUp.json.user.id);
  await seeding.pool.end();
  const t1 = performance.now();
  await buildDocuments(db, seeded.shopId);
  await pool.query("select list_keys_rebuild($1)", [seeded.shopId]); // the lists' keys, as the triggers would
  const t2 = performance.now();
  await pool.query("vacuum analyze");
  console.log(
    `\n== ${count.toLocaleString("en")} cases == seeded in ${((t1 - t0) / 1000).toFixed(1)} s; documents built in ${((t2 - t1) / 1000).toFixed(1)} s (${(((t2 - t1) / count) * 1000).toFixed(0)} µs a case)`,
  );
  return { ...seeded, cookie };
}

async function bench(shop: Awaited<ReturnType<typeof shopOf>>) {
  // What any signed-in request costs here (session and shop checks, one small query), for scale.
  const floor: number[] = [];
  for (let i = 0; i < 40; i++) {
    const t0 = performance.now();
    await call(shop.cookie, "/api/shops/current");
    floor.push(performance.now() - t0);
  }
  const f = stats(floor);
  console.log(
    `for scale, GET /api/shops/current: p50 ${ms(f.p50)}, p95 ${ms(f.p95)}; load average ${loadavg()[0].toFixed(1)} on ${availableParallelism()} cores`,
  );
  // A write between rounds (a comment of words the shop has, through the triggers) makes every kept
  // answer stale, so "computed" is what a search costs when the casebook changed since it was last
  // asked; "kept" is the same search asked again with nothing changed (server/search/answers.ts).
  const { rows: target } = await pool.query<{ id: number }>(
    "select id from castings where shop_id = $1 order by id limit 1",
    [shop.shopId],
  );
  const touch = () =>
    pool.query("insert into comments (shop_id, casting_id, body, created_by) values ($1, $2, $3, $4)", [
      shop.shopId,
      target[0].id,
      "pour again",
      shop.people[0],
    ]);
  const computed: number[] = [];
  const kept: number[] = [];
  const first: number[] = [];
  for (const [name, queries] of [
    ["text", TEXT],
    ["filter", FILTER],
    ["combined", COMBINED],
  ] as const) {
    await touch();
    for (const q of queries) first.push(await timed(shop.cookie, q)); // also the first lookup of its words
    const fresh: number[] = [];
    for (let round = 0; round < ROUNDS; round++) {
      await touch();
      for (const q of queries) fresh.push(await timed(shop.cookie, q));
    }
    const again: number[] = [];
    for (let round = 0; round < ROUNDS; round++) for (const q of queries) again.push(await timed(shop.cookie, q));
    computed.push(...fresh);
    kept.push(...again);
    const c = stats(fresh);
    const k = stats(again);
    console.log(
      `${name.padEnd(8)} search over HTTP, computed p50 ${ms(c.p50)}, p95 ${ms(c.p95)}; kept p50 ${ms(k.p50)}, p95 ${ms(k.p95)}`,
    );
  }
  const total = stats(computed);
  const again = stats(kept);
  const once = stats(first);
  const aim = (p95: number) => `(aim p95 ≤ 50 ms: ${p95 <= 50 ? "met" : "missed"})`;
  console.log(
    `all searches, computed (the casebook changed since last asked): p50 ${ms(total.p50)}, p95 ${ms(total.p95)} ${aim(total.p95)}` +
      ratio(BEFORE[shop.count]?.searchP95, total.p95) +
      ratio(BEFORE_KEPT[shop.count]?.searchP95, total.p95).replace("before", "before the kept answers"),
  );
  console.log(
    `all searches, kept (asked again, nothing changed): p50 ${ms(again.p50)}, p95 ${ms(again.p95)} ${aim(again.p95)}` +
      ratio(BEFORE_KEPT[shop.count]?.searchP95, again.p95).replace("before", "before the kept answers"),
  );
  console.log(
    `first time each query is asked (its words looked up too): p50 ${ms(once.p50)}, p95 ${ms(once.p95)} over ${first.length}; load average ${loadavg()[0].toFixed(1)}`,
  );
  const sample = await Promise.all(
    ["porosty", "misrnu", "mis-run", "impeler"].map(
      async (q) => `"${q}" ${(await call(shop.cookie, query({ q }))).json.total}`,
    ),
  );
  console.log(`matches: ${sample.join(", ")}`);
  const { rows } = await pool.query<{ id: number }>(
    "select id from castings where shop_id = $1 order by id limit 20 offset 100",
    [shop.shopId],
  );
  const similar: number[] = [];
  for (const r of rows) {
    const t0 = performance.now();
    await call(shop.cookie, `/api/search/castings/${r.id}/similar`);
    similar.push(performance.now() - t0);
  }
  const s = stats(similar);
  console.log(
    `cases like this one: p50 ${ms(s.p50)}, p95 ${ms(s.p95)}${ratio(BEFORE[shop.count]?.similarP50, s.p50)}` +
      ratio(BEFORE_KEPT[shop.count]?.similarP50, s.p50).replace("before", "before the kept answers"),
  );
  measured[shop.count] = {
    searchP50: total.p50,
    searchP95: total.p95,
    keptP50: again.p50,
    keptP95: again.p95,
    similarP50: s.p50,
  };
  console.log(`server resident memory: ${rssMb(server!.pid!)} MB`);
}

/** What keeping documents current costs one write (a comment), three ways, on the largest shop. */
async function writeCost(shopId: string, people: string[]) {
  const { rows } = await pool.query<{ id: number }>("select id from castings where shop_id = $1 limit 200", [shopId]);
  const one = createDb(pg.url, { max: 1 });
  const run = async (mode: "trigger" | "service" | "none") => {
    await one.pool.query(`set session_replication_role = ${mode === "trigger" ? "origin" : "replica"}`);
    const times: number[] = [];
    for (const r of rows) {
      const t0 = performance.now();
      await one.pool.query("begin");
      const c = await one.pool.query<{ id: number }>(
        "insert into comments (shop_id, casting_id, body, created_by) values ($1, $2, $3, $4) returning casting_id as id",
        [shopId, r.id, `bench write ${mode} ${r.id}`, people[0]],
      );
      if (mode === "service") await one.pool.query("select search_refresh(array[$1]::int[])", [c.rows[0].id]);
      await one.pool.query("commit");
      times.push(performance.now() - t0);
    }
    return stats(times);
  };
  const none = await run("none");
  const trigger = await run("trigger");
  const service = await run("service");
  await one.pool.end();
  console.log(
    `\nkeeping documents current, one comment per transaction (p50 / p95): no refresh ${ms(none.p50)} / ${ms(none.p95)}; ` +
      `trigger ${ms(trigger.p50)} / ${ms(trigger.p95)}; service layer calling the same refresh ${ms(service.p50)} / ${ms(service.p95)}`,
  );
}

try {
  await applyMigrations(db);
  await ensureBuiltInAlloys();
  await startServer();
  const shops = [];
  for (const [i, size] of SIZES.entries()) {
    const shop = await shopOf(size, i + 1);
    await bench(shop);
    shops.push(shop);
  }
  const largest = shops[shops.length - 1];
  await stopServer();
  await startServer();
  const firstText = await timed(largest.cookie, { q: "porosty" });
  const firstFilter = await timed(largest.cookie, { defect: "misrun" });
  console.log(
    `\nafter a restart, ${largest.count.toLocaleString("en")} cases: first search ${ms(firstText)} (text)` +
      `${largest.count === 100000 ? ratio(BEFORE_FIRST_SEARCH, firstText) + ratio(BEFORE_KEPT_FIRST_SEARCH, firstText).replace("before", "before the kept answers") : ""}, then ${ms(firstFilter)} (filter); ` +
      `server resident memory ${rssMb(server!.pid!)} MB; load average ${loadavg()[0].toFixed(1)}`,
  );
  await writeCost(largest.shopId, largest.people);
  console.log(
    "\nprevious design (in-process index per shop), figures recorded in issue 11 before this change, same machine:" +
      "\n  text search at 100,000 cases with free-text notes: 154 ms median (11 ms with templated notes)" +
      "\n  first search after a restart: 5-8 s index build blocking the event loop (health checks stalled 3 s)" +
      "\n  memory: about 145-280 MB per 100,000-case shop, 8 shops cached per process",
  );
  console.log(
    "\nbefore the bounded counts (2026-12-03, heavy load): search p95 at 100,000 cases 422 ms; first search after a restart 262 ms; cases like this one 538 ms median",
  );
  console.log(
    "before the kept answers and similar words (2026-12-04, load average 2.2): search p50 58.7 ms, p95 108.2 ms at 100,000 cases; first search after a restart 158.0 ms; cases like this one 25.3 ms median",
  );
  for (const [size, m] of Object.entries(measured))
    console.log(
      `  now at ${Number(size).toLocaleString("en")} cases: search computed p50 ${ms(m.searchP50)}, p95 ${ms(m.searchP95)}; ` +
        `kept p50 ${ms(m.keptP50)}, p95 ${ms(m.keptP95)}; cases like this one p50 ${ms(m.similarP50)}`,
    );
} finally {
  await stopServer();
  await closeDb();
  pg.stop();
  rmSync(parent, { recursive: true, force: true });
  rmSync(pg.dataDir, { recursive: true, force: true });
}
