import { and, asc, eq, gt, inArray, or, sql } from "drizzle-orm";
import { db } from "../db";
import { castings, fixesTried, melts, user } from "../../db/schema";
import type { CastingRef, ChainLink, FixInput, FixPatch, FixTried, Followups } from "../../lib/review-schemas";
import type { ShopMember } from "../auth/shop-access";
import { castingInShop } from "../castings/lookup";
import { HttpError, notFound } from "../http/errors";
import { requireFresh, StaleRowError, type expectedVersion } from "../http/row-version";
import { changedOnly, iso, personRef } from "../notebook/shared";
import { ticksOf } from "./ticks";

/**
 * Fixes tried after a casting and the next casting of the same part they were tried on. Linked
 * castings form a chain (A, fix, B, fix, C) that the casting page shows oldest first.
 */
type FixRow = typeof fixesTried.$inferSelect;
const CHAIN_MAX = 20;
const samePart = (a: string, b: string) => a.trim().toLowerCase() === b.trim().toLowerCase();

async function refs(ids: number[]): Promise<Map<number, CastingRef & { meltOrder: [string, number] }>> {
  if (!ids.length) return new Map();
  const rows = await db
    .select({
      id: castings.id,
      meltId: castings.meltId,
      partName: castings.partName,
      outcome: castings.outcome,
      pouredOn: melts.pouredOn,
    })
    .from(castings)
    .innerJoin(melts, eq(melts.id, castings.meltId))
    .where(inArray(castings.id, ids));
  return new Map(rows.map((r) => [r.id, { ...r, outcome: r.outcome, meltOrder: [r.pouredOn, r.meltId] }]));
}
const bare = (r: CastingRef & { meltOrder?: unknown }): CastingRef => ({
  id: r.id,
  meltId: r.meltId,
  partName: r.partName,
  pouredOn: r.pouredOn,
  outcome: r.outcome,
});

async function toFixes(rows: FixRow[]): Promise<FixTried[]> {
  const next = await refs(rows.flatMap((r) => (r.nextCastingId ? [r.nextCastingId] : [])));
  const ids = [...new Set(rows.map((r) => r.createdBy))];
  const people = ids.length
    ? await db.select({ id: user.id, name: user.name }).from(user).where(inArray(user.id, ids))
    : [];
  return rows.map((r) => {
    const n = r.nextCastingId ? next.get(r.nextCastingId) : undefined;
    return {
      id: r.id,
      castingId: r.castingId,
      fix: r.fix,
      next: n ? bare(n) : null,
      worked: r.worked,
      createdBy: personRef(r.createdBy, people.find((p) => p.id === r.createdBy)?.name ?? ""),
      createdAt: iso(r.createdAt),
      updatedAt: iso(r.updatedAt),
      version: r.version,
    };
  });
}

const fixesOf = (shopId: string, castingIds: number[]) =>
  castingIds.length
    ? db
        .select()
        .from(fixesTried)
        .where(and(eq(fixesTried.shopId, shopId), inArray(fixesTried.castingId, castingIds)))
        .orderBy(asc(fixesTried.id))
    : Promise.resolve([] as FixRow[]);

/** Castings of the same part from later melts: what a fix can be linked to. */
async function laterOfPart(shopId: string, castingId: number): Promise<CastingRef[]> {
  const c = await castingInShop(shopId, castingId);
  const [m] = await db.select({ pouredOn: melts.pouredOn }).from(melts).where(eq(melts.id, c.meltId));
  const rows = await db
    .select({
      id: castings.id,
      meltId: castings.meltId,
      partName: castings.partName,
      outcome: castings.outcome,
      pouredOn: melts.pouredOn,
    })
    .from(castings)
    .innerJoin(melts, eq(melts.id, castings.meltId))
    .where(
      and(
        eq(castings.shopId, shopId),
        sql`lower(trim(${castings.partName})) = ${c.partName.trim().toLowerCase()}`,
        or(gt(melts.pouredOn, m.pouredOn), and(eq(melts.pouredOn, m.pouredOn), gt(melts.id, c.meltId))),
      ),
    )
    .orderBy(asc(melts.pouredOn), asc(melts.id), asc(castings.id))
    .limit(50);
  return rows.map((r) => ({ ...r, outcome: r.outcome }));
}

