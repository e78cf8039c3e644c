import { randomBytes } from "node:crypto";
import { chmodSync, linkSync, mkdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { dirname, resolve } from "node:path";

const MIN_CHARS = 32;

/**
 * The session secret of a workbench or test server that was given none: made once and kept in `file`
 * (mode 0600), so a restart, or a second server on the same folder, signs sessions with the same key.
 * Two servers starting at the same instant may both make one: each writes its own temporary file and
 * hard-links it into place, which succeeds for exactly one; the other reads the winner's secret.
 */
export function localSessionSecret(file: string): string {
  const path = resolve(file);
  const kept = readSecret(path);
  if (kept) return kept;
  mkdirSync(dirname(path), { recursive: true, mode: 0o700 });
  const draft = `${path}.${process.pid}.${randomBytes(4).toString("hex")}`;
  writeFileSync(draft, randomBytes(32).toString("hex"), { mode: 0o600, flag: "wx" });
  chmodSync(draft, 0o600); // the mode of a new file is narrowed by the umask, never widened; be sure
  try {
    linkSync(draft, path);
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code !== "EEXIST") throw err;
  } finally {
    rmSync(draft, { force: true });
  }
  const secret = readSecret(path);
  if (!secret) throw new Error(`The session secret in ${path} is shorter than ${MIN_CHARS} characters.`);
  return secret;
}

function readSecret(path: string): string | undefined {
  let text: string;
  try {
    text = readFileSync(path, "utf8").trim();
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code === "ENOENT") return undefined;
    throw err;
  }
  if (text.length < MIN_CHARS) {
    throw new Error(`The session secret in ${path} is shorter than ${MIN_CHARS} characters: remove the file.`);
  }
  return text;
}
