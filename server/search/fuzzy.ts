import type { IFuseOptions } from "fuse.js";
import { SEARCH_MAX_WORDS, SEARCH_TOKEN, searchWords } from "../../lib/search-schemas";
import { MAX_TERM_LENGTH, substringDistance, termMask } from "./edit-distance";

/**
 * The casebook's fuzzy ranking: Fuse.js token search (every query word must match somewhere in a
 * case, rarer words count more), scored exactly as `new Fuse(cases, FUSE_OPTIONS).search(q)`
 * scores it, but computed once per distinct word or phrase of the shop instead of once per case.
 * Each field is cut into units: the whole text, its "; " phrases, or its words plus each pair of
 * neighbouring words. Fuse matches a query word anywhere in the text, we match it within a unit;
 * since a pair holds any match across one space ("m s" is "mis" with one slip, as Fuse counts
 * it), the two differ only where Fuse's best match crosses two spaces or a "; " (two slips for
 * the gaps alone), and then a case can only rank lower here. tests/rules/search-fuzzy.test.ts
 * compares both on random casebooks.
 */
export const SEARCH_KEYS = ["part", "defects", "causes", "conditions", "notes", "comments"] as const;
export type SearchKey = (typeof SEARCH_KEYS)[number];
export type SearchFields = Partial<Record<SearchKey, string>>;

/** What a case is (part, defect, cause) outranks how it was poured, which outranks what was written. */
const KEY_WEIGHTS: Record<SearchKey, number> = {
  part: 3,
  defects: 3,
  causes: 2,
  conditions: 1.5,
  notes: 1,
  comments: 1,
};
/** Fuse's word separators (its field-length norm counts words between these). */
const SEPARATORS = /[\t\n\v\f\r \u00a0]+/;
const UNIT_BORDERS: Record<SearchKey, RegExp | null> = {
  part: null,
  conditions: null,
  defects: /; /,
  causes: /; /,
  notes: SEPARATORS,
  comments: SEPARATORS,
};
const WORDS_AND_GAPS = /([\t\n\v\f\r \u00a0]+)/;

/** A field's units: its words and each pair of neighbours with the gap between them, or its phrases. */
function unitsOfText(lower: string, border: RegExp | null): string[] {
  if (!border) return [lower];
  if (border !== SEPARATORS) return lower.split(border).filter(Boolean);
  const parts = lower.split(WORDS_AND_GAPS);
  const out: string[] = [];
  for (let i = 0; i < parts.length; i += 2) {
    if (!parts[i]) continue;
    out.push(parts[i]);
    if (parts[i + 2]) out.push(parts[i] + parts[i + 1] + parts[i + 2]);
  }
  return out;
}
/** 0.34 lets a six-letter word carry two slips ("misrnu" -> misrun), a three-letter one a single slip. */
const THRESHOLD = 0.34;

export const FUSE_OPTIONS = {
  keys: SEARCH_KEYS.map((name) => ({ name, weight: KEY_WEIGHTS[name] })),
  useTokenSearch: true,
  tokenMatch: "all",
  tokenize: SEARCH_TOKEN,
  threshold: THRESHOLD,
  ignoreLocation: true,
  includeScore: true,
  includeMatches: true,
} satisfies IFuseOptions<SearchFields>;

const totalWeight = SEARCH_KEYS.reduce((sum, k) => sum + KEY_WEIGHTS[k], 0);
const WEIGHT = SEARCH_KEYS.map((k) => KEY_WEIGHTS[k] / totalWeight);
/** Fuse's field-length norm, 1/sqrt(words) to three decimals, from the word count. */
const normOf = (words: number) => Math.round(1000 / Math.pow(words, 0.5)) / 1000;
/** Each field's exponent in Fuse's score (key weight x norm), by word count: no Map in the hot loop. */
const EXPONENT_TABLE = 1024;
const EXPONENTS = WEIGHT.map((w) =>
  Float64Array.from({ length: EXPONENT_TABLE }, (_, n) => w * normOf(Math.max(1, n))),
);
const exponent = (k: number, words: number) =>
  words < EXPONENT_TABLE ? EXPONENTS[k][words] : WEIGHT[k] * normOf(words);
const wordCount = (text: string) => text.split(SEPARATORS).filter(Boolean).length || 1;
/** The most slips Fuse allows a term of length m: errors / m must stay within the threshold. */
const maxErrors = (m: number) => {
  let k = 0;
  while (k + 1 < m && (k + 1) / m <= THRESHOLD) k++;
  return k;
};

/** A case compiled against the index: [whole-mask, word counts x6, unit offsets x7 (from the record's start), unit ids...]. */
export type CompiledFields = Int32Array;
const K = SEARCH_KEYS.length;
const HEAD = 1 + K + K + 1;
/** The unit ids of a compiled case, every field's together. */
export const unitsOf = (c: CompiledFields) => c.subarray(HEAD);

export type PreparedQuery = {
  terms: string[];
  idf: number[];
  maxPossible: number;
  full: number;
  /** Per unit: which terms it matches (bit i = term i); per term and unit: Fuse's score. */
  unitMask: Int32Array;
  unitScores: Float64Array[];
  /** Scratch: each term's best score within one field. */
  best: Float64Array;
};

