/**
 * Fewest single-character edits (insert, delete, substitute) that turn `term` into some substring
 * of `text`: the error count Fuse's bitap search settles on when location is ignored, computed
 * with Myers' bit-vector algorithm (G. Myers, "A fast bit-vector algorithm for approximate string
 * matching based on dynamic programming", J. ACM 46(3), 1999). Fuse's own bitap allocates arrays
 * per error level and takes about 1 µs a word; this takes a few dozen ns, which is what lets one
 * query look at every distinct word of a 100,000-case casebook.
 */
export type TermMask = { length: number; ascii: Int32Array; other: Map<number, number> };

/** Terms are at most 32 UTF-16 units long (one 32-bit vector), as Fuse's bitap also requires. */
export const MAX_TERM_LENGTH = 32;

export function termMask(term: string): TermMask {
  if (term.length > MAX_TERM_LENGTH) throw new Error(`term longer than ${MAX_TERM_LENGTH}`);
  const ascii = new Int32Array(128);
  const other = new Map<number, number>();
  for (let i = 0; i < term.length; i++) {
    const c = term.charCodeAt(i);
    if (c < 128) ascii[c] |= 1 << i;
    else other.set(c, (other.get(c) ?? 0) | (1 << i));
  }
  return { length: term.length, ascii, other };
}

export function substringDistance(t: TermMask, text: string): number {
  const m = t.length;
  if (m === 0) return 0;
  const high = 1 << (m - 1);
  let pv = -1;
  let mv = 0;
  let score = m;
  let best = m;
  for (let j = 0; j < text.length && best > 0; j++) {
    const c = text.charCodeAt(j);
    const eq = c < 128 ? t.ascii[c] : (t.other.get(c) ?? 0);
    const xv = eq | mv;
    // The sum may pass 2^31; `| 0` wraps it to 32 bits as the algorithm's unsigned add does.
    const xh = ((((eq & pv) + pv) | 0) ^ pv) | eq;
    let ph = mv | ~(xh | pv);
    let mh = pv & xh;
    if (ph & high) score++;
    else if (mh & high) score--;
    // A zero shifted in (not one): the match may start anywhere in the text at no cost.
    ph <<= 1;
    mh <<= 1;
    pv = mh | ~(xv | ph);
    mv = ph & xv;
    if (score < best) best = score;
  }
  return best;
}
