// `npm run fonts:woff2`: writes assets/fonts/*.woff2 beside each TTF (wawoff2, Google's woff2 encoder
// compiled to WebAssembly). The web app loads the WOFF2 files (about a third of the TTF's bytes); native
// builds keep the TTF. Run it when a font file changes and commit what it writes.
import { readdirSync, readFileSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import wawoff2 from "wawoff2";

const dir = fileURLToPath(new URL("../assets/fonts", import.meta.url));
for (const name of readdirSync(dir).filter((f) => f.endsWith(".ttf"))) {
  const ttf = readFileSync(join(dir, name));
  const woff2 = await wawoff2.compress(ttf);
  writeFileSync(join(dir, name.replace(/\.ttf$/, ".woff2")), woff2);
  console.log(`${name}: ${(ttf.length / 1024).toFixed(0)} KB -> ${(woff2.length / 1024).toFixed(0)} KB as WOFF2`);
}
