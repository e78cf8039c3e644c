import { execFileSync, spawnSync } from "node:child_process";
import { chownSync, existsSync, mkdirSync, readdirSync, realpathSync } from "node:fs";
import { createServer } from "node:net";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { installDebianPackages } from "./debian-packages";

/**
 * A PostgreSQL cluster of our own on 127.0.0.1, from Debian's server binaries: `npm start` keeps
 * one under .data/, the tests make a throwaway one. As root, initdb refuses to run, so the
 * cluster belongs to the `postgres` user and its binaries run through runuser.
 */
/** `stop("immediate")` kills the server without a clean shutdown (the fault test's power cut). */
export type LocalPostgres = {
  url: string;
  dataDir: string;
  port: number;
  stop: (mode?: "fast" | "immediate") => void;
};

const isRoot = process.getuid?.() === 0;

function lookForPgBin(): string | undefined {
  const onPath = spawnSync("sh", ["-c", "command -v initdb"], { encoding: "utf8" }).stdout.trim();
  // initdb on PATH may be a lone symlink; its real folder holds pg_ctl, psql and createdb too.
  if (onPath) return realpathSync(onPath).replace(/\/initdb$/, "");
  const base = "/usr/lib/postgresql";
  const versions = existsSync(base) ? readdirSync(base).sort((a, b) => Number(b) - Number(a)) : [];
  for (const v of versions) if (existsSync(join(base, v, "bin", "initdb"))) return join(base, v, "bin");
  return undefined;
}

/** The folder of initdb and pg_ctl; installs Debian's postgresql first when they are missing. */
export function findPgBin(): string {
  const found = lookForPgBin();
  if (found) return found;
  installDebianPackages(["postgresql"], "The local database (or set DATABASE_URL to a server you run)");
  const installed = lookForPgBin();
  if (!installed) throw new Error("PostgreSQL was installed but initdb was not found under /usr/lib/postgresql.");
  return installed;
}

function run(bin: string, args: string[]) {
  const cmd = isRoot ? "runuser" : bin;
  const full = isRoot ? ["-u", "postgres", "--", bin, ...args] : args;
  return execFileSync(cmd, full, { encoding: "utf8", stdio: ["ignore", "pipe", "pipe"] });
}

function makeOwnedDir(dir: string) {
  mkdirSync(dir, { recursive: true });
  if (isRoot) {
    const pgUser = execFileSync("id", ["-u", "postgres"], { encoding: "utf8" }).trim();
    const pgGroup = execFileSync("id", ["-g", "postgres"], { encoding: "utf8" }).trim();
    chownSync(dir, Number(pgUser), Number(pgGroup));
  }
}

/** As root the `postgres` user must reach the folder; a checkout under /root may not allow it. */
function reachableByPostgres(dir: string): boolean {
  if (!isRoot) return true;
  return spawnSync("runuser", ["-u", "postgres", "--", "test", "-w", dir]).status === 0;
}

export async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = createServer();
    srv.unref();
    srv.on("error", reject);
    srv.listen(0, "127.0.0.1", () => {
      const port = (srv.address() as { port: number }).port;
      srv.close(() => resolve(port));
    });
  });
}

function isRunning(bin: string, dataDir: string): boolean {
  try {
    run(join(bin, "pg_ctl"), ["status", "-D", dataDir]);
    return true;
  } catch {
    return false;
  }
}

/** Initialise (first time), start and create the database; returns its URL and a stop function. */
/** `throwaway` turns fsync off: only for test clusters, never for data anyone keeps. */
export function startLocalPostgres(opts: {
  dataDir: string;
  port: number;
  database: string;
  throwaway?: boolean;
}): LocalPostgres {
  const bin = findPgBin();
  let { dataDir } = opts;
  const parent = join(dataDir, "..");
  makeOwnedDir(parent); // .data/ belongs to whoever runs the cluster (postgres, when we are root)
  if (isRoot && !reachableByPostgres(parent)) {
    dataDir = join(tmpdir(), `shakeout-casebook-pg-${opts.port}`);
    console.warn(`The postgres user cannot write ${parent}; keeping the database in ${dataDir} instead.`);
  }
  if (!existsSync(join(dataDir, "PG_VERSION"))) {
    makeOwnedDir(dataDir);
    run(join(bin, "initdb"), ["-D", dataDir, "-U", "postgres", "--auth=trust", "-E", "UTF8", "--no-locale"]);
  }
  const socketDir = join(tmpdir(), `scb-pg-${opts.port}`);
  makeOwnedDir(socketDir);
  if (!isRunning(bin, dataDir)) {
    const logFile = join(dataDir, "server.log");
    run(join(bin, "pg_ctl"), [
      "start",
      "-w",
      "-t",
      "60",
      "-D",
      dataDir,
      "-l",
      logFile,
      "-o",
      `-k ${socketDir} -p ${opts.port} -c listen_addresses=127.0.0.1${opts.throwaway ? " -c fsync=off" : ""}`,
    ]);
  }
  const stop = (mode: "fast" | "immediate" = "fast") => {
    try {
      run(join(bin, "pg_ctl"), ["stop", "-D", dataDir, "-m", mode, "-w"]);
    } catch {
      /* already stopped */
    }
  };
  try {
    ensureDatabase(bin, opts.port, opts.database);
  } catch (err) {
    stop(); // never leave a server running behind a failed start
    throw err;
  }
  return { url: `postgres://postgres@127.0.0.1:${opts.port}/${opts.database}`, dataDir, port: opts.port, stop };
}

function ensureDatabase(bin: string, port: number, database: string) {
  const exists = run(join(bin, "psql"), [
    "-h",
    "127.0.0.1",
    "-p",
    String(port),
    "-U",
    "postgres",
    "-tAc",
    `SELECT 1 FROM pg_database WHERE datname = '${database}'`,
  ]).trim();
  if (exists !== "1") run(join(bin, "createdb"), ["-h", "127.0.0.1", "-p", String(port), "-U", "postgres", database]);
}
