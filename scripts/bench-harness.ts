/**
 * What every HTTP benchmark stands on (bench-diagnose-http, bench-web, bench-load): a throwaway
 * PostgreSQL cluster in a temp folder, the environment a server reads, migrations and the built-in
 * alloys, and the real server, either in this process or as a child process of its own (so a load
 * generator here does not share the server's event loop, and /proc shows the server's memory alone).
 * `stop()` ends the server and the database and removes the folder. Prints nothing.
 */
import { spawn, type ChildProcess } from "node:child_process";
import { randomUUID } from "node:crypto";
import { mkdtempSync, rmSync } from "node:fs";
import type { Server } from "node:http";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { freePort, startLocalPostgres } from "./local-postgres";

export const ROOT = fileURLToPath(new URL("..", import.meta.url));

type Options = {
  /** Names the temp folder (casebook-bench-NAME-). */
  name: string;
  /** The server as a child process (scripts/bench-server.ts) instead of in this process. */
  child?: boolean;
  /** The exported web app to serve (in-process servers only). */
  webDir?: () => string;
  /** Once the environment is set, before any server module reads it (configuration is read once): a stand-in store. */
  before?: () => Promise<unknown>;
  /** Before the server starts, once the database is migrated: the demo shop. */
  prepare?: () => Promise<unknown>;
  /** More environment for the server (RATE_LIMIT, S3_*). */
  env?: Record<string, string>;
};

export type BenchGround = Awaited<ReturnType<typeof benchGround>>;

