import { asc, eq, isNull, or, sql } from "drizzle-orm";
import { db } from "../db";
import { alloys, user } from "../../db/schema";
import type { Alloy, AlloyInput } from "../../lib/notebook-schemas";
import { BUILT_IN_ALLOYS, type AlloySpec } from "../../rules/alloys";
import { HttpError } from "../http/errors";
import { iso, isUniqueViolation, omit, personRef } from "../notebook/shared";

/** As rules/alloys.ts compares designations: case and spaces do not matter. */
export const designationKey = (d: string) => d.trim().toUpperCase().replace(/\s+/g, "");

type AlloyRow = typeof alloys.$inferSelect;

let builtInsReady: Promise<void> | undefined;
/**
 * The built-in alloys live in rules/alloys.ts; the table mirrors them (shop null) so melts can point
 * at a row. Upserted once per process, so a corrected figure in the code reaches the table.
 */
export function ensureBuiltInAlloys(): Promise<void> {
  builtInsReady ??= (async () => {
    for (const a of BUILT_IN_ALLOYS) {
      const values = {
        designation: a.designation,
        designationKey: designationKey(a.designation),
        family: a.family,
        solidusC: a.solidusC,
        liquidusC: a.liquidusC,
        densityKgM3: a.densityKgM3,
        shrinkAllowancePct: a.shrinkAllowancePct,
        siliconPct: a.siliconPct ?? null,
        sources: a.sources,
      };
      const figures = omit(values, ["designation", "designationKey"]);
      await db
        .insert(alloys)
        .values(values)
        .onConflictDoUpdate({ target: [alloys.shopId, alloys.designationKey], set: figures });
    }
  })().catch((err) => {
    builtInsReady = undefined; // try again on the next request rather than failing forever
    throw err;
  });
  return builtInsReady;
}

/** Built-ins first, then the shop's own, each by designation. */
export async function alloyRowsFor(shopId: string) {
  await ensureBuiltInAlloys();
  return db
    .select({ a: alloys, byName: user.name })
    .from(alloys)
    .leftJoin(user, eq(user.id, alloys.createdBy))
    .where(or(isNull(alloys.shopId), eq(alloys.shopId, shopId)))
    .orderBy(sql`${alloys.shopId} is not null`, asc(alloys.designation));
}

export const toAlloy = ({ a, byName }: { a: AlloyRow; byName: string | null }): Alloy => ({
  id: a.id,
  designation: a.designation,
  family: a.family,
  solidusC: a.solidusC,
  liquidusC: a.liquidusC,
  densityKgM3: a.densityKgM3,
  shrinkAllowancePct: a.shrinkAllowancePct,
  siliconPct: a.siliconPct,
  sources: a.sources,
  builtIn: a.shopId === null,
  createdBy: a.createdBy ? personRef(a.createdBy, byName ?? "") : null,
  createdAt: iso(a.createdAt),
});

export const toAlloySpec = (a: AlloyRow): AlloySpec => ({
  designation: a.designation,
  family: a.family,
  solidusC: a.solidusC,
  liquidusC: a.liquidusC,
  densityKgM3: a.densityKgM3,
  shrinkAllowancePct: a.shrinkAllowancePct,
  siliconPct: a.siliconPct ?? undefined,
  sources: a.sources,
});

/**
 * The alloy a person means, among the built-ins and the shop's own. "A356" finds "A356.0", as people
 * write it; a shop's own alloy of the same name wins over a built-in.
 */
export async function findAlloy(shopId: string, designation: string) {
  const rows = (await alloyRowsFor(shopId)).map((r) => r.a);
  const wanted = designationKey(designation);
  const match = (key: string) =>
    rows.find((a) => a.designationKey === key && a.shopId !== null) ?? rows.find((a) => a.designationKey === key);
  return {
    alloy: wanted ? (match(wanted) ?? match(`${wanted}.0`)) : undefined,
    accepted: rows.map((a) => a.designation),
  };
}

/** The alloy row or a 400 on `field` that lists what the shop may choose. */
export async function requireAlloy(shopId: string, designation: string, field = "alloy") {
  const { alloy, accepted } = await findAlloy(shopId, designation);
  if (!alloy) {
    const message = `Unknown alloy "${designation}". Accepted: ${accepted.join(", ")}`;
    throw new HttpError(400, message, { [field]: `must be one of: ${accepted.join(", ")}` });
  }
  return alloy;
}

export async function addAlloy(shopId: string, userId: string, input: AlloyInput) {
  const key = designationKey(input.designation);
  const taken = (await alloyRowsFor(shopId)).some((r) => r.a.designationKey === key);
  if (taken) throw new HttpError(400, "Some values need fixing.", { designation: "already in the alloy table" });
  const [row] = await db
    .insert(alloys)
    .values({ ...input, siliconPct: input.siliconPct ?? null, designationKey: key, shopId, createdBy: userId })
    .returning()
    .catch((err) => {
      // Two people adding the same alloy at once: the unique index answers for the slower one.
      if (isUniqueViolation(err))
        throw new HttpError(400, "Some values need fixing.", { designation: "already in the alloy table" });
      throw err;
    });
  const [who] = await db.select({ name: user.name }).from(user).where(eq(user.id, userId));
  return toAlloy({ a: row, byName: who?.name ?? null });
}
