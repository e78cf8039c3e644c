import { DEFECTS, LOCATION_LABELS } from "../../lib/defects";
import { DEGASSING_LABELS, PROCESS_LABELS } from "../../lib/labels";
import type { Outcome } from "../../lib/notebook-schemas";
import type { Worked } from "../../lib/review-schemas";
import type { CaseCause, CaseSummary } from "../../lib/search-schemas";
import { DEFECT_LOCATIONS, DEFECT_TYPES, type DefectLocation, type DefectType, type Process } from "../../rules/case";
import type { SearchFields } from "./fuzzy";

/**
 * One casting as the casebook keeps it in memory: what a result card shows, what the filters and
 * "cases like this one" compare, and the texts the fuzzy search reads. Built from the rows the
 * loader reads (loader.ts); pure, so the tests and the bench build cases the same way.
 */
export type CastingRow = {
  id: number;
  meltId: number;
  partName: string;
  pattern: string | null;
  outcome: string | null;
  notes: string | null;
  createdBy: string;
  minSectionMm: number | null;
  pouredOn: string;
  process: string;
  degassing: string | null;
  pourTempC: number | null;
  meltNotes: string | null;
  alloy: string;
  alloyFamily: string;
  liquidusC: number;
};
export type MarkRow = { castingId: number; type: string; location: string; severity: number; note: string | null };
export type CommentRow = { castingId: number; body: string };
/** The latest diagnosis, cut down to its first two causes and the first one's fixes. */
export type DiagnosisRow = {
  castingId: number;
  topId: string | null;
  topTitle: string | null;
  secondTitle: string | null;
  fixes: unknown;
};
export type ConfirmationRow = { castingId: number; causeId: string | null; causeText: string | null };
export type FixRow = { castingId: number; fix: string; worked: string | null };
export type CaseRows = {
  castings: CastingRow[];
  marks: MarkRow[];
  comments: CommentRow[];
  diagnoses: DiagnosisRow[];
  confirmations: ConfirmationRow[];
  fixes: FixRow[];
  causeTitles: Map<string, string>;
};

export type CaseDoc = Omit<CaseSummary, "createdBy"> & {
  createdBy: string;
  alloyKey: string;
  alloyFamily: string;
  defectMask: number;
  /** Each mark as type index * 16 + location index (rules/case.ts lists), for quick comparing. */
  markCodes: number[];
  degassing: string | null;
  superheatC: number | null;
  minSectionMm: number | null;
  fields: SearchFields;
};

/** Upper case without spaces, as the alloy table keys designations ("a356.0" is "A356.0"). */
export const alloyKey = (designation: string) => designation.trim().toUpperCase().replace(/\s+/g, "");
export const defectBit = (t: DefectType) => 1 << DEFECT_TYPES.indexOf(t);
export const markCode = (t: DefectType, l: DefectLocation) =>
  DEFECT_TYPES.indexOf(t) * 16 + DEFECT_LOCATIONS.indexOf(l);

/** Trade words a defect's plain label leaves out, so "penetration" or "inclusion" still find it. */
const ALIASES: Partial<Record<DefectType, string>> = {
  "dross-inclusion": "dross inclusion",
  "sand-inclusion": "sand inclusion",
  "carbon-residue": "carbon residue",
  "metal-penetration": "metal penetration",
  "sand-collapse": "sand collapse",
};
export const defectPhrase = (type: DefectType, location: DefectLocation) =>
  `${DEFECTS[type].label}${ALIASES[type] ? ` / ${ALIASES[type]}` : ""} (${LOCATION_LABELS[location]})`;

const WORKED_RANK: Record<Worked, number> = { yes: 3, partly: 2, no: 1 };
const group = <T extends { castingId: number }>(rows: T[]) => {
  const out = new Map<number, T[]>();
  for (const r of rows) (out.get(r.castingId) ?? out.set(r.castingId, []).get(r.castingId)!).push(r);
  return out;
};
const joined = (parts: (string | null | undefined)[], sep: string) =>
  [...new Set(parts.filter((p): p is string => !!p?.trim()))].join(sep);

export function caseDocs(rows: CaseRows): CaseDoc[] {
  const marks = group(rows.marks);
  const comments = group(rows.comments);
  const fixes = group(rows.fixes);
  const diagnoses = new Map(rows.diagnoses.map((d) => [d.castingId, d]));
  const confirmed = new Map(rows.confirmations.map((c) => [c.castingId, c]));
  return rows.castings.map((c) => {
    const m = (marks.get(c.id) ?? []).map((r) => ({
      type: r.type as DefectType,
      location: r.location as DefectLocation,
      severity: r.severity,
      note: r.note,
    }));
    const d = diagnoses.get(c.id);
    const conf = confirmed.get(c.id);
    const tried = fixes.get(c.id) ?? [];
    const cause: CaseCause | null = conf
      ? {
          id: conf.causeId,
          title: (conf.causeId ? rows.causeTitles.get(conf.causeId) : conf.causeText) ?? conf.causeId ?? "",
          confirmed: true,
        }
      : d?.topId
        ? { id: d.topId, title: d.topTitle ?? d.topId, confirmed: false }
        : null;
    const fixWorked = tried.reduce<Worked | null>((best, f) => {
      const w = f.worked as Worked | null;
      return w && (!best || WORKED_RANK[w] > WORKED_RANK[best]) ? w : best;
    }, null);
    const process = c.process as Process;
    return {
      id: c.id,
      meltId: c.meltId,
      partName: c.partName,
      pouredOn: c.pouredOn,
      alloy: c.alloy,
      process,
      outcome: c.outcome as Outcome | null,
      defects: m.map(({ type, location, severity }) => ({ type, location, severity })),
      cause,
      fixWorked,
      createdBy: c.createdBy,
      alloyKey: alloyKey(c.alloy),
      alloyFamily: c.alloyFamily,
      defectMask: m.reduce((mask, r) => mask | defectBit(r.type), 0),
      markCodes: m.map((r) => markCode(r.type, r.location)),
      degassing: c.degassing,
      superheatC: c.pourTempC === null ? null : c.pourTempC - c.liquidusC,
      minSectionMm: c.minSectionMm,
      fields: {
        part: joined([c.partName, c.pattern], " "),
        defects: joined(
          m.map((r) => defectPhrase(r.type, r.location)),
          "; ",
        ),
        causes: joined(
          [
            cause?.title,
            d?.topTitle,
            d?.secondTitle,
            ...(Array.isArray(d?.fixes) ? d.fixes : []),
            ...tried.map((f) => f.fix),
          ],
          "; ",
        ),
        conditions: joined(
          [
            c.alloy,
            PROCESS_LABELS[process] ?? c.process,
            c.degassing && c.degassing !== "none"
              ? `${DEGASSING_LABELS[c.degassing as keyof typeof DEGASSING_LABELS] ?? c.degassing} degassing`
              : null,
          ],
          " ",
        ),
        notes: joined([c.notes, c.meltNotes, ...m.map((r) => r.note)], "\n"),
        comments: joined(
          (comments.get(c.id) ?? []).map((r) => r.body),
          "\n",
        ),
      },
    };
  });
}

/** Newest pour first, then the newest casting: the order of the index and of "date" sorting. */
export const byDateDesc = (a: Pick<CaseDoc, "pouredOn" | "id">, b: Pick<CaseDoc, "pouredOn" | "id">) =>
  a.pouredOn < b.pouredOn ? 1 : a.pouredOn > b.pouredOn ? -1 : b.id - a.id;
