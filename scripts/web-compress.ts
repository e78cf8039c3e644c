import { readdirSync, readFileSync, statSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { brotliCompressSync, constants, gzipSync } from "node:zlib";

/** Text-like files worth compressing; images and WOFF2 fonts are compressed already. */
const COMPRESSIBLE = /\.(js|css|html|json|map|svg|ttf|ico|txt)$/i;
const MIN_BYTES = 1024; // below this the headers outweigh the saving

function* files(dir: string): Generator<string> {
  for (const entry of readdirSync(dir)) {
    const path = join(dir, entry);
    if (statSync(path).isDirectory()) yield* files(path);
    else yield path;
  }
}

/**
 * Writes `name.br` (brotli, best quality) and `name.gz` (gzip -9) beside each compressible file of the
 * export, once at build time, so the server never compresses per request. Returns the counts for the log.
 */
export function compressWebExport(dir: string): { files: number; bytes: number; brotliBytes: number } {
  let count = 0;
  let bytes = 0;
  let brotliBytes = 0;
  for (const path of [...files(dir)]) {
    if (!COMPRESSIBLE.test(path)) continue;
    const raw = readFileSync(path);
    if (raw.length < MIN_BYTES) continue;
    const br = brotliCompressSync(raw, {
      params: { [constants.BROTLI_PARAM_QUALITY]: 11, [constants.BROTLI_PARAM_SIZE_HINT]: raw.length },
    });
    writeFileSync(`${path}.br`, br);
    writeFileSync(`${path}.gz`, gzipSync(raw, { level: 9 }));
    count += 1;
    bytes += raw.length;
    brotliBytes += br.length;
  }
  return { files: count, bytes, brotliBytes };
}
