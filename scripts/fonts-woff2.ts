// `npm run fonts:woff2`: writes assets/fonts/*.woff2 beside each TTF for the web app; native builds keep
// the TTF. Each WOFF2 holds the Latin letters (Basic Latin, Latin-1, Latin Extended-A: the languages of
// Western and Central Europe), punctuation and the signs the app writes (°, ², ³, ×, −, ≤, ≥, arrows),
// subset with subset-font (HarfBuzz's hb-subset as WebAssembly): the full fonts carry Cyrillic and
// Vietnamese too and were 97 KB of the sign-in page's first load. A character outside the subset, in a
// part or shop name say, is drawn by the browser in its fallback serif, as the heading is before Lora
// arrives. Run it when a font file changes and commit what it writes.
import { readdirSync, readFileSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import subsetFont from "subset-font";

const range = (from: number, to: number) =>
  Array.from({ length: to - from + 1 }, (_, i) => String.fromCodePoint(from + i)).join("");
const KEPT_CHARACTERS = [
  range(0x20, 0x7e), // Basic Latin
  range(0xa0, 0xff), // Latin-1 Supplement: accented letters, °, ², ³, ×, ½
  range(0x100, 0x17f), // Latin Extended-A
  range(0x2010, 0x2027), // dashes, quotes, bullet, ellipsis
  range(0x2030, 0x203a), // per mille, primes, angle quotes
  "\u20ac\u2122\u2190\u2191\u2192\u2193\u2212\u2264\u2265\u2248\u00b7",
].join("");

const dir = fileURLToPath(new URL("../assets/fonts", import.meta.url));
for (const name of readdirSync(dir).filter((f) => f.endsWith(".ttf"))) {
  const ttf = readFileSync(join(dir, name));
  const woff2 = await subsetFont(ttf, KEPT_CHARACTERS, { targetFormat: "woff2" });
  writeFileSync(join(dir, name.replace(/\.ttf$/, ".woff2")), woff2);
  console.log(
    `${name}: ${(ttf.length / 1024).toFixed(0)} KB -> ${(woff2.length / 1024).toFixed(0)} KB as WOFF2 (Latin)`,
  );
}
