import { sql } from "drizzle-orm";
import { randomUUID } from "node:crypto";
import type { Db } from "../db/client";
import {
  alloys,
  castings,
  comments,
  confirmations,
  defectMarks,
  diagnosisSnapshots,
  fixesTried,
  melts,
  member,
  user,
} from "../db/schema";
import { BUILT_IN_ALLOYS, metalOf } from "../rules/alloys";
import { DEFECT_LOCATIONS, DEFECT_TYPES, DEGASSING_METHODS, PROCESSES } from "../rules/case";
import { BUILT_IN_RULE_SET } from "../rules/knowledge-base";
import { rng } from "./seeded-random";

/**
 * A synthetic casebook for `npm run bench:search`: a shop with a few people, about three castings
 * per melt, marks on most bad castings, free-text notes on most castings, comments on a quarter,
 * a stored diagnosis on a third, a few confirmations and fixes. The notes are not templates: words
 * are drawn from a vocabulary of about 5,000 (trade words first, then made-up ones) with Zipf's
 * law (frequency ~ 1 / rank), with slips of the pen and numbers with units, as people write.
 * Seeded, so every run searches the same cases. Rows go in by multi-row INSERT, not the HTTP API.
 */
const PARTS = [
  "Ribbed cover plate",
  "Impeller",
  "Pump housing",
  "Bracket",
  "Valve body",
  "Gearbox lid",
  "Manifold",
  "Pulley",
  "Flywheel",
  "Intake elbow",
  "Bell housing",
  "Tiller arm",
  "Lamp base",
  "Door knocker",
  "Engine mount",
  "Sprocket",
  "Bearing cap",
  "Oil pan",
  "Heat sink",
  "Propeller",
  "Trophy base",
  "Anvil horn",
  "Mould box corner",
  "Hinge",
  "Nameplate",
  "Skillet",
];
const TRADE = `the a and was at of to in on it not too after with from for by then again pour poured pouring
  sand mould mold core flask cope drag sprue runner gate riser vent vents ladle crucible furnace melt metal
  aluminium aluminum bronze brass iron a356 319 lm25 scrap ingot charge flux skimmed dross oxide slag
  porosity pinholes gas bubbles shrink shrinkage cavity misrun cold shut lap fold crack cracked tear hot
  wet damp dry moisture coating coat coats wash foam glue pattern plate ribs rib boss fillet wall thin thick
  section corner edge top bottom side near far fill filled slow fast short long degas degassed argon rotary
  tablet lance preheat preheated temperature lip ramp hotter colder warmer higher lower minutes seconds
  surface rough smooth finish machining machined cut sawn blast shakeout knockout cooled quench
  housing bracket impeller pulley manifold lid valve body cover pump wheel arm base mount cap
  shift shifted mismatch swell buckle scab blister sink erosion washout penetration burn burnt
  green bake binder resin clay bentonite olivine silica zircon permeability ramming rammed loose hard
  check checked try tried next time same last week morning afternoon again better worse fine ok good bad
  looks seems probably maybe because when where under over inside outside around through between`
  .split(/\s+/)
  .filter(Boolean);
const SYLLABLES = "ka ro mi tu se la no vi pe da fo ri zu ne ga bo li ta me so ku wa ha ze".split(" ");

/** About 5,000 distinct words, trade words at the top ranks. */
function vocabulary(r: () => number): string[] {
  const words = new Set(TRADE);
  while (words.size < 5000) {
    const n = 2 + Math.floor(r() * 3);
    words.add(Array.from({ length: n }, () => SYLLABLES[Math.floor(r() * SYLLABLES.length)]).join(""));
  }
  return [...words];
}

/** Free text from a Zipf-distributed vocabulary, with slips (4 % of words) and numbers (7 %). */
export function textMaker(r: () => number) {
  const words = vocabulary(r);
  const cumulative: number[] = [];
  let sum = 0;
  for (let k = 1; k <= words.length; k++) cumulative.push((sum += 1 / Math.pow(k, 1.05)));
  const zipf = () => {
    const x = r() * sum;
    let lo = 0;
    let hi = cumulative.length - 1;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (cumulative[mid] < x) lo = mid + 1;
      else hi = mid;
    }
    return words[lo];
  };
  const slip = (w: string) => {
    if (w.length < 4) return w;
    const i = 1 + Math.floor(r() * (w.length - 2));
    const k = r();
    if (k < 0.33) return w.slice(0, i) + w[i + 1] + w[i] + w.slice(i + 2); // swapped letters
    if (k < 0.66) return w.slice(0, i) + w.slice(i + 1); // a letter dropped
    return w.slice(0, i) + w[i] + w.slice(i); // a letter doubled
  };
  const number = () => {
    const k = r();
    if (k < 0.4) return `${640 + Math.floor(r() * 160)} °C`;
    if (k < 0.7) return `${1 + Math.floor(r() * 30)} min`;
    return `${(1 + r() * 20).toFixed(1)} mm`;
  };
  const sentence = () => {
    const n = 4 + Math.floor(r() * 18);
    const out: string[] = [];
    for (let i = 0; i < n; i++) {
      const k = r();
      out.push(k < 0.07 ? number() : k < 0.11 ? slip(zipf()) : zipf());
    }
    const s = out.join(" ");
    return s[0].toUpperCase() + s.slice(1) + (r() < 0.8 ? "." : ",");
  };
  return (sentences: number) => Array.from({ length: sentences }, sentence).join(" ");
}

export type Seeded = { shopId: string; people: string[]; count: number };

/**
 * Seeds `count` cases into the shop `shopId` (made through the HTTP API, so a person can sign in to
 * it) with `owner` and four more people. The caller turns the search triggers off for the bulk rows
 * and builds the documents after (buildDocuments), as a large import would.
 */
