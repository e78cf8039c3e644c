import Fuse from "fuse.js";
import { describe, expect, it } from "vitest";
import { substringDistance, termMask } from "../../server/search/edit-distance";
import { FUSE_OPTIONS, FuzzyIndex, type SearchFields } from "../../server/search/fuzzy";
import { bestFirst } from "../../server/search/best-first";
import { rng } from "../../scripts/seeded-random";

/** Textbook dynamic programme: the fewest edits from `term` to any substring of `text`. */
function naiveDistance(term: string, text: string): number {
  let prev = Array.from({ length: text.length + 1 }, () => 0);
  for (let i = 1; i <= term.length; i++) {
    const row = [i];
    for (let j = 1; j <= text.length; j++) {
      row[j] = Math.min(prev[j] + 1, row[j - 1] + 1, prev[j - 1] + (term[i - 1] === text[j - 1] ? 0 : 1));
    }
    prev = row;
  }
  return Math.min(...prev);
}

const WORDS = [
  "porosity",
  "gas",
  "misrun",
  "cold",
  "shut",
  "shrinkage",
  "bracket",
  "impeller",
  "housing",
  "lost",
  "foam",
  "green",
  "sand",
  "a356.0",
  "319.0",
  "degassed",
  "rotary",
  "argon",
  "poured",
  "hotter",
  "sprue",
  "riser",
  "top",
  "near",
  "gate",
  "thin",
  "section",
  "coating",
  "wet",
  "dross",
  "skimmed",
  "cover",
  "plate",
  "ésperé",
];

function typo(word: string, r: () => number): string {
  if (word.length < 4 || r() < 0.5) return word;
  const i = 1 + Math.floor(r() * (word.length - 2));
  return r() < 0.5
    ? word.slice(0, i) + word.slice(i + 1)
    : word.slice(0, i) + word[i + 1] + word[i] + word.slice(i + 2);
}

/**
 * `gap` separates words in notes and comments and the phrases of defects: eleven spaces cost more
 * slips than any term may carry, so no match can cross a gap and the rankings must agree exactly.
 */
function casebook(seed: number, size: number, gap = " ".repeat(11)): SearchFields[] {
  const r = rng(seed);
  const pick = () => WORDS[Math.floor(r() * WORDS.length)];
  const words = (n: number, sep = gap) => Array.from({ length: n }, () => typo(pick(), r)).join(sep);
  return Array.from({ length: size }, () => ({
    part: r() < 0.9 ? `${pick()} ${pick()}` : "",
    defects: Array.from({ length: Math.floor(r() * 3) }, () => words(2, " ")).join(";" + gap),
    causes: r() < 0.5 ? words(3, " ") : undefined,
    conditions: `${pick()} ${pick()}`,
    notes: r() < 0.6 ? words(3 + Math.floor(r() * 12)) : "",
    comments: r() < 0.3 ? words(5) : "",
  }));
}

describe("substring edit distance (Myers)", () => {
  it("agrees with the textbook dynamic programme", () => {
    const r = rng(7);
    const letters = "abcdeé ";
    const str = (n: number) => Array.from({ length: n }, () => letters[Math.floor(r() * letters.length)]).join("");
    for (let n = 0; n < 3000; n++) {
      const term = str(1 + Math.floor(r() * 12)).replace(/ /g, "a");
      const text = str(Math.floor(r() * 30));
      expect(substringDistance(termMask(term), text), `${term} in ${text}`).toBe(naiveDistance(term, text));
    }
  });

  it("takes terms of 32 units", () => {
    const term = "abcdefghijklmnopqrstuvwxyzabcdef";
    expect(substringDistance(termMask(term), `xx${term}yy`)).toBe(0);
    expect(substringDistance(termMask(term), "abcdefghijklmnopqrstuvwxyzabcdeX")).toBe(1);
  });
});

describe("FuzzyIndex ranks as plain Fuse does", () => {
  for (const seed of [1, 2, 3]) {
    it(`casebook ${seed}: same matches, same scores, same order`, () => {
      const docs = casebook(seed, 400);
      const fuse = new Fuse(docs, FUSE_OPTIONS);
      const index = new FuzzyIndex();
      const compiled = docs.map((d) => index.compile(d));
      const r = rng(seed * 100);
      for (let q = 0; q < 60; q++) {
        const query = Array.from({ length: 1 + Math.floor(r() * 3) }, () =>
          typo(WORDS[Math.floor(r() * WORDS.length)], r),
        ).join(" ");
        const expected = fuse.search(query).map((x) => [x.refIndex, x.score]);
        const prepared = index.prepare(query)!;
        const ours = compiled
          .map((c, i) => [i, index.score(prepared, c)] as [number, number])
          .filter(([, s]) => s >= 0)
          .sort((a, b) => a[1] - b[1] || a[0] - b[0]);
        expect(ours, query).toEqual(expected);
      }
    });
  }

  it("with ordinary spaces, never finds a case Fuse does not, nor ranks one better than Fuse", () => {
    const docs = casebook(4, 400, " ");
    const fuse = new Fuse(docs, FUSE_OPTIONS);
    const index = new FuzzyIndex();
    const compiled = docs.map((d) => index.compile(d));
    const r = rng(400);
    let same = 0;
    for (let q = 0; q < 60; q++) {
      const query = Array.from({ length: 1 + Math.floor(r() * 2) }, () =>
        typo(WORDS[Math.floor(r() * WORDS.length)], r),
      ).join(" ");
      const fuseScore = new Map(fuse.search(query).map((x) => [x.refIndex, x.score!]));
      const prepared = index.prepare(query)!;
      compiled.forEach((c, i) => {
        const s = index.score(prepared, c);
        if (s < 0) return;
        expect(fuseScore.has(i), query).toBe(true);
        expect(s, query).toBeGreaterThanOrEqual(fuseScore.get(i)!);
        if (s === fuseScore.get(i)) same++;
      });
    }
    expect(same).toBeGreaterThan(0);
  });

  it("keeps Fuse's word statistics when cases leave", () => {
    const docs = casebook(9, 200);
    const index = new FuzzyIndex();
    const compiled = docs.map((d) => index.compile(d));
    for (const d of docs.slice(100)) index.release(d);
    const fuse = new Fuse(docs.slice(0, 100), FUSE_OPTIONS);
    const query = "porosty bracket";
    const prepared = index.prepare(query)!;
    const ours = compiled
      .slice(0, 100)
      .map((c, i) => [i, index.score(prepared, c)])
      .filter(([, s]) => s >= 0);
    expect(ours.sort((a, b) => a[1] - b[1] || a[0] - b[0])).toEqual(
      fuse.search(query).map((x) => [x.refIndex, x.score]),
    );
  });
});

describe("the relevance page", () => {
  it("picks the same first k as a full sort, ties in scan order", () => {
    const r = rng(5);
    for (let n = 0; n < 300; n++) {
      const scores = Float64Array.from({ length: Math.floor(r() * 200) }, () => Math.floor(r() * 20) / 20);
      const k = Math.floor(r() * 60);
      const full = Array.from(scores.keys())
        .sort((a, b) => scores[a] - scores[b] || a - b)
        .slice(0, k);
      expect(bestFirst(scores, k)).toEqual(full);
    }
  });
});
