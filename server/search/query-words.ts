import { sql, type SQL } from "drizzle-orm";
import { searchWords } from "../../lib/search-schemas";

/**
 * A search text cut into words we split ourselves (lib/search-schemas.ts SEARCH_TOKEN: letters,
 * digits, designations kept whole), so nothing a person types reaches PostgreSQL's query syntax:
 * "&", "|", "!", quotes and backslashes are simply not words. Each space-separated chunk is one
 * term; a chunk of several words ("mis-run") also matches them written as one ("misrun").
 */
export type QueryTerm = { words: string[]; glued: string | null };

export function queryTerms(q: string): QueryTerm[] {
  return q
    .split(/\s+/)
    .map((chunk) => searchWords(chunk))
    .filter((words) => words.length > 0)
    .map((words) => ({ words, glued: words.length > 1 ? words.join("") : null }));
}

/** Only plain words of 3 to 32 letters are widened to similar words; numbers and designations match as typed. */
export const widens = (w: string) => /^\p{L}{3,32}$/u.test(w);

/**
 * The most slips a word may carry, as the casebook has always allowed: slips / letters at most 0.34,
 * so "misrnu" (6 letters) may have two, "gas" one. (Our rule of thumb, not a published figure.)
 */
export function slipsAllowed(word: string): number {
  const m = word.length;
  let k = 0;
  while (k + 1 < m && (k + 1) / m <= 0.34) k++;
  return k;
}

/** Every word to look up in the shop's vocabulary, with the slips each may carry. */
export function lookups(terms: QueryTerm[]): { words: string[]; slips: number[] } {
  const words = [...new Set(terms.flatMap((t) => [...t.words, ...(t.glued ? [t.glued] : [])]))].filter(widens);
  return { words, slips: words.map(slipsAllowed) };
}

/** A lexeme as tsquery text; the words hold only letters, digits and dots, so quoting cannot be escaped. */
const LEXEME = /^[\p{L}\p{N}.]+$/u;
const lexeme = (w: string, prefix: boolean) => {
  if (!LEXEME.test(w)) throw new Error(`not a search word: ${JSON.stringify(w)}`);
  return `'${w}'${prefix ? ":*" : ""}`;
};
/** A word as typed also matches as a prefix ("poros" finds porosity) once it has three characters. */
const alternatives = (w: string, similar: Map<string, string[]>) =>
  `(${[lexeme(w, w.length >= 3), ...(similar.get(w) ?? []).filter((s) => s !== w).map((s) => lexeme(s, false))].join(" | ")})`;

/** The tsquery text: every term must match, each word or one of its similar words. */
export function tsqueryText(terms: QueryTerm[], similar: Map<string, string[]>): string {
  return terms
    .map((t) => {
      const all = t.words.map((w) => alternatives(w, similar)).join(" & ");
      return t.glued ? `((${all}) | ${alternatives(t.glued, similar)})` : `(${all})`;
    })
    .join(" & ");
}

/** The parameterised tsquery: `$1::tsquery`, never text spliced into the statement. */
export const tsquery = (text: string): SQL => sql`${text}::tsquery`;
