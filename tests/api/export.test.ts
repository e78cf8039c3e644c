import request from "supertest";
import { beforeAll, describe, expect, it } from "vitest";
import { app, migrateOnce, shopWithCrew } from "./helpers";
import { newCasting, newMelt } from "./notebook-fixtures";

beforeAll(migrateOnce);

/** RFC 4180 reading, enough for the test: quoted fields, doubled quotes, CRLF or LF. */
function parseCsv(text: string): string[][] {
  const rows: string[][] = [[]];
  let field = "",
    quoted = false;
  for (let i = 0; i < text.length; i++) {
    const ch = text[i];
    if (quoted) {
      if (ch === '"' && text[i + 1] === '"') {
        field += '"';
        i++;
      } else if (ch === '"') quoted = false;
      else field += ch;
    } else if (ch === '"') quoted = true;
    else if (ch === "," || ch === "\n") {
      rows[rows.length - 1].push(field);
      field = "";
      if (ch === "\n") rows.push([]);
    } else if (ch !== "\r") field += ch;
  }
  if (field || rows[rows.length - 1].length) rows[rows.length - 1].push(field);
  return rows.filter((r) => r.length > 1);
}

const csvOf = async (res: request.Response) => {
  const [header, ...rows] = parseCsv(res.text.replace(/^\uFEFF/, ""));
  return rows.map((r) => Object.fromEntries(header.map((h, i) => [h, r[i]])));
};

