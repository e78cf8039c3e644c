import { execFileSync } from "node:child_process";
import { existsSync, readdirSync, statSync } from "node:fs";
import { join } from "node:path";

/** Source of the web app: a newer file here than dist/index.html means the export is stale. */
const SOURCES = ["app", "components", "hooks", "lib", "constants", "assets", "rules", "app.json", "package.json"];

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
  }
  return outDir;
}
