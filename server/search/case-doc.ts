import { DEFECTS, LOCATION_LABELS } from "../../lib/defects";
import { DEGASSING_LABELS, PROCESS_LABELS } from "../../lib/labels";
import type { Outcome } from "../../lib/notebook-schemas";
import type { Worked } from "../../lib/review-schemas";
import type { CaseSummary } from "../../lib/search-schemas";
import type { DefectLocation, DefectType, Process } from "../../rules/case";

/**
 * One casting's search document as the page reads it from `search_documents` (db/search-schema.ts):
 * what a result card shows, and the six texts the page's re-ranking and marked words read. The
 * document itself is built in SQL (search_refresh); the words it holds for a code come from
 * `search_labels`, which holds `defectWords` and the labels below (tests/api/search-labels.test.ts).
 */
export type DocRow = {
  id: number;
  meltId: number;
  partName: string;
  pattern: string | null;
  pouredOn: string;
  alloy: string;
  process: Process;
  degassing: string | null;
  outcome: Outcome | null;
  marks: { type: DefectType; location: DefectLocation; severity: number }[];
  causeId: string | null;
  causeTitle: string | null;
  causeConfirmed: boolean;
  fixWorked: Worked | null;
  createdBy: string;
  causesText: string;
  notesText: string;
  commentsText: string;
};

export const SEARCH_KEYS = ["part", "defects", "causes", "conditions", "notes", "comments"] as const;
export type SearchKey = (typeof SEARCH_KEYS)[number];
export type SearchFields = Partial<Record<SearchKey, string>>;

/** Upper case without spaces, as the alloy table keys designations ("a356.0" is "A356.0"). */
export const alloyKey = (designation: string) => designation.trim().toUpperCase().replace(/\s+/g, "");

/** Trade words a defect's plain label leaves out, so "penetration" or "inclusion" still find it. */
const ALIASES: Partial<Record<DefectType, string>> = {
  "dross-inclusion": "dross inclusion",
  "sand-inclusion": "sand inclusion",
  "carbon-residue": "carbon residue",
  "metal-penetration": "metal penetration",
  "sand-collapse": "sand collapse",
};
/** The words a document holds for a defect type: its label and any alias. */
export const defectWords = (type: DefectType) => `${DEFECTS[type].label}${ALIASES[type] ? ` / ${ALIASES[type]}` : ""}`;
export const defectPhrase = (type: DefectType, location: DefectLocation) =>
  `${defectWords(type)} (${LOCATION_LABELS[location]})`;
export const degassingWords = (method: string | null) =>
  method && method !== "none" ? `${DEGASSING_LABELS[method as keyof typeof DEGASSING_LABELS] ?? method} degassing` : "";

const joined = (parts: (string | null | undefined)[], sep: string) =>
  [...new Set(parts.filter((p): p is string => !!p?.trim()))].join(sep);

/** The texts Fuse reads for one case of the page (and marks). */
export const fieldsOf = (d: DocRow): SearchFields => ({
  part: joined([d.partName, d.pattern], " "),
  defects: joined(
    d.marks.map((m) => defectPhrase(m.type, m.location)),
    "; ",
  ),
  causes: d.causesText,
  conditions: joined([d.alloy, PROCESS_LABELS[d.process] ?? d.process, degassingWords(d.degassing)], " "),
  notes: d.notesText,
  comments: d.commentsText,
});

/** A result card; a confirmed cause's title is the rulebook's, where it knows the cause. */
export const summaryOf = (d: DocRow, names: Map<string, string>, causeTitles: Map<string, string>): CaseSummary => ({
  id: d.id,
  meltId: d.meltId,
  partName: d.partName,
  pouredOn: d.pouredOn,
  alloy: d.alloy,
  process: d.process,
  outcome: d.outcome,
  defects: d.marks.map(({ type, location, severity }) => ({ type, location, severity })),
  cause:
    d.causeId || d.causeTitle
      ? {
          id: d.causeId,
          title: (d.causeId && causeTitles.get(d.causeId)) || d.causeTitle || d.causeId || "",
          confirmed: d.causeConfirmed,
        }
      : null,
  fixWorked: d.fixWorked,
  createdBy: { id: d.createdBy, name: names.get(d.createdBy) ?? "" },
});
