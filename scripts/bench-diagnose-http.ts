/**
 * The HTTP half of `npm run bench:diagnose`: POST /api/diagnosis on a real server over a throwaway
 * PostgreSQL with a shop of 1,000 and one of 100,000 synthetic cases (scripts/bench-search-data.ts,
 * about 7 % confirmed), warm, signed in. Prints p50/p95, the first diagnosis after a write that changes
 * nothing a diagnosis reads (a new casting), the first after one that does (a confirmation), and beside
 * them the "has anything changed" scan the previous design ran on every call (its SQL is kept here only
 * to measure it; that design also recomputed after any write). Sizes: BENCH_DIAGNOSE_SIZES=1000,100000.
 */
import { loadavg } from "node:os";
import { performance } from "node:perf_hooks";
import type { DiagnosisCase } from "../rules/case";
import { benchGround, benchShop } from "./bench-harness";

const sizes = (process.env.BENCH_DIAGNOSE_SIZES ?? "1000,100000").split(",").map(Number);
const ground = await benchGround({ name: "diagnose" });
const { origin, db, signedInto } = ground;
const { sql } = await import("drizzle-orm");
const { castings, confirmations } = await import("../db/schema");
const { recomputedTallies } = await import("../server/rulebook/calibration");
const { shopRules } = await import("../server/rulebook/context");

const ms = (t: number) => `${t.toFixed(1)} ms`;
/**
 * Before the calibration was kept as tallies (2026-12-03, this machine under heavy load from other
 * jobs, load average not recorded): at 100,000 cases warm p95 165 ms; the first diagnosis after a
 * confirmation ran every confirmed case again. Printed beside the new figures as ratios.
 */
const BEFORE: Record<number, { warmP95: number }> = { 100000: { warmP95: 165 } };
const ratio = (before: number | undefined, now: number) =>
  before === undefined ? "" : ` (before ${ms(before)}: ${(before / now).toFixed(1)}x)`;
const q = (sorted: number[], p: number) => sorted[Math.min(sorted.length - 1, Math.floor(p * sorted.length))];

/** What the previous design asked on every diagnosis (server/rulebook/context.ts before the revision). */
const oldScan = (shopId: string) =>
  db.execute(sql`select
    (select count(*) || ':' || coalesce(max(id), 0) from confirmations where shop_id = ${shopId}) as c,
    (select max(updated_at)::text from castings where shop_id = ${shopId}) as k,
    (select max(updated_at)::text from melts where shop_id = ${shopId}) as m,
    (select count(*) || ':' || coalesce(max(updated_at)::text, '') from defect_marks where shop_id = ${shopId}) as d`);

const aCase: DiagnosisCase = {
  defects: [{ type: "misrun", location: "far-from-gate", severity: 3 }],
  alloy: "A356.0",
  process: "lost-foam",
  pourTempC: 700,
  minSectionMm: 4,
};

async function timeDiagnosis(cookie: string): Promise<number> {
  const t0 = performance.now();
  const res = await fetch(`${origin}/api/diagnosis`, {
    method: "POST",
    headers: { "content-type": "application/json", origin, cookie },
    body: JSON.stringify(aCase),
  });
  if (res.status !== 200) throw new Error(`diagnosis answered ${res.status}: ${await res.text()}`);
  await res.arrayBuffer();
  return performance.now() - t0;
}

try {
  console.log("\nDiagnosis over HTTP (POST /api/diagnosis, warm server, signed in)");
  for (const size of sizes) {
    const t0 = performance.now();
    const shop = await benchShop(ground, size);
    const seedS = (performance.now() - t0) / 1000;
    const cookie = await signedInto(shop.shopId);
    // What any signed-in request costs here (session and shop checks, one small query), for scale.
    const floor: number[] = [];
    for (let i = 0; i < 40; i++) {
      const f0 = performance.now();
      await (await fetch(`${origin}/api/shops/current`, { headers: { origin, cookie } })).arrayBuffer();
      floor.push(performance.now() - f0);
    }
    floor.sort((a, b) => a - b);
    console.log(`    for scale, GET /api/shops/current: p50 ${ms(q(floor, 0.5))}, p95 ${ms(q(floor, 0.95))}`);
    for (let i = 0; i < 20; i++) await timeDiagnosis(cookie);
    const warm: number[] = [];
    for (let i = 0; i < 200; i++) warm.push(await timeDiagnosis(cookie));
    warm.sort((a, b) => a - b);
    const scans: number[] = [];
    for (let i = 0; i < 50; i++) {
      const s0 = performance.now();
      await oldScan(shop.shopId);
      scans.push(performance.now() - s0);
    }
    scans.sort((a, b) => a - b);
    // A write no diagnosis reads (a new, unconfirmed casting): the kept learning stays.
    const [anyCasting] = await db
      .select({ meltId: castings.meltId })
      .from(castings)
      .where(sql`shop_id = ${shop.shopId}`)
      .limit(1);
    await db
      .insert(castings)
      .values({ shopId: shop.shopId, meltId: anyCasting.meltId, partName: "Bench bracket", createdBy: shop.people[0] });
    const afterCasting = await timeDiagnosis(cookie);
    // A write it does read (a confirmation): worked out again once.
    const [target] = await db
      .select({ id: castings.id })
      .from(castings)
      .where(sql`shop_id = ${shop.shopId}`)
      .limit(1);
    await db
      .insert(confirmations)
      .values({ shopId: shop.shopId, castingId: target.id, causeId: "cold-pour", createdBy: shop.people[0] });
    const afterConfirm = await timeDiagnosis(cookie);
    const second = await timeDiagnosis(cookie);
    // What the previous design did on that first diagnosis: run every confirmed case of the shop again.
    const r0 = performance.now();
    await recomputedTallies(shop.shopId, await shopRules(shop.shopId));
    const everyCase = performance.now() - r0;
    console.log(`  ${size.toLocaleString("en")} cases (seeded in ${seedS.toFixed(0)} s):`);
    console.log(
      `    warm p50 ${ms(q(warm, 0.5))}, p95 ${ms(q(warm, 0.95))} (aim at 100,000: p95 ≤ 25 ms)` +
        `${ratio(BEFORE[size]?.warmP95, q(warm, 0.95))}; load average ${loadavg()[0].toFixed(1)}`,
    );
    console.log(
      `    first after a new casting ${ms(afterCasting)}; first after a confirmation ${ms(afterConfirm)}, then ${ms(second)} (aim ≤ 60 ms); ` +
        `running every confirmed case again, as before the tallies: ${ms(everyCase)} (${(everyCase / afterConfirm).toFixed(0)}x the first after a confirmation)`,
    );
    console.log(
      `    previous design's scan on every call: p50 ${ms(q(scans, 0.5))}, p95 ${ms(q(scans, 0.95))} ` +
        `(now one primary-key read); it also recomputed after the new casting`,
    );
  }
} finally {
  await ground.stop();
}
