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
  organization,
  user,
} from "../db/schema";
import { BUILT_IN_ALLOYS, metalOf } from "../rules/alloys";
import { DEFECT_LOCATIONS, DEFECT_TYPES, DEGASSING_METHODS, PROCESSES } from "../rules/case";
import { BUILT_IN_RULE_SET } from "../rules/knowledge-base";
import { rng } from "./seeded-random";

/**
 * A synthetic casebook for `npm run bench:search`: a shop with a few people, about three castings
 * per melt, marks on most bad castings, notes on half, comments on a fifth, a stored diagnosis on
 * a third, a few confirmations and fixes. Seeded, so every run searches the same cases.
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
const NOTES = [
  "Far corner never filled",
  "Sprue too short, slow pour",
  "Sand was damp after the rain",
  "Pinholes after machining",
  "Ladle preheated {n} min",
  "Poured at {t} °C at the lip",
  "Flask shifted during the pour",
  "Coating still wet in the pockets",
  "Gas bubbles on the riser top",
  "Skimmed twice, dross still got in",
  "Foam glue seam showed on the casting",
  "Vents blocked by sand",
  "Cracked at the fillet after shakeout",
  "Shrink cavity under the riser neck",
  "Overflow at the top helped",
  "Degassed {n} min with argon",
  "Mixed scrap charge, lots of dross",
  "Thin ribs {m} mm did not fill",
  "Cold morning, {t} °C in the shop",
];
const COMMENTS = [
  "Looks like a cold shut where the fronts met",
  "Try pouring hotter next time",
  "Check the sand moisture before moulding",
  "Same as last week's plate",
  "I would add a riser on the boss",
  "Degas longer, the melt was gassy",
  "Nice fill this time",
  "Move the gate to the thick end",
  "Dry the coating overnight",
  "Rough surface from coarse sand",
];

export type Seeded = { shopId: string; people: string[]; count: number };

export async function seedShop(db: Db, count: number, seed: number): Promise<Seeded> {
  const r = rng(seed);
  const pick = <T>(xs: readonly T[]) => xs[Math.floor(r() * xs.length)];
  const int = (lo: number, hi: number) => lo + Math.floor(r() * (hi - lo + 1));
  const fill = (s: string) =>
    s
      .replace("{n}", String(int(2, 20)))
      .replace("{t}", String(int(640, 780)))
      .replace("{m}", String(int(2, 8)));
  const shopId = randomUUID();
  await db
    .insert(organization)
    .values({ id: shopId, name: `Bench shop ${count}`, slug: `bench-${shopId}`, createdAt: new Date() });
  const people = Array.from({ length: 5 }, () => randomUUID());
  await db.insert(user).values(
    people.map((id, i) => ({
      id,
      name: `Bench person ${i + 1}`,
      email: `${id}@bench.example`,
      emailVerified: true,
      createdAt: new Date(),
      updatedAt: new Date(),
    })),
  );
  await db.insert(member).values(
    people.map((userId, i) => ({
      id: randomUUID(),
      organizationId: shopId,
      userId,
      role: i ? "caster" : "owner",
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
        notes: r() < 0.2 ? fill(pick(NOTES)) : null,
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
        notes:
          r() < 0.5 ? [fill(pick(NOTES)), r() < 0.4 ? fill(pick(NOTES)) : ""].join(". ").replace(/\. $/, "") : null,
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
        createdBy: rows[i].createdBy,
      })),
    );
    const talk = ids
      .filter(() => r() < 0.2)
      .flatMap((castingId) =>
        Array.from({ length: int(1, 2) }, () => ({ shopId, castingId, body: pick(COMMENTS), createdBy: pick(people) })),
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
