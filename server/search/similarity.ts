import type { ReasonPart } from "../../lib/search-schemas";
import type { DefectType } from "../../rules/case";
import type { CaseDoc } from "./case-doc";

/**
 * "Cases like this one": past castings with the same defects (type, then location) poured under
 * similar conditions (process, alloy, superheat, degassing, thinnest section). Among cases alike
 * enough, the ones whose cause a mentor confirmed and whose fix worked come first: those are the
 * ones that teach something. Pure; the weights are our judgement, not a published figure.
 */
export type SimilarInput = Pick<
  CaseDoc,
  "id" | "pouredOn" | "defects" | "process" | "alloyKey" | "alloy" | "alloyFamily" | "superheatC" | "degassing" | "minSectionMm" | "cause" | "fixWorked"
>;
export type Similar<T> = { doc: T; similarity: number; parts: ReasonPart[] };

const WEIGHTS = { defects: 0.5, process: 0.15, alloy: 0.1, superheat: 0.1, degassing: 0.05, section: 0.1 };
/** Below this a case is only loosely alike, and a confirmed cause no longer lifts it above closer ones. */
export const ALIKE_MIN = 0.35;
/** Superheat counts fully when equal and not at all 60 °C apart; about the spread of pour windows for one process. */
const SUPERHEAT_SPAN_C = 60;

/** How much a case teaches: 2 = confirmed cause and a fix that worked, 1 = either, 0 = neither. */
export const teaches = (c: Pick<SimilarInput, "cause" | "fixWorked">) => (c.cause?.confirmed ? 1 : 0) + (c.fixWorked === "yes" ? 1 : 0);

export function compare(target: SimilarInput, other: SimilarInput): Similar<SimilarInput> {
  const parts: ReasonPart[] = [];
  const mine = new Set(target.defects.map((d) => d.type));
  const theirs = new Set(other.defects.map((d) => d.type));
  let shared = 0;
  let best: ReasonPart | null = null;
  for (const type of mine) {
    if (!theirs.has(type)) continue;
    const places = new Set(target.defects.filter((d) => d.type === type).map((d) => d.location));
    const same = other.defects.find((d) => d.type === type && places.has(d.location));
    shared += same ? 1 : 0.6;
    if (!best || (same && best.kind === "defect" && !best.location)) best = { kind: "defect", type: type as DefectType, location: same?.location ?? null };
  }
  const union = new Set([...mine, ...theirs]).size;
  let similarity = union ? (WEIGHTS.defects * shared) / union : 0;
  if (best) parts.push(best);

  if (target.process === other.process) {
    similarity += WEIGHTS.process;
    parts.push({ kind: "process", process: other.process });
  }
  if (target.alloyKey === other.alloyKey || target.alloyFamily === other.alloyFamily) {
    const same = target.alloyKey === other.alloyKey;
    similarity += WEIGHTS.alloy * (same ? 1 : 0.5);
    parts.push({ kind: "alloy", alloy: other.alloy, sameFamily: !same });
  }
  if (target.superheatC !== null && other.superheatC !== null) {
    const delta = other.superheatC - target.superheatC;
    similarity += WEIGHTS.superheat * Math.max(0, 1 - Math.abs(delta) / SUPERHEAT_SPAN_C);
    parts.push({ kind: "superheat", deltaC: Math.round(delta) });
  }
  if (target.degassing && target.degassing === other.degassing) {
    similarity += WEIGHTS.degassing;
    parts.push({ kind: "degassing", method: other.degassing });
  }
  if (target.minSectionMm && other.minSectionMm) {
    const ratio = Math.max(target.minSectionMm, other.minSectionMm) / Math.min(target.minSectionMm, other.minSectionMm);
    const s = ratio <= 1.25 ? 1 : ratio <= 2 ? 0.5 : 0;
    similarity += WEIGHTS.section * s;
    if (s === 1) parts.push({ kind: "section", minSectionMm: other.minSectionMm });
  }
  return { doc: other, similarity: Math.round(similarity * 1000) / 1000, parts };
}

/**
 * The `limit` cases most like `target`. When it has marked defects, only cases sharing one of
 * them qualify (the point is the same defect coming back); without marks, conditions alone rank.
 */
export function similarCases<T extends SimilarInput>(target: SimilarInput, cases: Iterable<T>, limit = 5): Similar<T>[] {
  const scored: Similar<T>[] = [];
  const needDefect = target.defects.length > 0;
  for (const c of cases) {
    if (c.id === target.id) continue;
    if (needDefect && !c.defects.some((d) => target.defects.some((t) => t.type === d.type))) continue;
    scored.push(compare(target, c) as Similar<T>);
  }
  const alike = (s: Similar<T>) => (s.similarity >= ALIKE_MIN ? 1 : 0);
  return scored
    .sort((a, b) =>
      alike(b) - alike(a) ||
      alike(a) * (teaches(b.doc) - teaches(a.doc)) ||
      b.similarity - a.similarity ||
      (a.doc.pouredOn < b.doc.pouredOn ? 1 : a.doc.pouredOn > b.doc.pouredOn ? -1 : b.doc.id - a.doc.id))
    .slice(0, limit);
}
