import { fileURLToPath } from "node:url";
import PDFDocument from "pdfkit";
import type { ConditionRow } from "../../lib/condition-rows";
import type { CaseSheet } from "./content";

/** The shipped Lora files (assets/fonts, SIL Open Font License), embedded so the sheet looks the same everywhere. */
const font = (name: string) => fileURLToPath(new URL(`../../assets/fonts/${name}`, import.meta.url));
const REGULAR = font("Lora_400Regular.ttf");
const SEMIBOLD = font("Lora_600SemiBold.ttf");

export const PAPER_SIZES = ["a4", "letter"] as const;
export type Paper = (typeof PAPER_SIZES)[number];

// The app's ink, muted and accent colours (constants/theme.ts), kept dark enough for a laser printer.
const INK = "#1F2328";
const MUTED = "#5C6166";
const ACCENT = "#A8481F";
const MARGIN_PT = 42; // about 15 mm: inside what office printers can reach on both papers
const PHOTO_MAX_H_PT = 230;

type Doc = InstanceType<typeof PDFDocument>;

function heading(doc: Doc, text: string) {
  // A heading never sits alone at the foot of a page.
  if (doc.y + 60 > doc.page.height - MARGIN_PT) doc.addPage();
  doc.moveDown(0.8).font("semibold").fontSize(12.5).fillColor(ACCENT).text(text, MARGIN_PT, doc.y);
  doc.moveDown(0.2).fillColor(INK);
}

function body(doc: Doc, text: string, opts: { muted?: boolean; indent?: number } = {}) {
  const indent = opts.indent ?? 0;
  doc
    .font("regular")
    .fontSize(9.5)
    .fillColor(opts.muted ? MUTED : INK)
    // A hanging block (x and width), not pdfkit's first-line indent, so wrapped lines stay under the first.
    .text(text, MARGIN_PT + indent, doc.y, { width: doc.page.width - 2 * MARGIN_PT - indent, paragraphGap: 1.5 });
}

/** Label and value, one a line, in a column; what was not recorded goes into one line after them. */
function conditions(doc: Doc, title: string, rows: ConditionRow[], x: number, width: number) {
  doc.font("semibold").fontSize(10).fillColor(INK).text(title, x, doc.y, { width });
  for (const r of rows.filter((row) => row.value !== null)) {
    doc.font("regular").fontSize(9.5).fillColor(MUTED).text(`${r.label}: `, x, doc.y, { width, continued: true });
    doc.fillColor(INK).text(r.value!);
  }
  const missing = rows.filter((r) => r.value === null).map((r) => r.label.toLowerCase());
  if (missing.length)
    doc
      .fillColor(MUTED)
      .text(`Not recorded: ${missing.join(", ")}.`, x, doc.y, { width })
      .fillColor(INK);
}

/** The melt beside the casting, each in half the width; the text goes on under the longer of the two. */
function conditionColumns(doc: Doc, melt: ConditionRow[], casting: ConditionRow[]) {
  const gap = 18;
  const half = (doc.page.width - 2 * MARGIN_PT - gap) / 2;
  // Both columns must start on one page: move on first when the taller would not fit.
  const tallest = Math.max(melt.length, casting.length) * 12 + 40;
  if (doc.y + tallest > doc.page.height - MARGIN_PT) doc.addPage();
  const top = doc.y;
  conditions(doc, "Melt", melt, MARGIN_PT, half);
  const meltEnd = doc.y;
  doc.y = top;
  conditions(doc, "Casting", casting, MARGIN_PT + half + gap, half);
  doc.x = MARGIN_PT;
  doc.y = Math.max(meltEnd, doc.y);
}

/** The photo fitted to the text width, with each placed mark as a numbered pin (the number matches the list). */
function photo(doc: Doc, p: NonNullable<CaseSheet["photo"]>) {
  const maxW = doc.page.width - 2 * MARGIN_PT;
  const scale = Math.min(maxW / p.width, PHOTO_MAX_H_PT / p.height);
  const w = p.width * scale;
  const h = p.height * scale;
  if (doc.y + h > doc.page.height - MARGIN_PT) doc.addPage();
  const top = doc.y;
  doc.image(p.jpeg, MARGIN_PT, top, { width: w, height: h });
  for (const pin of p.pins) {
    const cx = MARGIN_PT + pin.x * w;
    const cy = top + pin.y * h;
    doc.circle(cx, cy, 8).lineWidth(1.5).fillAndStroke(ACCENT, "#FFFFFF");
    doc
      .font("semibold")
      .fontSize(8.5)
      .fillColor("#FFFFFF")
      .text(String(pin.n), cx - 8, cy - 5, { width: 16, align: "center", lineBreak: false });
  }
  doc.x = MARGIN_PT;
  doc.y = top + h + 6;
  doc.fillColor(INK);
}