describe("CSV export", () => {
  it("gives the owner one row per casting with melt conditions, marks and the latest diagnosis", async () => {
    const { owner, caster } = await shopWithCrew("Export Shop");
    const other = await shopWithCrew("Export Other Shop");
    await newCasting(other.caster, (await newMelt(other.caster)).id, { partName: "Not ours" });
    const melt = await newMelt(caster);
    const plate = await newCasting(caster, melt.id, {
      notes: '=HYPERLINK("http://example.invalid")',
      marks: [{ type: "misrun", location: "far-from-gate", severity: 3 }],
    });
    await newCasting(caster, melt.id, { partName: "Bracket, left", outcome: "good" });
    await caster.agent.post(`/api/diagnosis/castings/${plate.id}`);

    const res = await owner.agent.get("/api/export/castings.csv");
    expect(res.status).toBe(200);
    expect(res.headers["content-type"]).toMatch(/^text\/csv/);
    expect(res.headers["content-disposition"]).toMatch(/attachment; filename="castings-\d{4}-\d{2}-\d{2}\.csv"/);
    const rows = await csvOf(res);
    expect(rows.map((r) => r.part_name).sort()).toEqual(["Bracket, left", "Ribbed cover plate"]);
    const row = rows.find((r) => r.casting_id === String(plate.id))!;
    // A356.0 liquidus 615 °C ([mem] ASM Vol. 2): 700 °C pour is 85 °C of superheat.
    expect(row).toMatchObject({
      alloy: "A356.0",
      process: "lost-foam",
      pour_temp_c: "700",
      superheat_c: "85",
      humidity_pct: "45",
      coating_dried: "yes",
      min_section_mm: "4",
      riser: "no",
      outcome: "scrap",
      marks: "misrun at far-from-gate (severity 3)",
      photo_count: "0",
    });
    expect(row.likely_cause).not.toBe("");
    // A formula typed into a note stays text in a spreadsheet.
    expect(row.casting_notes.startsWith("'=")).toBe(true);
  });

  it("guards every text cell, the alloy and the likely cause included, and keeps negative numbers numbers", async () => {
    const { owner } = await shopWithCrew("Export Guard Shop");
    const alloy = {
      designation: "=1+2",
      family: "al-zn",
      solidusC: 375,
      liquidusC: 404,
      densityKgM3: 6300,
      shrinkAllowancePct: 1,
      sources: "@shop",
    };
    expect((await owner.agent.post("/api/alloys").send(alloy)).status).toBe(201);
    // A shop rule whose new cause's title starts with "-", so it shows up as the likely cause.
    const rule = await owner.agent.post("/api/rulebook/rules").send({
      defectTypes: ["flash"],
      locations: [],
      conditions: [{ fact: "sprueHeightMm", comparison: "above", value: 250 }],
      cause: { kind: "new", title: "-cmd|' /C calc'!A0", fixes: ["Weight the cope"] },
      weight: 0.99,
      because: "A {sprueHeightMm} mm sprue pushes on the cope",
      sources: ["shop experience"],
    });
    expect(rule.status).toBe(201);
    expect((await owner.agent.post(`/api/rulebook/rules/${rule.body.id}/publish`)).status).toBe(200);
    const melt = await newMelt(owner, { alloy: "=1+2", pourTempC: 430, meltTempC: 450, ambientTempC: -5 });
    const casting = await newCasting(owner, melt.id, {
      partName: "+plate",
      pattern: "@pattern",
      sprueHeightMm: 300,
      marks: [{ type: "flash", location: "side", severity: 2 }],
    });
    expect((await owner.agent.post(`/api/diagnosis/castings/${casting.id}`)).status).toBe(201);
    const [row] = await csvOf(await owner.agent.get("/api/export/castings.csv"));
    expect(row.alloy).toBe("'=1+2");
    expect(row.likely_cause).toBe("'-cmd|' /C calc'!A0");
    expect(row.part_name).toBe("'+plate");
    expect(row.pattern).toBe("'@pattern");
    expect(row.ambient_temp_c).toBe("-5");
    for (const cell of Object.values(row)) expect(cell).not.toMatch(/^[=+@\t\r]/);
  });

  it("adds the mentor's confirmed cause, the fixes tried and whether they worked", async () => {
    const { owner, mentor, caster } = await shopWithCrew("Export Learning Shop");
    const melt = await newMelt(caster);
    const plate = await newCasting(caster, melt.id, {
      marks: [{ type: "misrun", location: "far-from-gate", severity: 3 }],
    });
    const untouched = await newCasting(caster, melt.id, { partName: "Bracket", outcome: "good" });
    const said = await mentor.agent
      .post(`/api/review/castings/${plate.id}/confirmations`)
      .send({ causeText: "=Ladle lip froze over" });
    expect(said.status).toBe(201);
    const first = await caster.agent
      .post(`/api/followups/castings/${plate.id}/fixes`)
      .send({ fix: "Pour 60 °C hotter" });
    expect(first.status).toBe(201);
    // Whether a fix worked is judged on the next casting of the part, from a later melt.
    const next = await newCasting(caster, (await newMelt(caster, { pouredOn: "2026-02-02" })).id, {
      outcome: "rework",
    });
    const judged = await caster.agent
      .patch(`/api/followups/fixes/${first.body.id}`)
      .send({ nextCastingId: next.id, worked: "partly" });
    expect(judged.status).toBe(200);
    expect(
      (await caster.agent.post(`/api/followups/castings/${plate.id}/fixes`).send({ fix: "Vent the far end" })).status,
    ).toBe(201);

    const rows = await csvOf(await owner.agent.get("/api/export/castings.csv"));
    const row = rows.find((r) => r.casting_id === String(plate.id))!;
    // The cause in the mentor's words, guarded like every text cell; fixes in the order they were tried.
    expect(row.confirmed_cause).toBe("'=Ladle lip froze over");
    expect(row.fix_tried).toBe("Pour 60 °C hotter; Vent the far end");
    expect(row.fix_worked).toBe("partly; not judged");
    const plain = rows.find((r) => r.casting_id === String(untouched.id))!;
    expect([plain.confirmed_cause, plain.fix_tried, plain.fix_worked]).toEqual(["", "", ""]);
  });

  it("writes SI by default and the person's or the shop's units when asked, the unit in each column name", async () => {
    const { owner } = await shopWithCrew("Export Units Shop");
    const melt = await newMelt(owner);
    await newCasting(owner, melt.id);
    const si = (await csvOf(await owner.agent.get("/api/export/castings.csv")))[0];
    expect(si).toMatchObject({
      pour_temp_c: "700",
      min_section_mm: "4",
      sprue_height_mm: "200",
      foam_density_kg_m3: "20",
    });

    expect(
      (await owner.agent.put("/api/people/me/units").send({ temperature: "F", length: "in", mass: "lb" })).status,
    ).toBe(200);
    const mine = (await csvOf(await owner.agent.get("/api/export/castings.csv?units=mine")))[0];
    // Exact definitions (lib/units.ts): °F = °C × 9/5 + 32, 1 in = 25.4 mm, 1 lb = 0.45359237 kg, 1 ft = 0.3048 m.
    expect(mine).toMatchObject({
      melt_temp_f: "1328", // 720 °C
      pour_temp_f: "1292", // 700 °C
      superheat_f: "153", // 85 °C of superheat is a difference: × 9/5, no +32
      ambient_temp_f: "39", // 4 °C = 39.2 °F
      min_section_in: "0.157", // 4 mm
      sprue_height_in: "7.874", // 200 mm
      foam_density_lb_ft3: "1.25", // 20 kg/m³ = 1.2486 lb/ft³
    });
    expect(mine).not.toHaveProperty("pour_temp_c");

    // The shop's defaults: °F only; length and mass the shop left unset stay SI.
    expect((await owner.agent.patch("/api/shops/current/settings").send({ defaultTemperature: "F" })).status).toBe(200);
    const shop = (await csvOf(await owner.agent.get("/api/export/castings.csv?units=shop")))[0];
    expect(shop).toMatchObject({ pour_temp_f: "1292", min_section_mm: "4", foam_density_kg_m3: "20" });

    const bad = await owner.agent.get("/api/export/castings.csv?units=furlongs");
    expect(bad.status).toBe(400);
    expect(JSON.stringify(bad.body.error)).toMatch(/units must be si, mine or shop/);
  });

  it("is the owner's alone (403 for mentor and caster), and a shop with no castings gets the header only", async () => {
    const { owner, mentor, caster } = await shopWithCrew("Export Rules Shop");
    expect((await caster.agent.get("/api/export/castings.csv")).status).toBe(403);
    expect((await mentor.agent.get("/api/export/castings.csv")).status).toBe(403);
    expect((await request(app).get("/api/export/castings.csv")).status).toBe(401);
    const empty = await owner.agent.get("/api/export/castings.csv");
    expect(empty.status).toBe(200);
    expect(parseCsv(empty.text.replace(/^\uFEFF/, ""))).toHaveLength(1);
  });
});
