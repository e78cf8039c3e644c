import { mkdirSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import sharp from "sharp";
import request from "supertest";
import { extractText, getDocumentProxy } from "unpdf";
import { beforeAll, describe, expect, it } from "vitest";
import { app, migrateOnce, shopWithCrew, type Person } from "./helpers";
import { newCasting, newMelt } from "./notebook-fixtures";

beforeAll(migrateOnce);

const getPdf = (p: Person | null, url: string) =>
  (p ? p.agent.get(url) : request(app).get(url)).buffer(true).responseType("blob");

/** Keeps the file for a person to look at, beside the browser tests' pictures (the folder is git-ignored). */
function keep(name: string, bytes: Buffer) {
  const dir = join(import.meta.dirname, "..", "e2e", "screenshots");
  mkdirSync(dir, { recursive: true });
  writeFileSync(join(dir, name), bytes);
}

/** The sheet's text as a reader (or a search engine) gets it out of the file, and each page's size in points. */
async function readPdf(bytes: Buffer) {
  const pdf = await getDocumentProxy(new Uint8Array(bytes));
  const { text } = await extractText(pdf, { mergePages: true });
  const sizes = [];
  for (let i = 1; i <= pdf.numPages; i++) sizes.push((await pdf.getPage(i)).view.slice(2).map(Math.round));
  return { text: text.replace(/\s+/g, " "), sizes };
}

/** A casting as a shop would have it by the end of the loop: photo and a placed mark, causes, a mentor's word, a fix. */
async function wholeCase() {
  const crew = await shopWithCrew("Sheet Shop");
  const { caster, mentor } = crew;
  const melt = await newMelt(caster);
  const casting = await newCasting(caster, melt.id, { partName: "Ribbed cover plate" });
  const jpeg = await sharp({ create: { width: 600, height: 400, channels: 3, background: "#8a8d91" } })
    .jpeg()
    .toBuffer();
  const photo = await caster.agent.post(`/api/photos/castings/${casting.id}`).attach("photo", jpeg, "plate.jpg");
  expect(photo.status).toBe(201);
  const mark = await caster.agent
    .post(`/api/marks/castings/${casting.id}`)
    .send({ type: "misrun", location: "far-from-gate", severity: 3, photoId: photo.body.id, x: 0.8, y: 0.3 });
  expect(mark.status).toBe(201);
  const diagnosis = await caster.agent.post(`/api/diagnosis/castings/${casting.id}`);
  expect(diagnosis.status).toBe(201);
  const top = diagnosis.body.result.causes[0] as { id: string; title: string };
  const said = await mentor.agent
    .post(`/api/review/castings/${casting.id}/confirmations`)
    .send({ causeId: top.id, note: "Thin far corner froze first" });
  expect(said.status).toBe(201);
  const next = await newCasting(caster, (await newMelt(caster, { pouredOn: "2026-02-02" })).id, { outcome: "good" });
  const fix = await caster.agent
    .post(`/api/followups/castings/${casting.id}/fixes`)
    .send({ fix: "Poured 40 °C hotter", nextCastingId: next.id, worked: "yes" });
  expect(fix.status).toBe(201);
  return { ...crew, casting, top };
}

describe("the case sheet PDF", () => {
  it("prints the photo, marks, conditions in the reader's units, ranked causes, the confirmed cause and the fix", async () => {
    const { caster, casting, top } = await wholeCase();
    expect(
      (await caster.agent.put("/api/people/me/units").send({ temperature: "F", length: "in", mass: "lb" })).status,
    ).toBe(200);

    const res = await getPdf(caster, `/api/castings/${casting.id}/sheet.pdf?paper=letter`);
    expect(res.status).toBe(200);
    expect(res.headers["content-type"]).toBe("application/pdf");
    // Shown in the browser's own viewer: no framing, and nothing else its viewer could trip on.
    expect(res.headers["content-security-policy"]).toBe("frame-ancestors 'none'");
    expect(res.headers["x-frame-options"]).toBe("DENY");
    expect(res.headers["content-disposition"]).toBe(`inline; filename="case-sheet-${casting.id}-letter.pdf"`);
    const bytes = res.body as Buffer;
    keep("case-sheet-letter.pdf", bytes);
    expect(bytes.subarray(0, 5).toString()).toBe("%PDF-");
    // The photo is embedded as an image; the text is extracted from the file, not read from our own model.
    expect(bytes.includes(Buffer.from("/Subtype /Image"))).toBe(true);
    const { text, sizes } = await readPdf(bytes);
    // US Letter is 8.5 × 11 in = 612 × 792 pt (1 pt = 1/72 in, the PDF user unit; ISO 32000-1 §8.3.2.3).
    for (const s of sizes) expect(s).toEqual([612, 792]);
    expect(text).toContain("Ribbed cover plate");
    expect(text).toContain("1. Misrun, far from the gate, severe");
    // 700 °C is 1292 °F (°F = °C × 9/5 + 32); 4 mm is 0.157 in (1 in = 25.4 mm), written 0.16 in as a caster would, as the reader chose.
    expect(text).toContain("Pour temperature: 1292 °F");
    expect(text).toContain("Thinnest section: 0.16 in");
    expect(text).not.toContain("700 °C");
    expect(text).toContain(`1. ${top.title}`);
    expect(text).toMatch(/Why: .+°F/);
    expect(text).toContain("Fix to try:");
    expect(text).toContain("Confirmed cause");
    expect(text).toContain("Thin far corner froze first");
    expect(text).toContain("Poured 40 °C hotter: it worked (next casting 2 Feb 2026, good)");
    expect(text).toContain("safety data sheets");
    expect(text).toMatch(/page 1 of \d/);
  });

  it("comes on A4 by default and refuses a paper it does not know", async () => {
    const { owner } = await shopWithCrew("Sheet Paper Shop");
    const casting = await newCasting(owner, (await newMelt(owner)).id);
    const res = await getPdf(owner, `/api/castings/${casting.id}/sheet.pdf`);
    expect(res.status).toBe(200);
    keep("case-sheet-a4-bare.pdf", res.body as Buffer);
    const { text, sizes } = await readPdf(res.body as Buffer);
    // ISO 216 A4 is 210 × 297 mm = 595.28 × 841.89 pt.
    expect(sizes[0]).toEqual([595, 842]);
    expect(text).toContain("Not diagnosed yet.");
    expect(text).toContain("Not confirmed by a mentor yet.");
    expect(text).toContain("No photo.");
    const bad = await owner.agent.get(`/api/castings/${casting.id}/sheet.pdf?paper=tabloid`);
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.paper).toBe("paper must be a4 or letter");
  });

  it("is for members of the shop only: every role prints, another shop gets 404, no session 401", async () => {
    const { owner, mentor, caster, casting } = await wholeCase();
    const other = await shopWithCrew("Sheet Other Shop");
    const url = `/api/castings/${casting.id}/sheet.pdf`;
    for (const p of [owner, mentor, caster]) expect((await getPdf(p, url)).status).toBe(200);
    const theirs = await other.owner.agent.get(url);
    expect(theirs.status).toBe(404);
    expect(theirs.text).not.toContain("Ribbed");
    expect((await request(app).get(url)).status).toBe(401);
    expect((await caster.agent.get("/api/castings/0/sheet.pdf")).status).toBe(404);
  });
});
