import { mkdirSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import type { Page } from "playwright-core";
import { extractText, getDocumentProxy } from "unpdf";
import { describe, expect, inject, it } from "vitest";
import { longShot, PHONE, seen, shot, signedInAs, useBrowser, WIDE } from "./browser";

const baseUrl = inject("baseUrl");
const browser = useBrowser();

/** The printed file's text and each page's size in points, read back out of the PDF chromium made. */
async function readPdf(bytes: Buffer) {
  const pdf = await getDocumentProxy(new Uint8Array(bytes));
  const { text } = await extractText(pdf, { mergePages: true });
  const sizes = [];
  for (let i = 1; i <= pdf.numPages; i++) sizes.push((await pdf.getPage(i)).view.slice(2).map(Math.round));
  return { text: text.replace(/\s+/g, " "), sizes };
}

/** Kept beside the screenshots for a person to look at (git-ignored). */
function keep(name: string, bytes: Buffer) {
  const dir = join(import.meta.dirname, "screenshots");
  mkdirSync(dir, { recursive: true });
  writeFileSync(join(dir, name), bytes);
}

/** A demo casting with marks taken through the loop by the API the pages use: diagnosed and confirmed. */
async function diagnosedCase(caster: Page, mentor: Page) {
  const list = await (await caster.request.get(`${baseUrl}/api/castings?pageSize=50`)).json();
  // The last such casting: the review test takes the first one with marks, and this one gets a confirmation.
  const target = list.items.findLast(
    (c: { markCount: number; photoCount: number }) => c.markCount > 0 && c.photoCount > 0,
  );
  const diagnosis = await caster.request.post(`${baseUrl}/api/diagnosis/castings/${target.id}`);
  expect(diagnosis.status()).toBe(201);
  const top = (await diagnosis.json()).result.causes[0] as { id: string; title: string };
  const said = await mentor.request.post(`${baseUrl}/api/review/castings/${target.id}/confirmations`, {
    data: { causeId: top.id, note: "Seen on the sheet test" },
  });
  expect(said.ok()).toBe(true);
  return { target, top, url: `${baseUrl}/melts/${target.meltId}/castings/${target.id}` };
}

describe("the printed case sheet", () => {
  it("prints the casting page without navigation or buttons, reasons open, whole, on A4 and Letter", async () => {
    const caster = await signedInAs(browser(), baseUrl, WIDE, "caster");
    const mentor = await signedInAs(browser(), baseUrl, WIDE, "mentor");
    const { target, top, url } = await diagnosedCase(caster, mentor);
    await caster.goto(url);
    await expect.poll(() => caster.getByTestId("confirmed-cause").count(), { timeout: 15000 }).toBe(1);
    await expect.poll(() => caster.getByTestId("case-sheet").isVisible(), { timeout: 15000 }).toBe(true);
    await longShot(caster, "wide-casting-with-sheet-actions");
    // On screen the reasons are folded away and the rail is there.
    expect(await caster.getByText("▸ Why this cause").count()).toBeGreaterThan(0);
    expect(await caster.getByRole("tab", { name: "Melts" }).isVisible()).toBe(true);
    expect(await caster.getByText("The melt", { exact: true }).isVisible()).toBe(false);

    await caster.emulateMedia({ media: "print" });
    await expect.poll(() => caster.getByTestId("case-sheet").isVisible()).toBe(false);
    expect(await caster.getByRole("tab", { name: "Melts" }).isVisible()).toBe(false);
    expect(await caster.getByRole("button", { name: "Find likely causes again" }).isVisible()).toBe(false);
    await seen(caster, "Sources:"); // the reasons opened for paper
    // Paper also carries the melt's conditions, which the screen shows on the melt's page.
    expect(await caster.getByText("The melt", { exact: true }).isVisible()).toBe(true);
    await shot(caster, "wide-casting-print-media");

    const a4 = await caster.pdf({ preferCSSPageSize: true, printBackground: true });
    keep("casting-print-a4.pdf", a4);
    const printed = await readPdf(a4);
    // ISO 216 A4 is 210 × 297 mm = 595.28 × 841.89 pt (1 pt = 1/72 in).
    for (const s of printed.sizes) expect(s).toEqual([595, 842]);
    expect(printed.text).toContain(target.partName);
    expect(printed.text).toContain(top.title);
    expect(printed.text).toContain("Sources:");
    expect(printed.text).toContain("Pour temperature");
    expect(printed.text).toContain("Seen on the sheet test"); // the confirmed cause's note, after the causes
    // Nothing cut off at the first page's foot: the last printed section is there, the screen's extras are not.
    expect(printed.text).toContain("Fixes tried");
    for (const gone of ["Casebook", "Rulebook", "Download PDF", "Similar", "Add a note or question"])
      expect(printed.text).not.toContain(gone);

    await caster.emulateMedia({ media: "screen" });
    await caster.getByRole("radiogroup", { name: "Case sheet paper" }).getByRole("radio", { name: "Letter" }).click();
    await caster.emulateMedia({ media: "print" });
    const letter = await caster.pdf({ preferCSSPageSize: true, printBackground: true });
    keep("casting-print-letter.pdf", letter);
    // US Letter is 8.5 × 11 in = 612 × 792 pt.
    for (const s of (await readPdf(letter)).sizes) expect(s).toEqual([612, 792]);

    // The server's PDF of the same casting follows the paper chosen.
    const pdf = await caster.request.get(`${baseUrl}/api/castings/${target.id}/sheet.pdf?paper=letter`);
    expect(pdf.headers()["content-type"]).toBe("application/pdf");
    expect((await readPdf(await pdf.body())).text).toContain(top.title);
    await caster.context().close();
    await mentor.context().close();
  });

  it("offers the sheet on a phone too", async () => {
    const caster = await signedInAs(browser(), baseUrl, PHONE, "caster");
    const list = await (await caster.request.get(`${baseUrl}/api/castings?pageSize=5`)).json();
    const c = list.items[0];
    await caster.goto(`${baseUrl}/melts/${c.meltId}/castings/${c.id}`);
    await expect.poll(() => caster.getByTestId("sheet-pdf").isVisible(), { timeout: 15000 }).toBe(true);
    await shot(caster, "phone-casting-sheet-actions");
    await caster.context().close();
  });
});
