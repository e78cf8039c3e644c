import type { ReasonPart } from "../../lib/search-schemas";
import { DEFECT_LOCATIONS, DEFECT_TYPES } from "../../rules/case";
import type { CaseSummary } from "../../lib/search-schemas";
import type { DefectLocation, DefectType } from "../../rules/case";

/**
 * "Cases like this one": past castings with the same defects (type, then location) poured under
 * similar conditions (process, alloy, superheat, degassing, thinnest section). Among cases alike
 * enough, the ones whose cause a mentor confirmed and whose fix worked come first: those are the
 * ones that teach something. The weights are our judgement, not a published figure.
 */
export type SimilarInput = Pick<
  CaseSummary,
  "id" | "pouredOn" | "defects" | "process" | "alloy" | "cause" | "fixWorked"
> & {
  defectMask: number;
  /** Each mark as type index * 16 + location index (rules/case.ts lists), for quick comparing. */
  markCodes: number[];
  alloyKey: string;
  alloyFamily: string;
  superheatC: number | null;
  degassing: string | null;
  minSectionMm: number | null;
};
export const defectBit = (t: DefectType) => 1 << DEFECT_TYPES.indexOf(t);
export const markCode = (t: DefectType, l: DefectLocation) =>
  DEFECT_TYPES.indexOf(t) * 16 + DEFECT_LOCATIONS.indexOf(l);
export type Similar<T> = { doc: T; similarity: number; parts: ReasonPart[] };

const WEIGHTS = { defects: 0.5, process: 0.15, alloy: 0.1, superheat: 0.1, degassing: 0.05, section: 0.1 };
/** Below this a case is only loosely alike, and a confirmed cause no longer lifts it above closer ones. */
export const ALIKE_MIN = 0.35;
/** Superheat counts fully when equal and not at all 60 °C apart; about the spread of pour windows for one process. */
const SUPERHEAT_SPAN_C = 60;

/** How much a case teaches: 2 = confirmed cause and a fix that worked, 1 = either, 0 = neither. */
export const teaches = (c: Pick<SimilarInput, "cause" | "fixWorked">) =>
  (c.cause?.confirmed ? 1 : 0) + (c.fixWorked === "yes" ? 1 : 0);
const bits = (m: number) => {
  let n = 0;
  for (; m; m &= m - 1) n++;
  return n;
};

/** For each defect type, the locations the target was marked at (bit per DEFECT_LOCATIONS). */
export function placesOf(markCodes: readonly number[]): Int32Array {
  const places = new Int32Array(DEFECT_TYPES.length);
  for (const code of markCodes) places[code >> 4] |= 1 << (code & 15);
  return places;
}
/** Types of `codes` marked at a place the target also had that type. */
function samePlaces(places: Int32Array, codes: readonly number[]): number {
  let same = 0;
  for (const code of codes) if ((places[code >> 4] >> (code & 15)) & 1) same |= 1 << (code >> 4);
  return same;
}
/** Shared types count 1 at the same place, 0.6 elsewhere, over every type either case has. */
export function defectShare(targetMask: number, otherMask: number, samePlace: number): number {
  const union = bits(targetMask | otherMask);
  return union ? (WEIGHTS.defects * (bits(samePlace) + 0.6 * bits(targetMask & otherMask & ~samePlace))) / union : 0;
}
/** The conditions' share; unknown numbers are NaN and count nothing. */
export function conditionShare(
  sameProcess: boolean,
  sameAlloy: boolean,
  sameFamily: boolean,
  superheatDelta: number,
  sameDegassing: boolean,
  sectionRatio: number,
): number {
  let s = sameProcess ? WEIGHTS.process : 0;
  if (sameAlloy || sameFamily) s += WEIGHTS.alloy * (sameAlloy ? 1 : 0.5);
  if (!Number.isNaN(superheatDelta))
    s += WEIGHTS.superheat * Math.max(0, 1 - Math.abs(superheatDelta) / SUPERHEAT_SPAN_C);
  if (sameDegassing) s += WEIGHTS.degassing;
  if (!Number.isNaN(sectionRatio)) s += WEIGHTS.section * (sectionRatio <= 1.25 ? 1 : sectionRatio <= 2 ? 0.5 : 0);
  return s;
}
export const likenessOf = (defects: number, conditions: number) => Math.round((defects + conditions) * 1000) / 1000;
export const ratioOf = (a: number | null, b: number | null) => (a && b ? Math.max(a, b) / Math.min(a, b) : NaN);

