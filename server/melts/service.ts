import { asc, count, desc, eq, and, sql } from "drizzle-orm";
import { db } from "../db";
import { alloys, castings, melts, shopSettings, user } from "../../db/schema";
import {
  alloyConflicts,
  meltFields,
  meltInput,
  type Melt,
  type MeltInput,
  type MeltSummary,
  type Page,
} from "../../lib/notebook-schemas";
import type { Process } from "../../rules/case";
import type { ShopMember } from "../auth/shop-access";
import { notFound, parseOr400 } from "../http/errors";
import { requireAlloy } from "../alloys/service";
import { iso, offsetOf, omit, personRef, refuseIfAny, withoutNulls, changedOnly } from "../notebook/shared";

type MeltRow = typeof melts.$inferSelect;
/** The melt's own columns that a MeltInput sets one to one (the alloy goes through the alloy table). */
const MELT_COLUMNS = Object.keys(meltFields.shape).filter((k) => k !== "alloy") as Exclude<keyof MeltInput, "alloy">[];

const meltSelect = { m: melts, alloy: alloys.designation, byName: user.name };
const meltQuery = () =>
  db
    .select(meltSelect)
    .from(melts)
    .innerJoin(alloys, eq(alloys.id, melts.alloyId))
    .innerJoin(user, eq(user.id, melts.createdBy));

export function toMelt({ m, alloy, byName }: { m: MeltRow; alloy: string; byName: string }): Melt {
  return {
    ...omit(m, ["shopId", "alloyId", "createdBy", "createdAt", "updatedAt"]),
    alloy,
    process: m.process,
    charge: m.charge,
    degassing: m.degassing,
    createdBy: personRef(m.createdBy, byName),
    createdAt: iso(m.createdAt),
    updatedAt: iso(m.updatedAt),
  };
}

export async function getMelt(shopId: string, id: number): Promise<Melt> {
  const [row] = await meltQuery().where(and(eq(melts.shopId, shopId), eq(melts.id, id)));
  if (!row) throw notFound("No such melt");
  return toMelt(row);
}

/** Every column from the validated input, with absent values written as null (a PATCH can clear). */
async function meltValues(shopId: string, input: MeltInput) {
  const alloy = await requireAlloy(shopId, input.alloy);
  refuseIfAny(alloyConflicts(input, alloy));
  return { ...Object.fromEntries(MELT_COLUMNS.map((k) => [k, input[k] ?? null])), alloyId: alloy.id } as Omit<
    typeof melts.$inferInsert,
    "shopId" | "createdBy"
  >;
}

export async function createMelt(m: ShopMember, input: MeltInput): Promise<Melt> {
  const values = await meltValues(m.shopId, input);
  const [row] = await db
    .insert(melts)
    .values({ ...values, shopId: m.shopId, createdBy: m.userId })
    .returning();
  return getMelt(m.shopId, row.id);
}

/** A PATCH is checked as the whole melt it makes, so a new alloy re-checks the stored pour temperature. */
export async function patchMelt(m: ShopMember, id: number, patch: Partial<MeltInput>): Promise<Melt> {
  const current = await getMelt(m.shopId, id);
  const merged = parseOr400(meltInput, { ...withoutNulls(current), ...patch });
  const values = await meltValues(m.shopId, merged);
  await db
    .update(melts)
    .set({ ...changedOnly(values, patch, { alloy: ["alloyId"] }), updatedAt: new Date() })
    .where(and(eq(melts.shopId, m.shopId), eq(melts.id, id)));
  return getMelt(m.shopId, id);
}

const castingCount = sql<number>`(select count(*)::int from ${castings} where ${castings.meltId} = ${melts.id})`;
const scrapCount = sql<number>`(select count(*)::int from ${castings} where ${castings.meltId} = ${melts.id} and ${castings.outcome} = 'scrap')`;
const MELT_ORDER = {
  "date-desc": [desc(melts.pouredOn), desc(melts.id)],
  "date-asc": [asc(melts.pouredOn), asc(melts.id)],
  alloy: [asc(alloys.designation), desc(melts.pouredOn), desc(melts.id)],
  castings: [desc(castingCount), desc(melts.pouredOn), desc(melts.id)],
};

export async function listMelts(
  shopId: string,
  q: { page: number; pageSize: number; sort: keyof typeof MELT_ORDER },
): Promise<Page<MeltSummary>> {
  const rows = await db
    .select({ ...meltSelect, castingCount, scrapCount })
    .from(melts)
    .innerJoin(alloys, eq(alloys.id, melts.alloyId))
    .innerJoin(user, eq(user.id, melts.createdBy))
    .where(eq(melts.shopId, shopId))
    .orderBy(...MELT_ORDER[q.sort])
    .limit(q.pageSize)
    .offset(offsetOf(q));
  const [{ total }] = await db.select({ total: count() }).from(melts).where(eq(melts.shopId, shopId));
  const items = rows.map(({ m, alloy, byName, castingCount, scrapCount }) => ({
    id: m.id,
    pouredOn: m.pouredOn,
    alloy,
    process: m.process,
    furnace: m.furnace,
    pourTempC: m.pourTempC,
    castingCount,
    scrapCount,
    createdBy: personRef(m.createdBy, byName),
    createdAt: iso(m.createdAt),
  }));
  return { items, total, page: q.page, pageSize: q.pageSize };
}

/** What a new melt starts from: the last melt's furnace and alloy, else the shop's defaults. */
export async function meltDefaults(shopId: string): Promise<Partial<MeltInput>> {
  const [settings] = await db.select().from(shopSettings).where(eq(shopSettings.shopId, shopId));
  const [last] = await meltQuery()
    .where(eq(melts.shopId, shopId))
    .orderBy(desc(melts.createdAt), desc(melts.id))
    .limit(1);
  const out: Partial<MeltInput> = {};
  const alloy = last?.alloy ?? settings?.defaultAlloy;
  const process = (settings?.defaultProcess ?? last?.m.process) as Process | undefined;
  if (alloy) out.alloy = alloy;
  if (process) out.process = process;
  if (last?.m.furnace) out.furnace = last.m.furnace;
  return out;
}