export async function seedShop(db: Db, count: number, seed: number, shopId: string, owner: string): Promise<Seeded> {
  const r = rng(seed);
  const pick = <T>(xs: readonly T[]) => xs[Math.floor(r() * xs.length)];
  const int = (lo: number, hi: number) => lo + Math.floor(r() * (hi - lo + 1));
  const write = textMaker(r);
  const others = Array.from({ length: 4 }, () => randomUUID());
  const people = [owner, ...others];
  await db.insert(user).values(
    others.map((id, i) => ({
      id,
      name: `Bench person ${i + 1}`,
      email: `${id}@bench.example`,
      emailVerified: true,
      createdAt: new Date(),
      updatedAt: new Date(),
    })),
  );
  await db.insert(member).values(
    others.map((userId) => ({
      id: randomUUID(),
      organizationId: shopId,
      userId,
      role: "caster",
      createdAt: new Date(),
    })),
  );
  const alloyRows = await db
    .select({ id: alloys.id, designation: alloys.designation, liquidusC: alloys.liquidusC })
    .from(alloys);
  const aluminium = alloyRows.filter(
    (a) => metalOf(BUILT_IN_ALLOYS.find((b) => b.designation === a.designation)?.family ?? "al-si") === "aluminium",
  );

  const meltIds: number[] = [];
  for (const chunk of chunks(Math.ceil(count / 3), 4000)) {
    const rows = chunk.map(() => {
      const a = r() < 0.9 ? pick(aluminium) : pick(alloyRows);
      const day = new Date(Date.UTC(2016, 0, 1) + int(0, 3650) * 86400_000).toISOString().slice(0, 10);
      return {
        shopId,
        alloyId: a.id,
        pouredOn: day,
        process: pick(PROCESSES),
        pourTempC: a.liquidusC + int(40, 220),
        meltTempC: a.liquidusC + int(240, 280),
        degassing: pick(DEGASSING_METHODS),
        notes: r() < 0.3 ? write(int(1, 2)) : null,
        createdBy: pick(people),
      };
    });
    meltIds.push(...(await db.insert(melts).values(rows).returning({ id: melts.id })).map((m) => m.id));
  }
  const causes = BUILT_IN_RULE_SET.causes;
  for (const chunk of chunks(count, 4000)) {
    const rows = chunk.map(() => {
      const outcome = pick(["good", "good", "good", "rework", "scrap", "scrap"] as const);
      return {
        shopId,
        meltId: pick(meltIds),
        partName: pick(PARTS),
        pattern: r() < 0.5 ? `P-${int(1, 40)}` : null,
        outcome,
        minSectionMm: int(2, 12),
        maxSectionMm: int(12, 60),
        notes: r() < 0.6 ? write(int(1, 3)) : null,
        createdBy: pick(people),
      };
    });
    const ids = (await db.insert(castings).values(rows).returning({ id: castings.id })).map((c) => c.id);
    const marks = ids.flatMap((castingId, i) =>
      Array.from({ length: rows[i].outcome === "good" ? (r() < 0.1 ? 1 : 0) : int(1, 3) }, () => ({
        shopId,
        castingId,
        type: pick(DEFECT_TYPES),
        location: pick(DEFECT_LOCATIONS),
        severity: int(1, 3),
        note: r() < 0.3 ? write(1) : null,
        createdBy: rows[i].createdBy,
      })),
    );
    const talk = ids
      .filter(() => r() < 0.25)
      .flatMap((castingId) =>
        Array.from({ length: int(1, 3) }, () => ({
          shopId,
          castingId,
          body: write(int(1, 2)),
          createdBy: pick(people),
        })),
      );
    const diagnosed = ids.filter((_, i) => rows[i].outcome !== "good" && r() < 0.5);
    const snapshots = diagnosed.map((castingId) => ({
      shopId,
      castingId,
      ruleSetVersion: "bench",
      input: {},
      createdBy: pick(people),
      result: {
        causes: [pick(causes), pick(causes), pick(causes)].map((c, k) => ({
          ...c,
          score: 0.8 - k * 0.2,
          because: ["a condition that matched"],
          sources: ["common practice"],
        })),
        facts: {},
        cautions: [],
        missing: [],
      },
    }));
    const confirmed = diagnosed
      .filter(() => r() < 0.15)
      .map((castingId) => ({ shopId, castingId, causeId: pick(causes).id, createdBy: people[0] }));
    const fixed = confirmed
      .filter(() => r() < 0.5)
      .map((c) => ({
        shopId,
        castingId: c.castingId,
        fix: pick(pick(causes).fixes),
        worked: pick(["yes", "partly", "no"]),
        nextCastingId: pick(ids),
        createdBy: pick(people),
        updatedBy: people[0],
      }));
    for (const [table, values] of [
      [defectMarks, marks],
      [comments, talk],
      [diagnosisSnapshots, snapshots],
      [confirmations, confirmed],
      [fixesTried, fixed],
    ] as const) {
      for (const part of chunks(values.length, 4000))
        if (part.length) await db.insert(table).values(part.map((i) => values[i]) as never);
    }
  }
  return { shopId, people, count };
}

function chunks(n: number, size: number): number[][] {
  const out: number[][] = [];
  for (let i = 0; i < n; i += size) out.push(Array.from({ length: Math.min(size, n - i) }, (_, k) => i + k));
  return out;
}

/** The documents of the shop's castings, built in batches by the same function the triggers call. */
export async function buildDocuments(db: Db, shopId: string) {
  const { rows } = await db.execute<{ id: number }>(sql`select id from castings where shop_id = ${shopId} order by id`);
  for (const part of chunks(rows.length, 5000))
    await db.execute(sql`select search_refresh(${sql.param(part.map((i) => rows[i].id))}::int[])`);
}