/** Walks the links back to the first casting and forward to the last, each step once. */
async function chainOf(shopId: string, castingId: number): Promise<ChainLink[]> {
  const seen = new Set([castingId]);
  const back: number[] = [];
  for (let at = castingId; back.length < CHAIN_MAX;) {
    const [prev] = await db
      .select({ id: fixesTried.castingId })
      .from(fixesTried)
      .where(and(eq(fixesTried.shopId, shopId), eq(fixesTried.nextCastingId, at)))
      .orderBy(asc(fixesTried.id))
      .limit(1);
    if (!prev || seen.has(prev.id)) break;
    seen.add(prev.id);
    back.unshift((at = prev.id));
  }
  const forward: number[] = [];
  for (let at = castingId; forward.length < CHAIN_MAX;) {
    const [next] = await db
      .select({ id: fixesTried.nextCastingId })
      .from(fixesTried)
      .where(
        and(eq(fixesTried.shopId, shopId), eq(fixesTried.castingId, at), sql`${fixesTried.nextCastingId} is not null`),
      )
      .orderBy(asc(fixesTried.id))
      .limit(1);
    if (!next?.id || seen.has(next.id)) break;
    seen.add(next.id);
    forward.push((at = next.id));
  }
  const ids = [...back, castingId, ...forward];
  if (ids.length === 1) return [];
  const [casts, fixes] = await Promise.all([refs(ids), fixesOf(shopId, ids).then(toFixes)]);
  return ids.map((id) => ({
    casting: bare(casts.get(id)!),
    fixes: fixes.filter((f) => f.castingId === id),
    current: id === castingId,
  }));
}

export async function followups(shopId: string, castingId: number): Promise<Followups> {
  const candidates = await laterOfPart(shopId, castingId);
  const [fixes, chain, ticked] = await Promise.all([
    fixesOf(shopId, [castingId]).then(toFixes),
    chainOf(shopId, castingId),
    ticksOf(shopId, castingId),
  ]);
  return { fixes, chain, candidates, ticked };
}

/** The next casting must be this shop's, of the same part, from a later melt. */
async function checkNext(shopId: string, castingId: number, nextId: number | null | undefined) {
  if (nextId == null) return;
  const later = await laterOfPart(shopId, castingId);
  if (later.some((c) => c.id === nextId)) return;
  const [n] = await db
    .select({ partName: castings.partName })
    .from(castings)
    .where(and(eq(castings.shopId, shopId), eq(castings.id, nextId)));
  const [c] = await db.select({ partName: castings.partName }).from(castings).where(eq(castings.id, castingId));
  const message = !n
    ? "no such casting in this shop"
    : !samePart(n.partName, c.partName)
      ? "not a casting of the same part"
      : "not from a later melt";
  throw new HttpError(400, "Some values need fixing.", { nextCastingId: message });
}

export async function addFix(m: ShopMember, castingId: number, input: FixInput): Promise<FixTried> {
  await castingInShop(m.shopId, castingId);
  await checkNext(m.shopId, castingId, input.nextCastingId);
  const [row] = await db
    .insert(fixesTried)
    .values({
      shopId: m.shopId,
      castingId,
      fix: input.fix,
      nextCastingId: input.nextCastingId ?? null,
      worked: input.worked ?? null,
      createdBy: m.userId,
      updatedBy: m.userId,
    })
    .returning();
  return (await toFixes([row]))[0];
}

async function fixInShop(shopId: string, id: number): Promise<FixRow> {
  const [row] = await db
    .select()
    .from(fixesTried)
    .where(and(eq(fixesTried.shopId, shopId), eq(fixesTried.id, id)));
  if (!row) throw notFound("No such fix");
  return row;
}

export async function patchFix(
  m: ShopMember,
  id: number,
  patch: FixPatch,
  expected?: ReturnType<typeof expectedVersion>,
): Promise<FixTried> {
  const row = await fixInShop(m.shopId, id);
  requireFresh(expected, row);
  const merged = { ...row, ...Object.fromEntries(Object.entries(patch).filter(([, v]) => v !== undefined)) } as FixRow;
  if (patch.nextCastingId !== undefined) await checkNext(m.shopId, row.castingId, patch.nextCastingId);
  if (merged.worked && !merged.nextCastingId)
    throw new HttpError(400, "Some values need fixing.", { worked: "link the next casting first" });
  const [saved] = await db
    .update(fixesTried)
    .set({
      ...changedOnly({ fix: merged.fix, nextCastingId: merged.nextCastingId, worked: merged.worked }, patch),
      updatedAt: new Date(),
      updatedBy: m.userId,
      version: sql`${fixesTried.version} + 1`,
    })
    // The version in the WHERE makes check and write one step (see server/http/row-version.ts).
    .where(and(eq(fixesTried.id, id), expected === undefined ? undefined : eq(fixesTried.version, row.version)))
    .returning();
  if (!saved) throw new StaleRowError((await toFixes([await fixInShop(m.shopId, id)]))[0]);
  return (await toFixes([saved]))[0];
}
