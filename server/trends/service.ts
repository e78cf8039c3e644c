import { sql, type SQL } from "drizzle-orm";
import { db } from "../db";
import type { CausePoint, FixPoint, RatePoint, Trends, TrendsQuery } from "../../lib/trends-schemas";
import { causeTitles } from "../rulebook/cause-titles";

/**
 * The shop's trends, counted in PostgreSQL over its castings: one grouped query per chart, every one
 * scoped by shop_id, so another shop's castings never enter a count.
 */
function where(shopId: string, q: TrendsQuery): SQL {
  // Archived castings (or those of an archived melt) are out of the counts, as they are out of the lists.
  const parts = [sql`c.shop_id = ${shopId}`, sql`c.archived_at is null`, sql`m.archived_at is null`];
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
    from ${CASTINGS_IN_FILTERS}
    where ${where(shopId, q)} group by 1 order by 1`);
  return rows.rows.map((r) => ({ key: r.key, castings: r.castings, count: r.count }));
}

const CASTINGS_IN_FILTERS = sql`castings c join melts m on m.id = c.melt_id join alloys a on a.id = m.alloy_id`;

/** The fixes tried on castings in the filters, most tried first, with how the next casting came out. */
async function fixes(shopId: string, q: TrendsQuery): Promise<FixPoint[]> {
  const rows = await db.execute<FixPoint>(sql`
    select f.fix, count(*)::int as tried,
      (count(*) filter (where f.worked = 'yes'))::int as worked,
      (count(*) filter (where f.worked = 'partly'))::int as partly,
      (count(*) filter (where f.worked = 'no'))::int as failed,
      (count(*) filter (where f.worked is null))::int as "notJudged"
    from fixes_tried f join ${CASTINGS_IN_FILTERS} on c.id = f.casting_id
    where f.shop_id = ${shopId} and ${where(shopId, q)}
    group by f.fix order by 2 desc, 1 limit 20`);
  return rows.rows;
}

/** The causes mentors confirmed on castings in the filters: each casting's newest confirmation counts once. */
async function confirmedCauses(shopId: string, q: TrendsQuery): Promise<CausePoint[]> {
  const [rows, titles] = await Promise.all([
    db.execute<{ causeId: string | null; causeText: string | null; castings: number }>(sql`
      with newest as (
        select distinct on (k.casting_id) k.casting_id, k.cause_id, k.cause_text
        from confirmations k where k.shop_id = ${shopId} order by k.casting_id, k.id desc)
      select n.cause_id as "causeId", case when n.cause_id is null then n.cause_text end as "causeText",
        count(*)::int as castings
      from newest n join ${CASTINGS_IN_FILTERS} on c.id = n.casting_id
      where ${where(shopId, q)}
      group by 1, 2 order by 3 desc, 1, 2 limit 20`),
    causeTitles(shopId),
  ]);
  return rows.rows.map((r) => ({
    causeId: r.causeId,
    title: r.causeId ? (titles.get(r.causeId) ?? r.causeId) : (r.causeText ?? ""),
    castings: r.castings,
  }));
}

export async function shopTrends(shopId: string, q: TrendsQuery): Promise<Trends> {
  const month = sql`to_char(m.poured_on, 'YYYY-MM')`;
  const [defectBySuperheat, defectByProcess, defectByAlloy, scrapByMonth, reworkByMonth, fixPoints, causes] =
    await Promise.all([
      rates(shopId, q, SUPERHEAT_BAND, DEFECTIVE),
      rates(shopId, q, sql`m.process`, DEFECTIVE),
      rates(shopId, q, sql`a.designation`, DEFECTIVE),
      rates(shopId, q, month, sql`c.outcome = 'scrap'`),
      rates(shopId, q, month, sql`c.outcome = 'rework'`),
      fixes(shopId, q),
      confirmedCauses(shopId, q),
    ]);
  return {
    castings: defectByProcess.reduce((n, p) => n + p.castings, 0),
    defectBySuperheat,
    defectByProcess,
    defectByAlloy,
    scrapByMonth,
    reworkByMonth,
    fixes: fixPoints,
    confirmedCauses: causes,
  };
}
