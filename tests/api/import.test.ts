import { and, eq } from "drizzle-orm";
import request from "supertest";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "../../server/db";
import { castings, importedRows, melts } from "../../db/schema";
import { app, migrateOnce, shopWithCrew, type Person } from "./helpers";
import { dbFingerprint } from "./db-fingerprint";

beforeAll(migrateOnce);

/**
 * An old pour log as a spreadsheet saves it: °F and inches, yes/no words, labels instead of codes.
 * Row 4 pours A356 at 1000 °F (538 °C), below its 555 °C solidus ([mem] ASM Vol. 2, docs/foundry-facts.md),
 * row 5 has no part name, row 6 an alloy the shop does not have and row 7 a date in the wrong form.
 */
const LOG = [
  "Date,Alloy,Process,Pour temp (F),Thinnest section (in),Riser,Outcome,Part,Notes",
  "2025-03-01,A356.0,lost foam,1292,0.25,no,scrap,Ribbed cover plate,first try",
  "2025-03-01,A356.0,lost foam,1292,0.25,yes,good,Bracket,",
  "2025-03-08,A356.0,green sand,1000,0.5,no,scrap,Pump cover,too cold",
  "2025-03-08,A356.0,green sand,1350,0.5,no,good,,no name",
  "2025-03-09,Unobtainium,green sand,1350,0.5,no,good,Gear blank,",
  "09/03/2025,A356.0,green sand,1350,0.5,no,good,Gear blank,",
].join("\r\n");

const MAPPING = [
  { column: 0, field: "pouredOn" },
  { column: 1, field: "alloy" },
  { column: 2, field: "process" },
  { column: 3, field: "pourTemp", unit: "F" },
  { column: 4, field: "minSection", unit: "in" },
  { column: 5, field: "hasRiser" },
  { column: 6, field: "outcome" },
  { column: 7, field: "partName" },
  { column: 8, field: "castingNotes" },
];

const send = (p: Person, path: string, file: Buffer | string, mapping?: unknown, name = "pour-log.csv") => {
  const req = p.agent.post(path).attach("file", Buffer.from(file), name);
  return mapping === undefined ? req : req.field("mapping", JSON.stringify(mapping));
};
const shopRows = async (shopId: string) => ({
  melts: await db.$count(melts, eq(melts.shopId, shopId)),
  castings: await db.$count(castings, eq(castings.shopId, shopId)),
});