/** How alike `other` is to `t` (0-1), and why, case by case. */
export function likeness(t: SimilarInput, other: SimilarInput, parts?: ReasonPart[]): number {
  const places = placesOf(t.markCodes);
  const same = samePlaces(places, other.markCodes);
  const shared = t.defectMask & other.defectMask;
  const delta = t.superheatC !== null && other.superheatC !== null ? other.superheatC - t.superheatC : NaN;
  const sameAlloy = t.alloyKey === other.alloyKey;
  const sameDegassing = !!t.degassing && t.degassing === other.degassing;
  const ratio = ratioOf(t.minSectionMm, other.minSectionMm);
  if (parts) {
    if (shared) {
      const pick = same || shared;
      const type = DEFECT_TYPES[31 - Math.clz32(pick & -pick)];
      const place = same
        ? other.defects.find(
            (d) => d.type === type && (places[DEFECT_TYPES.indexOf(type)] >> DEFECT_LOCATIONS.indexOf(d.location)) & 1,
          )
        : undefined;
      parts.push({ kind: "defect", type, location: place?.location ?? null });
    }
    if (t.process === other.process) parts.push({ kind: "process", process: other.process });
    if (sameAlloy || t.alloyFamily === other.alloyFamily)
      parts.push({ kind: "alloy", alloy: other.alloy, sameFamily: !sameAlloy });
    if (!Number.isNaN(delta)) parts.push({ kind: "superheat", deltaC: Math.round(delta) });
    if (sameDegassing) parts.push({ kind: "degassing", method: other.degassing! });
    if (ratio <= 1.25) parts.push({ kind: "section", minSectionMm: other.minSectionMm! });
  }
  return likenessOf(
    defectShare(t.defectMask, other.defectMask, same),
    conditionShare(
      t.process === other.process,
      sameAlloy,
      t.alloyFamily === other.alloyFamily,
      delta,
      sameDegassing,
      ratio,
    ),
  );
}

export type Ranked<T> = { doc: T; similarity: number; alike: number; teaches: number };
/** Alike enough first; among those, what teaches most; then the closest; then the newest. */
export const before = <T extends Pick<SimilarInput, "pouredOn" | "id">>(a: Ranked<T>, b: Ranked<T>) =>
  b.alike - a.alike ||
  a.alike * (b.teaches - a.teaches) ||
  b.similarity - a.similarity ||
  (a.doc.pouredOn < b.doc.pouredOn ? 1 : a.doc.pouredOn > b.doc.pouredOn ? -1 : b.doc.id - a.doc.id);

/** Keeps the best `limit` seen so far, in order; copies `probe` only when it makes the list. */
export function keepBest<T extends Pick<SimilarInput, "pouredOn" | "id">>(
  top: Ranked<T>[],
  probe: Ranked<T>,
  limit: number,
) {
  if (top.length === limit && before(probe, top[limit - 1]) >= 0) return;
  let at = Math.min(top.length, limit - 1);
  while (at > 0 && before(probe, top[at - 1]) < 0) at--;
  top.splice(at, 0, { ...probe });
  if (top.length > limit) top.pop();
}

/**
 * Without marks, the candidates are the cases of the same alloy and process when there are at least
 * `limit` of them, else those of the same process, else every case: an index finds the first two
 * (similar.ts), so a large shop is not scored whole for a casting that came out good.
 */
export const UNMARKED_POOLS: ((t: SimilarInput, c: SimilarInput) => boolean)[] = [
  (t, c) => c.alloyKey === t.alloyKey && c.process === t.process,
  (t, c) => c.process === t.process,
];

/**
 * The `limit` cases most like `target`. When it has marked defects, only cases sharing one of
 * them qualify (the point is the same defect coming back); without marks, conditions alone rank
 * the pool UNMARKED_POOLS picks.
 * The casebook runs the same rule in SQL over the typed columns (similar.ts); this is its reference.
 */
export function similarCases<T extends SimilarInput>(
  target: SimilarInput,
  cases: readonly T[],
  limit = 5,
): Similar<T>[] {
  const top: Ranked<T>[] = [];
  const probe: Ranked<T> = { doc: target as T, similarity: 0, alike: 0, teaches: 0 };
  const others = cases.filter((c) => c.id !== target.id);
  const pool = target.defectMask
    ? others.filter((c) => c.defectMask & target.defectMask)
    : (UNMARKED_POOLS.map((same) => others.filter((c) => same(target, c))).find((p) => p.length >= limit) ?? others);
  for (const c of pool) {
    probe.doc = c;
    probe.similarity = likeness(target, c);
    probe.alike = probe.similarity >= ALIKE_MIN ? 1 : 0;
    probe.teaches = teaches(c);
    keepBest(top, probe, limit);
  }
  return withReasons(target, top);
}

export function withReasons<T extends SimilarInput>(target: SimilarInput, top: Ranked<T>[]): Similar<T>[] {
  return top.map((r) => {
    const parts: ReasonPart[] = [];
    likeness(target, r.doc, parts);
    return { doc: r.doc, similarity: r.similarity, parts };
  });
}
