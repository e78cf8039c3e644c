/**
 * `npm run bench:rule-change`: what a change to the rulebook costs at 10,000 and 100,000 cases
 * (scripts/bench-search-data.ts, about 7 % confirmed), over HTTP on a real server and a throwaway
 * PostgreSQL, signed in as a mentor. Each request below answers with the rule's record, so it waits
 * for the calibration to follow the change (server/rulebook/calibration.ts): publishing a new rule,
 * publishing an edit of it, switching a built-in rule off and on again, and a confirmation sent while
 * a publish is being worked out. Prints `uptime` before and after (the machine is shared).
 * Sizes: `-- --sizes=10000,100000`.
 */
import { execSync } from "node:child_process";
import { performance } from "node:perf_hooks";
import { benchGround, benchShop } from "./bench-harness";
import { misrunRule } from "./fixtures/misrun-rule";

const sizesArg = process.argv.find((a) => a.startsWith("--sizes="));
const sizes = (sizesArg?.slice("--sizes=".length) ?? "10000,100000").split(",").map(Number);
const ground = await benchGround({ name: "rule-change" });
const { origin, db } = ground;
const { sql } = await import("drizzle-orm");

const ms = (t: number) => `${t.toFixed(0)} ms`;
/**
 * Before firings were kept per rule version (every confirmed case run again after any rule change,
 * tallies moved by a trigger per row), 2026-12-03 on this machine, load average about 5 to 6.
 */
type Figures = { publish: number; edit: number; off: number; on: number; confirmation: number };
const BEFORE: Record<number, Figures> = {
  10000: { publish: 1626, edit: 984, off: 935, on: 787, confirmation: 1603 },
  100000: { publish: 4688, edit: 4326, off: 4858, on: 4887, confirmation: 13047 },
};
const beside = (size: number, key: keyof Figures, now: number) => {
  const before = BEFORE[size]?.[key];
  return before === undefined ? ms(now) : `${ms(now)} (before ${ms(before)}: ${(before / now).toFixed(1)}x)`;
};
const uptime = () => execSync("uptime").toString().trim();

async function timed(cookie: string, method: string, path: string, body?: object) {
  const t0 = performance.now();
  const res = await fetch(`${origin}${path}`, {
    method,
    headers: { "content-type": "application/json", origin, cookie },
    body: body ? JSON.stringify(body) : undefined,
  });
  const text = await res.text();
  if (res.status >= 300) throw new Error(`${method} ${path} answered ${res.status}: ${text}`);
  return { t: performance.now() - t0, body: JSON.parse(text) as Record<string, unknown> };
}

try {
  console.log(`\nChanging the rulebook (over HTTP, warm server, signed in as a mentor)\n  before: ${uptime()}`);
  for (const size of sizes) {
    const shop = await benchShop(ground, size);
    const cookie = await ground.signedInto(shop.shopId, "mentor");
    const confirmed = (
      await db.execute(
        sql`select count(distinct casting_id)::int as n from confirmations where shop_id = ${shop.shopId}`,
      )
    ).rows[0] as { n: number };
    const first = await timed(cookie, "GET", "/api/rulebook");
    const made = await timed(cookie, "POST", "/api/rulebook/rules", misrunRule(60));
    const id = made.body.id as string;
    const publish = await timed(cookie, "POST", `/api/rulebook/rules/${id}/publish`);
    await timed(cookie, "PUT", `/api/rulebook/rules/${id}`, misrunRule(50));
    const edit = await timed(cookie, "POST", `/api/rulebook/rules/${id}/publish`);
    const off = await timed(cookie, "PUT", "/api/rulebook/rules/misrun-thin-wall-sand/switch", { off: true });
    const on = await timed(cookie, "PUT", "/api/rulebook/rules/misrun-thin-wall-sand/switch", { off: false });
    // A confirmation sent while a publish is being worked out.
    const [marked] = (
      await db.execute(sql`select c.id from castings c where c.shop_id = ${shop.shopId}
        and exists (select 1 from defect_marks d where d.casting_id = c.id) order by c.id limit 1`)
    ).rows as { id: number }[];
    await timed(cookie, "PUT", `/api/rulebook/rules/${id}`, misrunRule(40));
    const publishing = timed(cookie, "POST", `/api/rulebook/rules/${id}/publish`);
    await new Promise((r) => setTimeout(r, 20));
    const confirmation = await timed(cookie, "POST", `/api/review/castings/${marked.id}/confirmations`, {
      causeId: "cold-pour",
    });
    const meanwhile = await publishing;
    console.log(`  ${size.toLocaleString("en")} cases, ${confirmed.n.toLocaleString("en")} confirmed:`);
    console.log(`    first read of the rulebook (every confirmed case worked out): ${ms(first.t)}`);
    console.log(
      `    publish a new rule ${beside(size, "publish", publish.t)}; an edit of it ${beside(size, "edit", edit.t)}`,
    );
    console.log(`    switch a built-in rule off ${beside(size, "off", off.t)}, on again ${beside(size, "on", on.t)}`);
    console.log(
      `    a confirmation sent during a publish ${beside(size, "confirmation", confirmation.t)} (that publish ${ms(meanwhile.t)})`,
    );
  }
  console.log(`  after: ${uptime()}`);
} finally {
  await ground.stop();
}
