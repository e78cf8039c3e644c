import { z } from "zod";
import { OUTCOMES } from "../rules/outcomes";
import { DEFECT_TYPES, PROCESSES, type DefectLocation, type DefectType, type Process } from "../rules/case";
import { DEFECTS } from "./defects";
import { calendarDate, text } from "./fields";
import { DEGASSING_LABELS, PROCESS_LABELS } from "./labels";
import type { Outcome, PersonRef } from "./notebook-schemas";
import type { Worked } from "./review-schemas";
import { fromSi, readingNumber, SI_UNITS, unitLabel, type Units } from "./units";

/**
 * The casebook search (GET /api/search) and "cases like this one" (GET /api/search/castings/:id/similar):
 * the query the screen sends and the answers it reads. Bundled into the web app: no server imports.
 */
export const SEARCH_QUERY_MAX = 200;
export const SEARCH_MAX_WORDS = 31;
export const SEARCH_WORD_MAX = 32;
export const SEARCH_PAGE_MAX = 50;
export const SEARCH_SORTS = ["relevance", "date-desc", "date-asc"] as const;
export type SearchSort = (typeof SEARCH_SORTS)[number];
export { OUTCOMES };

/** Search words: letters and digits, designations kept whole ("a356.0"); "mis-run" is "mis" + "run". */
export const SEARCH_TOKEN = /[\p{L}\p{N}]+(?:\.[\p{L}\p{N}]+)*/gu;
export const searchWords = (q: string) => q.toLowerCase().match(SEARCH_TOKEN) ?? [];

/** "2026-03-01_42" (date order) or "0.0608_2026-03-01_42" (relevance: rank first). */
export const SEARCH_CURSOR = /^(?:\d{1,4}(?:\.\d{1,12})?(?:e-\d{1,2})?_)?\d{4}-\d{2}-\d{2}_\d{1,10}$/;

/** A list in a query string: "a,b", or the parameter repeated; blanks dropped. */
const splitList = (v: unknown) =>
  v === undefined
    ? undefined
    : (Array.isArray(v) ? v : [v])
        .flatMap((s) => String(s).split(","))
        .map((s) => s.trim())
        .filter(Boolean);
const oneOf = <T extends readonly [string, ...string[]]>(what: string, values: T) =>
  z
    .preprocess(
      splitList,
      z.array(
        z.enum(values, { error: (i) => `"${String(i.input)}" is not ${what}; use one of: ${values.join(", ")}` }),
      ),
    )
    .optional();
/** Alloys, causes and people are checked against the shop's own lists by the server. */
const names = (max: number) =>
  z
    .preprocess(splitList, z.array(z.string().max(max, `at most ${max} characters`)).max(20, "at most 20 at once"))
    .optional();

export const searchQuery = z
  .object({
    q: text(SEARCH_QUERY_MAX, `search words are limited to ${SEARCH_QUERY_MAX} characters`)
      .refine((q) => searchWords(q).length <= SEARCH_MAX_WORDS, `use at most ${SEARCH_MAX_WORDS} words`)
      .refine(
        (q) => searchWords(q).every((w) => w.length <= SEARCH_WORD_MAX),
        `a word may have at most ${SEARCH_WORD_MAX} letters`,
      )
      .default(""),
    defect: oneOf("a defect type", DEFECT_TYPES),
    alloy: names(40),
    process: oneOf("a process", PROCESSES),
    outcome: oneOf("an outcome", OUTCOMES),
    cause: names(80),
    by: names(64),
    from: calendarDate().optional(),
    to: calendarDate().optional(),
    /** Keyset paging: the `next` of the previous answer (its last case's date and id, and rank). */
    after: z.string().regex(SEARCH_CURSOR, "after is the next value of a previous answer").optional(),
    sort: z.enum(SEARCH_SORTS, { error: `sort is one of: ${SEARCH_SORTS.join(", ")}` }).optional(),
    page: z.coerce
      .number({ error: "a page number" })
      .int("a whole page number")
      .min(1, "pages start at 1")
      .max(10_000)
      .default(1),
    pageSize: z.coerce
      .number({ error: "a number" })
      .int()
      .min(1, "at least 1")
      .max(SEARCH_PAGE_MAX, `at most ${SEARCH_PAGE_MAX}`)
      .default(20),
  })
  .refine((s) => !s.from || !s.to || s.from <= s.to, {
    path: ["to"],
    message: "the end date is before the start date",
  });
export type SearchParams = z.output<typeof searchQuery>;
/** What the screen sends; lists go as "a,b" (hooks/use-search.ts). */
export type SearchRequest = Partial<Omit<SearchParams, "outcome">> & { outcome?: Outcome[] };

/** A field's text cut into runs, `hit` where a search word matched. */
export type Marked = { text: string; hit: boolean }[];
export type MarkedField = "part" | "defects" | "causes" | "conditions" | "notes" | "comments";

