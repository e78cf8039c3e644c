import { and, asc, eq } from "drizzle-orm";
import { db } from "../db";
import { photos } from "../../db/schema";
import { castingConditionRows, meltConditionRows, type ConditionRow } from "../../lib/condition-rows";
import { formatDay, formatMoment } from "../../lib/dates";
import { DEFECTS, LOCATION_LABELS, SEVERITY_LABELS } from "../../lib/defects";
import { OUTCOME_LABELS, PROCESS_LABELS } from "../../lib/labels";
import { fixesInUnits, textInUnits } from "../../lib/quantity-words";
import { reasonInUnits } from "../../lib/reason-text";
import { WORKED_LABELS } from "../../lib/review-schemas";
import type { Units } from "../../lib/units";
import { castingDetail } from "../castings/detail";
import { followups } from "../followups/service";
import { readObject } from "../photos/object-store";
import { caseReview } from "../review/service";

/** Everything the printed sheet says, in words and the reader's units, before any layout. */
export type CaseSheet = {
  partName: string;
  subtitle: string;
  photo: { jpeg: Buffer; width: number; height: number; pins: { n: number; x: number; y: number }[] } | null;
  marks: string[];
  melt: ConditionRow[];
  casting: ConditionRow[];
  diagnosedAt: string | null;
  causes: { title: string; scorePct: number; reasons: string[]; fixes: string[] }[];
  confirmed: { title: string; by: string; at: string; note: string | null } | null;
  fixes: string[];
  cautions: string[];
  notes: string | null;
};

/** The photo the sheet shows: the one with the most marks placed on it, else the first. */
async function sheetPhoto(shopId: string, castingId: number, placed: { photoId: number | null }[]) {
  const rows = await db
    .select()
    .from(photos)
    .where(and(eq(photos.shopId, shopId), eq(photos.castingId, castingId)))
    .orderBy(asc(photos.id));
  const count = (id: number) => placed.filter((m) => m.photoId === id).length;
  const best = [...rows].sort((a, b) => count(b.id) - count(a.id))[0];
  if (!best) return null;
  // A photo lost from the store, or a store not answering, leaves the sheet without it rather than failing it.
  const jpeg = await readObject(best.fileName).catch(() => null);
  return jpeg ? { id: best.id, jpeg, width: best.width, height: best.height } : null;
}

export async function caseSheet(shopId: string, castingId: number, units: Units): Promise<CaseSheet> {
  const c = await castingDetail(shopId, castingId);
  const [review, follow, photo] = await Promise.all([
    caseReview(shopId, castingId),
    followups(shopId, castingId),
    sheetPhoto(shopId, castingId, c.marks),
  ]);
  const result = c.diagnosis?.result;
  const outcome = c.outcome ? `outcome: ${OUTCOME_LABELS[c.outcome]}` : "outcome not recorded";
  return {
    partName: c.partName,
    subtitle: [formatDay(c.melt.pouredOn), c.melt.alloy, PROCESS_LABELS[c.melt.process], outcome].join(" · "),
    photo: photo && {
      ...photo,
      pins: c.marks
        .map((m, i) => ({ n: i + 1, photoId: m.photoId, x: m.x, y: m.y }))
        .filter((m) => m.photoId === photo.id && m.x !== null && m.y !== null)
        .map((m) => ({ n: m.n, x: m.x!, y: m.y! })),
    },
    marks: c.marks.map(
      (m, i) =>
        `${i + 1}. ${DEFECTS[m.type].label}, ${LOCATION_LABELS[m.location]}, ${SEVERITY_LABELS[m.severity as 1 | 2 | 3]}` +
        (m.note ? `: ${m.note}` : ""),
    ),
    melt: meltConditionRows(c.melt, units),
    casting: castingConditionRows(c, units),
    diagnosedAt: c.diagnosis ? formatMoment(c.diagnosis.createdAt) : null,
    causes: (result?.causes ?? []).slice(0, 5).map((k) => ({
      title: k.title,
      scorePct: Math.round(k.score * 100),
      reasons: k.reasons.length ? k.reasons.map((r) => reasonInUnits(r, units)) : k.because,
      fixes: fixesInUnits(k, units),
    })),
    confirmed: review.current && {
      title: review.current.causeTitle,
      by: review.current.createdBy?.name ?? "a mentor",
      at: formatMoment(review.current.createdAt),
      note: review.current.note,
    },
    fixes: follow.fixes.map((f) => {
      const next = f.next
        ? `next casting ${formatDay(f.next.pouredOn)}${f.next.outcome ? `, ${OUTCOME_LABELS[f.next.outcome]}` : ""}`
        : "no next casting linked yet";
      return `${f.fix}: ${f.worked ? WORKED_LABELS[f.worked] : "not judged yet"} (${next})`;
    }),
    // Saved results older than the quantity templates carry only their SI sentences.
    cautions: result?.cautionTemplates?.map((t) => textInUnits(t, units)) ?? result?.cautions ?? [],
    notes: c.notes,
  };
}
