import { and, asc, eq } from "drizzle-orm";
import { db } from "../db";
import { fixTicks } from "../../db/schema";
import type { FixTickInput } from "../../lib/review-schemas";
import type { ShopMember } from "../auth/shop-access";
import { castingInShop } from "../castings/lookup";

/** The fixes to try ticked on a casting, in the order they were ticked. */
export async function ticksOf(shopId: string, castingId: number): Promise<string[]> {
  const rows = await db
    .select({ fix: fixTicks.fix })
    .from(fixTicks)
    .where(and(eq(fixTicks.shopId, shopId), eq(fixTicks.castingId, castingId)))
    .orderBy(asc(fixTicks.createdAt), asc(fixTicks.fix));
  return rows.map((r) => r.fix);
}

/** Ticks or unticks one fix; ticking twice (two taps, two people) keeps one tick. */
export async function setTick(m: ShopMember, castingId: number, { fix, ticked }: FixTickInput): Promise<string[]> {
  await castingInShop(m.shopId, castingId);
  if (ticked)
    await db.insert(fixTicks).values({ shopId: m.shopId, castingId, fix, createdBy: m.userId }).onConflictDoNothing();
  else
    await db
      .delete(fixTicks)
      .where(and(eq(fixTicks.shopId, m.shopId), eq(fixTicks.castingId, castingId), eq(fixTicks.fix, fix)));
  return ticksOf(m.shopId, castingId);
}