export type CaseCause = { id: string | null; title: string; confirmed: boolean };
export type CaseSummary = {
  id: number;
  meltId: number;
  partName: string;
  pouredOn: string;
  alloy: string;
  process: Process;
  outcome: Outcome | null;
  defects: { type: DefectType; location: DefectLocation; severity: number }[];
  /** The mentor's confirmed cause, else the latest diagnosis's first cause. */
  cause: CaseCause | null;
  fixWorked: Worked | null;
  createdBy: PersonRef;
};
export type CaseHit = CaseSummary & { score: number | null; marked: Partial<Record<MarkedField, Marked>> };
export type SearchFacets = {
  defect: Partial<Record<DefectType, number>>;
  alloy: Record<string, number>;
  process: Partial<Record<Process, number>>;
  outcome: Partial<Record<Outcome, number>>;
  /** By cause id: confirmed causes, else the latest diagnosis's first. */
  cause: Record<string, { title: string; count: number }>;
};
export type SearchAnswer = {
  items: CaseHit[];
  /** The matching cases, counted up to `countLimit`: more than that is `countLimit` with `totalExact` false. */
  total: number;
  totalExact: boolean;
  /** False when the chips were counted among the newest `countLimit` matches, not all of them. */
  facetsExact: boolean;
  countLimit: number;
  page: number;
  pageSize: number;
  sort: SearchSort;
  /** Pass as `after` for the page after this one (keyset paging); null on the last page. */
  next: string | null;
  /** Counts for each filter's chips, with every other filter applied. */
  facets: SearchFacets;
};

/** Why a past case is like this one, in parts, so the app can say it in the person's units. */
export type ReasonPart =
  | { kind: "defect"; type: DefectType; location: DefectLocation | null }
  | { kind: "process"; process: Process }
  | { kind: "alloy"; alloy: string; sameFamily: boolean }
  | { kind: "superheat"; deltaC: number }
  | { kind: "degassing"; method: string }
  | { kind: "section"; minSectionMm: number };
export type SimilarCase = CaseSummary & { similarity: number; reason: string; parts: ReasonPart[] };
export type SimilarAnswer = { items: SimilarCase[] };

const LOCATION_PHRASES: Record<DefectLocation, string> = {
  top: "at the top",
  bottom: "at the bottom",
  side: "on the side",
  corner: "at a corner",
  edge: "at an edge",
  "thin-section": "in a thin section",
  "thick-section": "in a thick section",
  "near-gate": "near the gate",
  "far-from-gate": "far from the gate",
  junction: "at a junction",
  "parting-line": "at the parting line",
  "around-core": "around a core",
  "glue-line": "along a glue line",
  surface: "on the surface",
  throughout: "throughout",
};

/** "same defect at the top, lost foam, superheat 30 °C lower" */
export function reasonText(parts: ReasonPart[], units: Units = SI_UNITS): string {
  const say = (p: ReasonPart): string => {
    switch (p.kind) {
      case "defect":
        return `same ${DEFECTS[p.type].label.toLowerCase()}${p.location ? ` ${LOCATION_PHRASES[p.location]}` : ""}`;
      case "process":
        return PROCESS_LABELS[p.process];
      case "alloy":
        return p.sameFamily ? `${p.alloy} (same family)` : p.alloy;
      case "superheat": {
        const d = Math.round(fromSi("temperature-difference", Math.abs(p.deltaC), units));
        return d === 0
          ? "same superheat"
          : `superheat ${d} ${unitLabel("temperature", units)} ${p.deltaC < 0 ? "lower" : "higher"}`;
      }
      case "degassing":
        return p.method === "none"
          ? "not degassed either"
          : `${DEGASSING_LABELS[p.method as keyof typeof DEGASSING_LABELS] ?? p.method} degassing`;
      case "section": {
        return `similar ${readingNumber("length", p.minSectionMm, units)} ${unitLabel("length", units)} section`;
      }
    }
  };
  return parts.map(say).join(", ");
}

/** The sentence under the search box when nothing matched: "no cases with cold shut in 319.0 yet". */
export function emptyText(p: Pick<SearchRequest, "q" | "defect" | "alloy" | "process" | "outcome">): string {
  const bits: string[] = [];
  if (p.q) bits.push(`matching “${p.q}”`);
  if (p.defect?.length) bits.push(`with ${p.defect.map((d) => DEFECTS[d].label.toLowerCase()).join(" or ")}`);
  if (p.outcome?.length) bits.push(`judged ${p.outcome.join(" or ")}`);
  if (p.alloy?.length) bits.push(`in ${p.alloy.join(" or ")}`);
  if (p.process?.length) bits.push(`poured in ${p.process.map((x) => PROCESS_LABELS[x]).join(" or ")}`);
  return bits.length ? `No cases ${bits.join(" ")} yet.` : "No cases logged yet.";
}
