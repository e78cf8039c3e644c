import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { freePort, startLocalPostgres, type LocalPostgres } from "../../scripts/local-postgres";
import { coldLostFoamMelt } from "./notebook-fixtures";

/**
 * The database goes away under a running server and comes back. This file has a cluster of its
 * own (the other files' cluster is never stopped); the server reads DATABASE_URL on first use,
 * so pointing the environment at it before the app is loaded is enough.
 */
const parent = mkdtempSync(join(tmpdir(), "casebook-outage-"));
let pg: LocalPostgres;
let opts: Parameters<typeof startLocalPostgres>[0];
let h: typeof import("./helpers");
let server: typeof import("../../server/db");

beforeAll(async () => {
  opts = { dataDir: join(parent, "pg"), port: await freePort(), database: "casebook_outage", throwaway: true };
  pg = startLocalPostgres(opts);
  process.env.DATABASE_URL = pg.url;
  h = await import("./helpers");
  server = await import("../../server/db");
  await h.migrateOnce();
});

afterAll(async () => {
  await server?.closeDb();
  pg?.stop();
  rmSync(parent, { recursive: true, force: true });
});

describe("database outage", () => {
  it("answers 503 while PostgreSQL is away, recovers by itself, and keeps no partial write", async () => {
    const { caster } = await h.shopWithCrew("Outage");
    const statuses: number[] = [];
    const write = async (i: number) => {
      const res = await caster.agent.post("/api/melts").send({ ...coldLostFoamMelt, notes: `outage-run ${i}` });
      statuses.push(res.status);
      return res;
    };
    for (let i = 0; i < 5; i++) expect((await write(i)).status).toBe(201);

    pg.stop("immediate"); // no clean shutdown: pooled connections die under the server
    const during: number[] = [];
    for (let i = 5; i < 10; i++) {
      const res = await write(i);
      during.push(res.status);
      expect(res.body.error.message).toMatch(/database is not answering/);
    }
    expect(during).toEqual([503, 503, 503, 503, 503]);
    expect((await caster.agent.get("/api/health")).status).toBe(503);

    pg = startLocalPostgres(opts); // same data folder and port
    let recovered = false;
    for (let i = 10; i < 40 && !recovered; i++) recovered = (await write(i)).status === 201;
    expect(recovered).toBe(true);
    for (let i = 40; i < 45; i++) expect((await write(i)).status).toBe(201);
    expect(statuses.every((s) => s === 201 || s === 503)).toBe(true);

    // Every melt that exists is whole, and exactly the 201s were kept.
    const list = await server.db.query.melts.findMany();
    const kept = list.filter((m) => m.notes?.startsWith("outage-run"));
    expect(kept.length).toBe(statuses.filter((s) => s === 201).length);
    for (const m of kept) expect(m.pourTempC).toBe(coldLostFoamMelt.pourTempC);
  }, 120_000);
});
