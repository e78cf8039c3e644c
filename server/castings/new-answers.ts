import { sql } from "drizzle-orm";
import { db } from "../db";

/**
 * Which of these castings, logged by `viewer`, have a mentor's answer (a confirmation by someone else)
 * newer than the last time the viewer read it: the "new answer" mark on the caster's own lists.
 */
export async function castingsWithNewAnswer(viewer: string, castingIds: number[]): Promise<Set<number>> {
  if (castingIds.length === 0) return new Set();
  const rows = await db.execute<{ id: number }>(sql`
    select c.id from castings c
    where c.id in (${sql.join(
      castingIds.map((id) => sql`${id}`),
      sql`, `,
    )}) and c.created_by = ${viewer}
      and exists (
        select 1 from confirmations k
        where k.casting_id = c.id and k.created_by <> ${viewer}
          and k.created_at > coalesce(
            (select s.seen_at from answer_seen s where s.casting_id = c.id and s.user_id = ${viewer}),
            '-infinity'::timestamptz))`);
  return new Set(rows.rows.map((r) => Number(r.id)));
}
