import { sql, type SQL } from "drizzle-orm";
import { db } from "../db";
import type { RatePoint, Trends, TrendsQuery } from "../../lib/trends-schemas";

/**
 * The shop's trends, counted in PostgreSQL over its castings: one grouped query per chart, every one
 * scoped by shop_id, so another shop's castings never enter a count.
 */
function where(shopId: string, q: TrendsQuery): SQL {
  const parts = [sql`c.shop_id = ${shopId}`];
  if (q.from) parts.push(sql`m.poured_on >= ${q.from}`);
  if (q.to) parts.push(sql`m.poured_on <= ${q.to}`);
  if (q.process) parts.push(sql`m.process = ${q.process}`);
  if (q.alloy) parts.push(sql`upper(a.designation) = upper(${q.alloy})`);
  return sql.join(parts, sql` and `);
}

const DEFECTIVE = sql`exists (select 1 from defect_marks d where d.casting_id = c.id)`;
const SUPERHEAT_BAND = sql`case
  when m.pour_temp_c is null then 'not logged'
  when m.pour_temp_c - a.liquidus_c < 40 then 'under 40 °C'
  when m.pour_temp_c - a.liquidus_c < 60 then '40-60 °C'
  when m.pour_temp_c - a.liquidus_c < 100 then '60-100 °C'
  else '100 °C and over' end`;

async function rates(shopId: string, q: TrendsQuery, key: SQL, counted: SQL): Promise<RatePoint[]> {
  const rows = await db.execute<{ key: string; castings: number; count: number }>(sql`
    select ${key} as key, count(*)::int as castings, (count(*) filter (where ${counted}))::int as count
    from castings c join melts m on m.id = c.melt_id join alloys a on a.id = m.alloy_id
    where ${where(shopId, q)} group by 1 order by 1`);
  return rows.rows.map((r) => ({ key: r.key, castings: r.castings, count: r.count }));
}

export async function shopTrends(shopId: string, q: TrendsQuery): Promise<Trends> {
  const month = sql`to_char(m.poured_on, 'YYYY-MM')`;
  const [defectBySuperheat, defectByProcess, defectByAlloy, scrapByMonth, reworkByMonth] = await Promise.all([
    rates(shopId, q, SUPERHEAT_BAND, DEFECTIVE),
    rates(shopId, q, sql`m.process`, DEFECTIVE),
    rates(shopId, q, sql`a.designation`, DEFECTIVE),
    rates(shopId, q, month, sql`c.outcome = 'scrap'`),
    rates(shopId, q, month, sql`c.outcome = 'rework'`),
  ]);
  return {
    castings: defectByProcess.reduce((n, p) => n + p.castings, 0),
    defectBySuperheat,
    defectByProcess,
    defectByAlloy,
    scrapByMonth,
    reworkByMonth,
  };
}