describe("importing an old pour log", () => {
  it("guesses the mapping, previews each row with the reasons for refusing it, and stores nothing", async () => {
    const { owner, shopId } = await shopWithCrew("Import Preview Shop");
    const res = await send(owner, "/api/import/preview", LOG);
    expect(res.status).toBe(200);
    expect(res.body.headers[3]).toBe("Pour temp (F)");
    // The header words pick the field and, where written, the unit.
    expect(res.body.mapping).toContainEqual({ column: 3, field: "pourTemp", unit: "F" });
    expect(res.body.mapping).toContainEqual({ column: 4, field: "minSection", unit: "in" });

    const preview = (await send(owner, "/api/import/preview", LOG, MAPPING)).body;
    expect(preview.mappingProblems).toEqual([]);
    expect(preview.counts).toEqual({ new: 2, "already-imported": 0, "repeated-in-file": 0, refused: 4 });
    const byLine = Object.fromEntries(preview.rows.map((r: { line: number }) => [r.line, r]));
    expect(byLine[2]).toMatchObject({ status: "new", partName: "Ribbed cover plate", pouredOn: "2025-03-01" });
    expect(byLine[4].problems["Pour temperature"]).toMatch(/solidus/);
    expect(byLine[5].problems).toEqual({ "Part name": "name the part" });
    expect(byLine[6].problems.Alloy).toMatch(/"Unobtainium" is not in the alloy table/);
    expect(byLine[7].problems["Poured on"]).toBe('"09/03/2025" is not a date as YYYY-MM-DD');
    expect(await shopRows(shopId)).toEqual({ melts: 0, castings: 0 });
  });

  it("imports the rows that pass in SI, one melt per melt, and a second import of the file adds nothing", async () => {
    const { owner, shopId } = await shopWithCrew("Import Run Shop");
    const first = await send(owner, "/api/import", LOG, MAPPING);
    expect(first.status).toBe(201);
    expect(first.body).toMatchObject({ imported: 2, melts: 1 });
    expect(first.body.refused.map((r: { line: number }) => r.line)).toEqual([4, 5, 6, 7]);

    const [plate] = await db
      .select({ c: castings, m: melts })
      .from(castings)
      .innerJoin(melts, eq(melts.id, castings.meltId))
      .where(and(eq(castings.shopId, shopId), eq(castings.partName, "Ribbed cover plate")));
    // 1292 °F = 700 °C (°C = (°F - 32) × 5/9) and 0.25 in = 6.35 mm (1 in = 25.4 mm): exact definitions.
    expect(plate.m.pourTempC).toBeCloseTo(700, 6);
    expect(plate.c.minSectionMm).toBeCloseTo(6.35, 6);
    expect(plate.m.process).toBe("lost-foam");
    expect(plate.c).toMatchObject({ hasRiser: false, outcome: "scrap", notes: "first try" });
    expect(await shopRows(shopId)).toEqual({ melts: 1, castings: 2 });

    const again = await send(owner, "/api/import", LOG, MAPPING);
    expect(again.status).toBe(201);
    expect(again.body.imported).toBe(0);
    expect(again.body.counts["already-imported"]).toBe(2);
    expect(await shopRows(shopId)).toEqual({ melts: 1, castings: 2 });
    // The same facts in other units are the same rows.
    const metric =
      "Date,Alloy,Process,Pour temp (C),Thinnest section (mm),Riser,Outcome,Part,Notes\r\n2025-03-01,A356.0,lost-foam,700,6.35,no,scrap,Ribbed cover plate,first try";
    const mapped = MAPPING.map((m) =>
      m.unit === "F" ? { ...m, unit: "C" } : m.unit === "in" ? { ...m, unit: "mm" } : m,
    );
    expect((await send(owner, "/api/import/preview", metric, mapped)).body.rows[0].status).toBe("already-imported");
    expect(await db.$count(importedRows, eq(importedRows.shopId, shopId))).toBe(2);
  });

  it("counts a row repeated within the file once", async () => {
    const { owner, shopId } = await shopWithCrew("Import Twice Shop");
    const lines = LOG.split("\r\n");
    const res = await send(owner, "/api/import", [lines[0], lines[1], lines[1]].join("\n"), MAPPING);
    expect(res.body).toMatchObject({ imported: 1, counts: { "repeated-in-file": 1 } });
    expect(await shopRows(shopId)).toEqual({ melts: 1, castings: 1 });
  });

  it("keeps each shop's fingerprints apart: another shop imports the same file in full", async () => {
    const a = await shopWithCrew("Import Shop A");
    const b = await shopWithCrew("Import Shop B");
    expect((await send(a.owner, "/api/import", LOG, MAPPING)).body.imported).toBe(2);
    expect((await send(b.owner, "/api/import", LOG, MAPPING)).body.imported).toBe(2);
    expect(await shopRows(b.shopId)).toEqual({ melts: 1, castings: 2 });
    const aCastings = await db.select({ meltId: castings.meltId }).from(castings).where(eq(castings.shopId, a.shopId));
    const aMelts = await db.select({ id: melts.id }).from(melts).where(eq(melts.shopId, a.shopId));
    for (const c of aCastings) expect(aMelts.map((m) => m.id)).toContain(c.meltId);
  });

  it("is the owner's alone: mentor and caster 403, no session 401, nothing stored", async () => {
    const { mentor, caster, shopId } = await shopWithCrew("Import Roles Shop");
    for (const p of [mentor, caster]) {
      expect((await send(p, "/api/import", LOG, MAPPING)).status).toBe(403);
      expect((await send(p, "/api/import/preview", LOG)).status).toBe(403);
    }
    const anon = await request(app).post("/api/import").attach("file", Buffer.from(LOG), "log.csv");
    expect(anon.status).toBe(401);
    expect(await shopRows(shopId)).toEqual({ melts: 0, castings: 0 });
  });

  it("answers 400 with a message to files that are not a pour log, storing nothing", async () => {
    const { owner } = await shopWithCrew("Import Bad Files Shop");
    const before = await dbFingerprint();
    const jpeg = Buffer.from([0xff, 0xd8, 0xff, 0xe0, 0, 16, 0x4a, 0x46, 0x49, 0x46, 0, 1, 0xc3, 0x28]);
    const cases: [string, Buffer | string, RegExp][] = [
      ["empty", "", /empty/],
      ["only blank lines", "\r\n\r\n", /empty/],
      ["header only", LOG.split("\r\n")[0], /no rows/],
      ["a NUL byte", LOG.replace("first try", "first\u0000try"), /not a CSV file/],
      ["a photo", jpeg, /not a CSV file/],
      ["one column of prose", "Poured a plate today\nIt came out well", /does not look like CSV/],
      ["an unclosed quote", `${LOG}\r\n2025-03-10,"A356.0,green sand`, /never closed/],
      ["10 MB", Buffer.alloc(10 * 1024 * 1024, "a,b\n"), /larger than 2 MB/],
    ];
    for (const [what, file, message] of cases)
      for (const path of ["/api/import/preview", "/api/import"]) {
        const res = await send(owner, path, file, MAPPING);
        expect(res.status, `${what} at ${path}`).toBe(400);
        expect(res.body.error.message, what).toMatch(message);
      }
    // No file at all, a mapping that is not JSON or misses a required field.
    expect((await owner.agent.post("/api/import").field("mapping", "[]")).body.error.message).toBe("No file was sent.");
    const notJson = await owner.agent
      .post("/api/import")
      .attach("file", Buffer.from(LOG), "a.csv")
      .field("mapping", "{");
    expect(notJson.body.error.fields.mapping).toBe("must be JSON");
    const short = await send(owner, "/api/import", LOG, MAPPING.slice(1));
    expect(short.status).toBe(400);
    expect(short.body.error.fields.mapping).toMatch(/map a column to "Poured on"/);
    const noUnit = await send(
      owner,
      "/api/import",
      LOG,
      MAPPING.map((m) => ({ column: m.column, field: m.field })),
    );
    expect(noUnit.body.error.fields.mapping).toMatch(/say the unit: C or F/);
    expect(await dbFingerprint()).toEqual(before);
  });
});