export class FuzzyIndex {
  private unitIds = new Map<string, number>();
  private unitTexts: string[] = [];
  /** Fuse's inverted-index statistics: fields holding each word, and fields with any word. */
  private df = new Map<string, number>();
  private fieldCount = 0;

  get unitCount() {
    return this.unitTexts.length;
  }

  compile(fields: SearchFields): CompiledFields {
    const units: number[] = [];
    const head = new Int32Array(HEAD);
    SEARCH_KEYS.forEach((key, k) => {
      head[1 + K + k] = HEAD + units.length;
      const text = fields[key] ?? "";
      if (!text.trim()) return; // Fuse skips blank values
      head[1 + k] = wordCount(text);
      const lower = text.toLowerCase();
      const pieces = [...new Set(unitsOfText(lower, UNIT_BORDERS[key]))];
      if (pieces.length === 1 && pieces[0] === lower) head[0] |= 1 << k;
      for (const p of pieces) units.push(this.intern(p));
      this.count(lower, 1);
    });
    head[HEAD - 1] = HEAD + units.length;
    const out = new Int32Array(HEAD + units.length);
    out.set(head);
    out.set(units, HEAD);
    return out;
  }

  /** Takes a case's words out of the statistics; its units stay until the next rebuild. */
  release(fields: SearchFields) {
    for (const key of SEARCH_KEYS) {
      const text = fields[key] ?? "";
      if (text.trim()) this.count(text.toLowerCase(), -1);
    }
  }

  /** Matches every query term against every distinct unit once; null when the query has no words. */
  prepare(query: string): PreparedQuery | null {
    const terms = searchWords(query);
    if (!terms.length) return null;
    if (terms.length > SEARCH_MAX_WORDS || terms.some((t) => t.length > MAX_TERM_LENGTH))
      throw new Error("query too long");
    const idf = terms.map((t) => {
      const d = this.df.get(t) ?? 0;
      return Math.log(1 + (this.fieldCount - d + 0.5) / (d + 0.5));
    });
    let maxPossible = 0;
    for (const x of idf) maxPossible += x;
    const n = this.unitTexts.length;
    const unitMask = new Int32Array(n);
    const unitScores = terms.map((term, i) => {
      const scores = new Float64Array(n);
      const mask = termMask(term);
      const m = term.length;
      const k = maxErrors(m);
      for (let u = 0; u < n; u++) {
        const text = this.unitTexts[u];
        if (text.length < m - k) continue;
        const e = substringDistance(mask, text);
        if (e > k) continue;
        unitMask[u] |= 1 << i;
        scores[u] = text === term ? 0 : Math.max(0.001, e / m);
      }
      return scores;
    });
    return {
      terms,
      idf,
      maxPossible,
      full: 2 ** terms.length - 1,
      unitMask,
      unitScores,
      best: new Float64Array(terms.length),
    };
  }

  /**
   * Fuse's score for the case compiled at `at` in `c` (lower is better), or -1 when some term
   * matches none of its fields. Many cases live in one array: 100,000 small typed arrays read
   * about ten times slower than one large one.
   */
  score(p: PreparedQuery, c: Int32Array, at = 0): number {
    const { unitMask, unitScores, idf, best } = p;
    let total = 1;
    let covered = 0;
    for (let k = 0; k < K; k++) {
      const words = c[at + 1 + k];
      if (words === 0) continue;
      const to = at + c[at + 2 + K + k];
      let fieldMask = 0;
      for (let j = at + c[at + 1 + K + k]; j < to; j++) {
        const u = c[j];
        const m = unitMask[u];
        if (m === 0) continue;
        if (fieldMask === 0) best.fill(1);
        fieldMask |= m;
        for (let i = 0, bits = m; bits !== 0; i++, bits >>>= 1) {
          if (bits & 1 && unitScores[i][u] < best[i]) best[i] = unitScores[i][u];
        }
      }
      if (fieldMask === 0) continue;
      // A unit equal to the term scores 0 only when it is the field's whole text, as in Fuse.
      const floor = (c[at] >> k) & 1 ? 0 : 0.001;
      let weighted = 0;
      for (let i = 0; i < idf.length; i++)
        if (fieldMask & (1 << i)) weighted += idf[i] * (1 - Math.max(floor, best[i]));
      const normalized = p.maxPossible > 0 ? 1 - weighted / p.maxPossible : 0;
      total *= Math.pow(Math.max(0.001, normalized), exponent(k, words));
      covered |= fieldMask;
    }
    return covered !== 0 && covered === p.full ? total : -1;
  }

  private intern(unit: string): number {
    let id = this.unitIds.get(unit);
    if (id === undefined) {
      id = this.unitTexts.length;
      this.unitIds.set(unit, id);
      this.unitTexts.push(unit);
    }
    return id;
  }

  private count(lower: string, delta: 1 | -1) {
    const words = lower.match(SEARCH_TOKEN);
    if (!words) return;
    this.fieldCount += delta;
    for (const w of new Set(words)) {
      const d = (this.df.get(w) ?? 0) + delta;
      if (d > 0) this.df.set(w, d);
      else this.df.delete(w);
    }
  }
}
