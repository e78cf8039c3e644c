import { eq } from "drizzle-orm";
import { db } from "../db";
import { user } from "../../db/schema";
import type { CastingDetail } from "../../lib/notebook-schemas";
import { commentsOf } from "../comments/service";
import { latestSnapshot } from "./snapshots";
import { marksOf } from "../marks/service";
import { getMelt } from "../melts/service";
import { photosOf } from "../photos/service";
import { castingInShop, toCasting } from "./lookup";

/** The casting page in one answer: the casting, its melt, photos, marks, comments and latest diagnosis. */
export async function castingDetail(shopId: string, id: number): Promise<CastingDetail> {
  const c = await castingInShop(shopId, id);
  const [[who], [archiver], melt, photos, marks, comments, diagnosis] = await Promise.all([
    db.select({ name: user.name }).from(user).where(eq(user.id, c.createdBy)),
    c.archivedBy ? db.select({ name: user.name }).from(user).where(eq(user.id, c.archivedBy)) : [undefined],
    getMelt(shopId, c.meltId),
    photosOf(id),
    marksOf([id]),
    commentsOf(id),
    latestSnapshot(shopId, id),
  ]);
  return { ...toCasting(c, who.name, archiver?.name), melt, photos, marks, comments, diagnosis };
}
