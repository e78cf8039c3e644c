/**
 * The one Range form passed on to the store: a single `bytes=START-END` or `bytes=START-`. Anything
 * else (several ranges, a suffix `bytes=-N`, which the local stand-in misreads, other units, junk, END
 * before START) is ignored and the whole photo is sent, which RFC 9110 section 14.2 allows a server to do.
 */
const SINGLE = /^bytes=(\d{1,15})-(\d{1,15})?$/;

export function singleByteRange(header: string | undefined): string | undefined {
  const m = header ? SINGLE.exec(header.trim()) : null;
  if (!m) return undefined;
  const [, start, end] = m;
  if (end !== undefined && Number(end) < Number(start)) return undefined;
  return `bytes=${start}-${end ?? ""}`;
}
