import { readFileSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { colors, fontSize } from "../constants/theme";

/**
 * Puts the app's opening screen (the product's name on the paper background, as app/_layout.tsx draws
 * it while the session is checked) into the exported index.html, so a phone paints it as soon as the
 * HTML arrives instead of after the script has downloaded and run. React replaces it on its first render.
 */
export function addOpeningShell(outDir: string): void {
  const file = join(outDir, "index.html");
  const html = readFileSync(file, "utf8");
  if (html.includes('id="opening"')) return;
  const shell =
    `<div id="opening" style="flex:1;display:flex;align-items:center;justify-content:center;` +
    `background:${colors.background};color:${colors.ink};font:${fontSize.title}px Georgia,serif">` +
    `Shakeout Casebook</div>`;
  const root = '<div id="root"></div>';
  if (!html.includes(root)) throw new Error(`${file} has no empty root element to put the opening screen in`);
  writeFileSync(
    file,
    html
      .replace(root, `<div id="root">${shell}</div>`)
      .replace("<body>", `<body style="margin:0;background:${colors.background}">`),
  );
}
