import { execFileSync } from "node:child_process";
import { existsSync, readdirSync, statSync } from "node:fs";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { compressWebExport } from "./web-compress";
import { addOpeningShell } from "./web-shell";

/** Source of the web app (db/ too: the input schemas are built from its tables): a newer file here than dist/index.html means the export is stale. */
const SOURCES = [
  "index.ts",
  "app",
  "components",
  "hooks",
  "lib",
  "constants",
  "assets",
  "rules",
  "db",
  "app.json",
  "package.json",
];

function newestMtimeMs(path: string): number {
  if (!existsSync(path)) return 0;
  const st = statSync(path);
  if (!st.isDirectory()) return st.mtimeMs;
  let newest = st.mtimeMs;
  for (const entry of readdirSync(path)) newest = Math.max(newest, newestMtimeMs(join(path, entry)));
  return newest;
}

export function webBuildIsStale(root: string, outDir = join(root, "dist")): boolean {
  const index = join(outDir, "index.html");
  if (!existsSync(index)) return true;
  const built = statSync(index).mtimeMs;
  return SOURCES.some((s) => newestMtimeMs(join(root, s)) > built);
}

/** Builds the web export (expo export) when it is missing or older than the source. */
export function ensureWebBuild(root: string): string {
  const outDir = join(root, "dist");
  if (webBuildIsStale(root, outDir)) {
    console.log("Building the web app (about a minute the first time)...");
    execFileSync("npx", ["expo", "export", "--platform", "web", "--output-dir", "dist"], {
      cwd: root,
      stdio: ["ignore", "inherit", "inherit"],
      env: { ...process.env, CI: "1", EXPO_OFFLINE: "1", EXPO_NO_TELEMETRY: "1" },
    });
    addOpeningShell(outDir);
    const c = compressWebExport(outDir);
    console.log(`Compressed ${c.files} files: ${kb(c.bytes)} -> ${kb(c.brotliBytes)} with brotli.`);
  }
  return outDir;
}

const kb = (n: number) => `${(n / 1024).toFixed(0)} KB`;

// `npm run build:web`: always export afresh, then compress.
if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  const root = fileURLToPath(new URL("..", import.meta.url));
  const { rmSync } = await import("node:fs");
  rmSync(join(root, "dist"), { recursive: true, force: true });
  ensureWebBuild(root);
}