export async function benchGround(opts: Options) {
  const parent = mkdtempSync(join(tmpdir(), `casebook-bench-${opts.name}-`));
  const pg = startLocalPostgres({
    dataDir: join(parent, "pg"),
    port: await freePort(),
    database: "bench",
    throwaway: true,
  });
  const port = await freePort();
  const origin = `http://127.0.0.1:${port}`;
  Object.assign(process.env, {
    DATABASE_URL: pg.url,
    PORT: String(port),
    NODE_ENV: "test",
    PUBLIC_URL: origin,
    AUTH_SECRET_FILE: join(parent, "auth-secret"),
    UPLOAD_DIR: join(parent, "uploads"),
    ...opts.env,
  });
  await opts.before?.();
  // Imported only now: the server's modules read the environment set above on first use.
  const { connection, closeDb } = await import("../server/db");
  const { db, pool } = connection();
  const { applyMigrations } = await import("../db/migrate");
  const { ensureBuiltInAlloys } = await import("../server/alloys/service");
  await applyMigrations(db);
  await ensureBuiltInAlloys();
  await opts.prepare?.();

  let inProcess: Server | undefined;
  let child: ChildProcess | undefined;
  if (opts.child) child = await startChild();
  else {
    const { listen } = await import("../server/index");
    inProcess = await listen({ port, host: "127.0.0.1", webDir: opts.webDir?.() });
  }

  /** A new person, signed up through the API and made a member of `shopId` with it active: their cookie. */
  async function signedInto(shopId: string, role: "owner" | "mentor" | "caster" = "caster"): Promise<string> {
    const { getAuth } = await import("../server/auth/auth");
    const email = `bench-${randomUUID()}@bench.example`;
    const password = "bench-password-2026";
    const post = (path: string, body: object) =>
      fetch(`${origin}/api/auth/${path}`, {
        method: "POST",
        headers: { "content-type": "application/json", origin },
        body: JSON.stringify(body),
      });
    const made = await post("sign-up/email", { name: "Bench person", email, password });
    if (made.status !== 200) throw new Error(`sign-up answered ${made.status}: ${await made.text()}`);
    // Sign-up makes no session (server/people/auth-hooks.ts): sign in as the app does.
    const res = await post("sign-in/email", { email, password });
    if (res.status !== 200) throw new Error(`sign-in answered ${res.status}: ${await res.text()}`);
    const { user } = (await res.json()) as { user: { id: string } };
    await getAuth().api.addMember({ body: { userId: user.id, role, organizationId: shopId } });
    const cookie = res.headers
      .getSetCookie()
      .map((c) => c.split(";")[0])
      .join("; ");
    const active = await fetch(`${origin}/api/auth/organization/set-active`, {
      method: "POST",
      headers: { "content-type": "application/json", origin, cookie },
      body: JSON.stringify({ organizationId: shopId }),
    });
    if (active.status !== 200) throw new Error(`set-active answered ${active.status}`);
    return cookie;
  }

  async function startChild() {
    // BENCH_CPU_PROF=<folder>: the child writes a V8 CPU profile there when it stops (scripts/cpu-profile-summary.ts reads it).
    const profile = process.env.BENCH_CPU_PROF ? ["--cpu-prof", `--cpu-prof-dir=${process.env.BENCH_CPU_PROF}`] : [];
    const started = spawn(process.execPath, [...profile, "--import", "tsx", join(ROOT, "scripts/bench-server.ts")], {
      env: process.env,
      stdio: ["ignore", "pipe", "inherit"],
    });
    await new Promise<void>((resolve, reject) => {
      started.stdout!.on("data", (b: Buffer) => b.toString().includes("listening") && resolve());
      started.on("exit", (code) => reject(new Error(`bench server exited ${code}`)));
    });
    return started;
  }

  async function stopServer() {
    if (inProcess) {
      inProcess.closeAllConnections();
      await new Promise((r) => inProcess!.close(r));
      inProcess = undefined;
    }
    if (child && child.exitCode === null) {
      const gone = new Promise((r) => child!.once("exit", r));
      child.kill("SIGTERM");
      await gone;
    }
  }

  return {
    parent,
    pg,
    port,
    origin,
    db,
    pool,
    signedInto,
    /** The child server's process id, to read its memory (child servers only). */
    serverPid: () => child?.pid,
    /** Stops the server and starts it again on the same port and database. */
    async restart() {
      await stopServer();
      if (opts.child) child = await startChild();
      else {
        const { listen } = await import("../server/index");
        inProcess = await listen({ port, host: "127.0.0.1", webDir: opts.webDir?.() });
      }
    },
    async stop() {
      await stopServer();
      await closeDb();
      pg.stop();
      rmSync(parent, { recursive: true, force: true });
      rmSync(pg.dataDir, { recursive: true, force: true });
    },
  };
}

/** A shop and its owner as rows, then `size` cases seeded by bulk SQL (scripts/bench-search-data.ts). */
export async function benchShop(ground: BenchGround, size: number, opts: { triggersOff?: boolean } = {}) {
  const { createDb } = await import("../db/client");
  const { organization, user } = await import("../db/schema");
  const { seedShop, buildDocuments } = await import("./bench-search-data");
  const { sql } = await import("drizzle-orm");
  const shopId = randomUUID();
  const owner = randomUUID();
  const now = new Date();
  await ground.db
    .insert(organization)
    .values({ id: shopId, name: `Bench shop ${size}`, slug: `bench-${shopId}`, createdAt: now });
  await ground.db.insert(user).values({
    id: owner,
    name: "Bench owner",
    email: `${owner}@bench.example`,
    emailVerified: true,
    createdAt: now,
    updatedAt: now,
  });
  if (!opts.triggersOff) return seedShop(ground.db, size, size, shopId, owner);
  // With the triggers off, as a large import would: then the search documents and list keys in bulk.
  const seeding = createDb(ground.pg.url, { max: 1 });
  await seeding.pool.query("set session_replication_role = replica");
  const seeded = await seedShop(seeding.db, size, size, shopId, owner);
  await seeding.pool.end();
  await buildDocuments(ground.db, shopId);
  await ground.db.execute(sql`select list_keys_rebuild(${shopId})`);
  await ground.pool.query("vacuum analyze");
  return seeded;
}
