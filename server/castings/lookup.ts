import { and, eq } from "drizzle-orm";
import { db } from "../db";
import { castings } from "../../db/schema";
import { SHAPED_COLUMNS, type Casting } from "../../lib/notebook-schemas";
import { notFound } from "../http/errors";
import { iso, omit, personRef } from "../notebook/shared";

export type CastingRow = typeof castings.$inferSelect;
type Tx = Parameters<Parameters<typeof db.transaction>[0]>[0];

/** The casting if it belongs to this shop; any other id, including another shop's, is a 404. */
export async function castingInShop(shopId: string, id: number, tx: Tx | typeof db = db): Promise<CastingRow> {
  const [row] = await tx
    .select()
    .from(castings)
    .where(and(eq(castings.shopId, shopId), eq(castings.id, id)));
  if (!row) throw notFound("No such casting");
  return row;
}

/** `archiverName` is the name of whoever archived it, when it is archived. */
export function toCasting(c: CastingRow, byName: string, archiverName = ""): Casting {
  return {
    ...omit(c, SHAPED_COLUMNS),
    archivedAt: c.archivedAt ? iso(c.archivedAt) : null,
    archivedBy: c.archivedBy ? personRef(c.archivedBy, archiverName) : null,
    outcome: c.outcome,
    createdBy: personRef(c.createdBy, byName),
    createdAt: iso(c.createdAt),
    updatedAt: iso(c.updatedAt),
  };
}
