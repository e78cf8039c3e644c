import { spawnSync } from "node:child_process";

/**
 * Installs Debian packages the product needs (PostgreSQL's server, chromium for the browser tests)
 * when they are missing, so `npm start` and `npm test` work on a fresh machine. As root apt-get runs
 * directly; otherwise through `sudo -n` (never a password prompt). Where neither works, the error
 * names the one command a person should run.
 */
const isRoot = process.getuid?.() === 0;

function canSudo(): boolean {
  return spawnSync("sudo", ["-n", "true"], { stdio: "ignore" }).status === 0;
}

function aptGet(args: string[], prefix: string[]) {
  const [cmd, ...rest] = [...prefix, "apt-get", ...args];
  const result = spawnSync(cmd, rest, {
    stdio: "inherit",
    env: { ...process.env, DEBIAN_FRONTEND: "noninteractive" },
  });
  return result.status === 0;
}

export function installDebianPackages(packages: string[], why: string): void {
  if (packages.length === 0) return;
  const command = `sudo apt-get install -y ${packages.join(" ")}`;
  const prefix = isRoot ? [] : canSudo() ? ["sudo", "-n"] : undefined;
  if (!prefix || spawnSync("sh", ["-c", "command -v apt-get"], { stdio: "ignore" }).status !== 0) {
    throw new Error(`${why} needs Debian's ${packages.join(", ")}, which are not installed.\nRun:  ${command}`);
  }
  console.log(`${why} needs Debian's ${packages.join(", ")}: installing (apt-get install -y ${packages.join(" ")})...`);
  // A fresh machine may have no package lists yet; update once, then install.
  if (!aptGet(["update", "-qq"], prefix) || !aptGet(["install", "-y", "-qq", ...packages], prefix)) {
    throw new Error(`Installing ${packages.join(", ")} failed (see above).\nRun:  ${command}`);
  }
}

/** Whether a Debian package is installed (dpkg knows it as installed). */
export function hasDebianPackage(name: string): boolean {
  const r = spawnSync("dpkg-query", ["-W", "-f=${Status}", name], { encoding: "utf8" });
  return r.status === 0 && r.stdout.includes("install ok installed");
}

/** Debian's chromium and the fonts pages are drawn with, for the browser tests. */
export function ensureChromium(executablePath = "/usr/bin/chromium"): void {
  const missing: string[] = [];
  if (spawnSync("test", ["-x", executablePath]).status !== 0) missing.push("chromium");
  if (!hasDebianPackage("fonts-liberation")) missing.push("fonts-liberation");
  installDebianPackages(missing, "The browser tests");
}
