import { existsSync } from "node:fs";
import type { Server } from "node:http";
import { resolve } from "node:path";
import { pathToFileURL } from "node:url";
import { createApp } from "./app";
import { closeDb } from "./db";
import { env } from "./env";
import { sweepOrphanPhotos } from "./photos/orphan-sweep";
import { warmUp } from "./warm-up";

/**
 * Starts the one Express process: API under /api, the web app from `webDir`, warmed first
 * (warm-up.ts: the pool's first connections and the search code). Once it listens, the
 * photo store is swept of objects no row names (left by a server killed mid-upload), in the background:
 * a store or database that is away only delays that to the next start.
 */
export async function listen(opts: { port: number; host: string; webDir?: string }): Promise<Server> {
  const app = createApp({ webDir: opts.webDir });
  await warmUp();
  return new Promise((resolve, reject) => {
    const server = app.listen(opts.port, opts.host, () => {
      resolve(server);
      sweepOrphanPhotos().catch((err: Error) => console.error(`Photo store sweep skipped: ${err.message}`));
    });
    server.on("error", reject);
  });
}

/**
 * `tsx server/index.ts`: one more app server on PORT and HOST, against a database that is already
 * migrated (DATABASE_URL) and the shared object store (S3_*): what each server behind a load balancer
 * runs, and what tests/api/two-servers.test.ts starts twice. It serves `dist/` when it has been built.
 */
async function runAlone() {
  const dist = resolve("dist");
  const server = await listen({ port: env.PORT, host: env.HOST, webDir: existsSync(dist) ? dist : undefined });
  console.log(`Shakeout Casebook server listening on http://${env.HOST}:${env.PORT}`);
  const stop = async () => {
    server.closeAllConnections();
    await new Promise((r) => server.close(r));
    await closeDb();
    process.exit(0);
  };
  process.once("SIGTERM", stop);
  process.once("SIGINT", stop);
}

if (process.argv[1] && import.meta.url === pathToFileURL(resolve(process.argv[1])).href) await runAlone();