/** The case sheet as a PDF: a casting's photo and marks, conditions, ranked causes, the confirmed cause and the fix. */
export function caseSheetPdf(s: CaseSheet, paper: Paper, printedAt: Date): Promise<Buffer> {
  const doc = new PDFDocument({
    size: paper === "a4" ? "A4" : "LETTER",
    margin: MARGIN_PT,
    bufferPages: true,
    info: { Title: `Case sheet: ${s.partName}`, Creator: "Shakeout Casebook" },
  });
  doc.registerFont("regular", REGULAR);
  doc.registerFont("semibold", SEMIBOLD);
  const chunks: Buffer[] = [];
  doc.on("data", (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on("end", () => resolve(Buffer.concat(chunks)));
    doc.on("error", reject);
  });

  doc.font("regular").fontSize(9).fillColor(MUTED).text("CASE SHEET");
  doc.font("semibold").fontSize(20).fillColor(INK).text(s.partName);
  body(doc, s.subtitle, { muted: true });

  heading(doc, "Photo and marks");
  if (s.photo) photo(doc, s.photo);
  else body(doc, "No photo.", { muted: true });
  for (const m of s.marks) body(doc, m);
  if (!s.marks.length) body(doc, "No defects marked.", { muted: true });

  heading(doc, "Conditions");
  conditionColumns(doc, s.melt, s.casting);
  if (s.notes) body(doc, `Casting notes: ${s.notes}`);

  heading(doc, "Likely causes");
  if (!s.causes.length) body(doc, "Not diagnosed yet.", { muted: true });
  else body(doc, `Ranked by the rulebook on ${s.diagnosedAt}.`, { muted: true });
  s.causes.forEach((k, i) => {
    doc
      .moveDown(0.3)
      .font("semibold")
      .fontSize(10.5)
      .fillColor(INK)
      .text(`${i + 1}. ${k.title}  (${k.scorePct} %)`, MARGIN_PT, doc.y);
    for (const r of k.reasons) body(doc, `Why: ${r}`, { indent: 10 });
    for (const f of k.fixes) body(doc, `Fix to try: ${f}`, { indent: 10 });
  });

  heading(doc, "Confirmed cause");
  if (s.confirmed) {
    doc.font("semibold").fontSize(10.5).fillColor(INK).text(s.confirmed.title);
    body(doc, `Confirmed by ${s.confirmed.by}, ${s.confirmed.at}`, { muted: true });
    if (s.confirmed.note) body(doc, s.confirmed.note);
  } else body(doc, "Not confirmed by a mentor yet.", { muted: true });

  heading(doc, "Fix tried and how it came out");
  if (!s.fixes.length) body(doc, "No fix recorded yet.", { muted: true });
  for (const f of s.fixes) body(doc, f);

  heading(doc, "Cautions");
  for (const c of s.cautions) body(doc, c);
  body(
    doc,
    "Molten metal, damp tools or moulds, fumes and dust can hurt. These notes are general: follow local codes, " +
      "your suppliers' safety data sheets and trained practice.",
    { muted: true },
  );

  // Page numbers last, once the page count is known (bufferPages keeps every page open until now).
  const range = doc.bufferedPageRange();
  const stamp = printedAt.toISOString().slice(0, 10);
  for (let i = 0; i < range.count; i++) {
    doc.switchToPage(range.start + i);
    const bottom = doc.page.margins.bottom;
    doc.page.margins.bottom = 0; // writing inside the bottom margin would otherwise start a new page
    doc
      .font("regular")
      .fontSize(8)
      .fillColor(MUTED)
      .text(`${s.partName} · printed ${stamp} · page ${i + 1} of ${range.count}`, MARGIN_PT, doc.page.height - 28, {
        width: doc.page.width - 2 * MARGIN_PT,
        align: "center",
        lineBreak: false,
      });
    doc.page.margins.bottom = bottom;
  }
  doc.end();
  return done;
}
