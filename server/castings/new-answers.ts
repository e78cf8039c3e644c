import { sql, type SQL } from "drizzle-orm";
import { castings } from "../../db/schema";

/**
 * Whether the casting of this row, logged by `viewer`, has a mentor's answer (a confirmation by someone
 * else) newer than the last time the viewer read it: the "new answer" mark on the caster's own lists.
 * A column of the list's own statement (one round trip for the page), on the confirmations index.
 */
export function hasNewAnswerFor(viewer: string): SQL<boolean> {
  return sql<boolean>`(${castings.createdBy} = ${viewer} and exists (
    select 1 from confirmations k
    where k.shop_id = ${castings.shopId} and k.casting_id = ${castings.id} and k.created_by <> ${viewer}
      and k.created_at > coalesce(
        (select s.seen_at from answer_seen s where s.casting_id = ${castings.id} and s.user_id = ${viewer}),
        '-infinity'::timestamptz)))`;
}
