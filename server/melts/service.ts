import { and, desc, eq, inArray, isNull, sql } from "drizzle-orm";
import { db } from "../db";
import { alloys, castings, melts, shopSettings, user } from "../../db/schema";
import {
  alloyConflicts,
  meltFields,
  meltInput,
  SHAPED_COLUMNS,
  type Melt,
  type MeltInput,
  type MeltSummary,
  type Page,
} from "../../lib/notebook-schemas";
import type { Process } from "../../rules/case";
import type { ShopMember } from "../auth/shop-access";
import { notFound, parseOr400 } from "../http/errors";
import { requireFresh, StaleRowError, type expectedVersion } from "../http/row-version";
import { requireAlloy } from "../alloys/service";
import { checkMayArchive, checkMayRestore } from "../notebook/archive";
import { meltPageIds, type MeltSort } from "./list-order";
import { iso, omit, personRef, refuseIfAny, withoutNulls, changedOnly } from "../notebook/shared";

type MeltRow = typeof melts.$inferSelect;
/** The melt's own columns that a MeltInput sets one to one (the alloy goes through the alloy table). */
const MELT_COLUMNS = Object.keys(meltFields.shape).filter((k) => k !== "alloy") as Exclude<keyof MeltInput, "alloy">[];

const archiverName = sql<string | null>`(select ${user.name} from ${user} where ${user.id} = ${melts.archivedBy})`;
const meltSelect = { m: melts, alloy: alloys.designation, byName: user.name, archiverName };
const meltQuery = () =>
  db
    .select(meltSelect)
    .from(melts)
    .innerJoin(alloys, eq(alloys.id, melts.alloyId))
    .innerJoin(user, eq(user.id, melts.createdBy));

type MeltRead = { m: MeltRow; alloy: string; byName: string; archiverName?: string | null };
export function toMelt({ m, alloy, byName, archiverName }: MeltRead): Melt {
  return {
    ...omit(m, [...SHAPED_COLUMNS, "alloyId"]),
    archivedAt: m.archivedAt ? iso(m.archivedAt) : null,
    archivedBy: m.archivedBy ? personRef(m.archivedBy, archiverName ?? "") : null,
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

/** A save sent again with the same idempotency key answers with the melt the first one made. */
export async function createMelt(m: ShopMember, input: MeltInput): Promise<Melt> {
  const values = await meltValues(m.shopId, input);
  const key = input.idempotencyKey ?? null;
  const [row] = await db
    .insert(melts)
    .values({ ...values, shopId: m.shopId, createdBy: m.userId, idempotencyKey: key })
    .onConflictDoNothing({ target: [melts.shopId, melts.idempotencyKey] })
    .returning({ id: melts.id });
  if (row) return getMelt(m.shopId, row.id);
  const [first] = await db
    .select({ id: melts.id })
    .from(melts)
    .where(and(eq(melts.shopId, m.shopId), eq(melts.idempotencyKey, key!)));
  return getMelt(m.shopId, first.id);
}

async function archiveState(shopId: string, id: number) {
  const [row] = await db
    .select({ createdBy: melts.createdBy, archivedAt: melts.archivedAt, archivedBy: melts.archivedBy })
    .from(melts)
    .where(and(eq(melts.shopId, shopId), eq(melts.id, id)));
  if (!row) throw notFound("No such melt");
  return row;
}

/** Hides the melt (and with it its castings) from the lists; nothing is deleted. */
export async function archiveMelt(m: ShopMember, id: number): Promise<Melt> {
  checkMayArchive(m, await archiveState(m.shopId, id), "melt");
  await db
    .update(melts)
    .set({ archivedAt: new Date(), archivedBy: m.userId })
    .where(and(eq(melts.shopId, m.shopId), eq(melts.id, id), isNull(melts.archivedAt)));
  return getMelt(m.shopId, id);
}

export async function restoreMelt(m: ShopMember, id: number): Promise<Melt> {
  checkMayRestore(m, await archiveState(m.shopId, id), "melt");
  await db
    .update(melts)
    .set({ archivedAt: null, archivedBy: null })
    .where(and(eq(melts.shopId, m.shopId), eq(melts.id, id)));
  return getMelt(m.shopId, id);
}

/** A PATCH is checked as the whole melt it makes, so a new alloy re-checks the stored pour temperature. */
export async function patchMelt(
  m: ShopMember,
  id: number,
  patch: Partial<MeltInput>,
  expected?: ReturnType<typeof expectedVersion>,
): Promise<Melt> {
  const current = await getMelt(m.shopId, id);
  requireFresh(expected, current);
  const merged = parseOr400(meltInput, { ...withoutNulls(current), ...patch });
  const values = await meltValues(m.shopId, merged);
  // The version in the WHERE makes check and write one step: of two saves from the same version, the
  // second finds the row already moved on and writes nothing.
  const saved = await db
    .update(melts)
    .set({
      ...changedOnly(values, patch, { alloy: ["alloyId"] }),
      updatedAt: new Date(),
      version: sql`${melts.version} + 1`,
    })
    .where(
      and(
        eq(melts.shopId, m.shopId),
        eq(melts.id, id),
        expected === undefined ? undefined : eq(melts.version, current.version),
      ),
    )
    .returning({ id: melts.id });
  if (!saved.length) throw new StaleRowError(await getMelt(m.shopId, id));
  return getMelt(m.shopId, id);
}

// Archived castings are not counted: the list shows what is in use.
const castingCount = sql<number>`(select count(*)::int from ${castings} where ${castings.meltId} = ${melts.id} and ${castings.archivedAt} is null)`;
const scrapCount = sql<number>`(select count(*)::int from ${castings} where ${castings.meltId} = ${melts.id} and ${castings.archivedAt} is null and ${castings.outcome} = 'scrap')`;

/** GET /api/melts: one page in the order asked, by keyset (melts/list-order.ts). */
export async function listMelts(
  shopId: string,
  q: { after?: string; pageSize: number; sort: MeltSort },
): Promise<Page<MeltSummary>> {
  const { ids, next } = await meltPageIds(shopId, q);
  return { items: await meltSummaries(shopId, ids), pageSize: q.pageSize, next };
}

/** The list's rows for these melts, in the order of `ids`. */
export async function meltSummaries(shopId: string, ids: number[]): Promise<MeltSummary[]> {
  if (!ids.length) return [];
  const rows = await db
    .select({ ...meltSelect, castingCount, scrapCount })
    .from(melts)
    .innerJoin(alloys, eq(alloys.id, melts.alloyId))
    .innerJoin(user, eq(user.id, melts.createdBy))
    .where(and(eq(melts.shopId, shopId), inArray(melts.id, ids)));
  const place = new Map(ids.map((id, i) => [id, i]));
  rows.sort((a, b) => place.get(a.m.id)! - place.get(b.m.id)!);
  return rows.map(({ m, alloy, byName, castingCount, scrapCount }) => ({
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
}

/** What a new melt starts from: the last melt's furnace and alloy, else the shop's defaults. */
export async function meltDefaults(shopId: string): Promise<Partial<MeltInput>> {
  const [settings] = await db.select().from(shopSettings).where(eq(shopSettings.shopId, shopId));
  const [last] = await meltQuery()
    .where(and(eq(melts.shopId, shopId), isNull(melts.archivedAt)))
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
