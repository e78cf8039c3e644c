import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import type { Page } from "playwright-core";
import sharp from "sharp";
import { beforeAll, describe, expect, inject, it } from "vitest";
import { longShot, PHONE, seen, signedInAs, useBrowser, WIDE } from "./browser";

const baseUrl = inject("baseUrl");
const browser = useBrowser();
const files = mkdtempSync(join(tmpdir(), "casebook-nothing-lost-"));
const signedIn = (size: { width: number; height: number }, role = "caster") =>
  signedInAs(browser(), baseUrl, size, role);

/** A melt's note that no other test writes, so the shop's melts can be counted by it. */
const uniqueNote = (what: string) => `${what} ${Math.random().toString(36).slice(2, 8)}`;

async function meltsWithNote(page: Page, note: string): Promise<number> {
  const list = await (await page.request.get(`${baseUrl}/api/melts?pageSize=100`)).json();
  const details = await Promise.all(
    list.items.map((m: { id: number }) => page.request.get(`${baseUrl}/api/melts/${m.id}`).then((r) => r.json())),
  );
  return details.filter((m: { notes: string | null }) => m.notes === note).length;
}

async function openNewMelt(page: Page) {
  await page.getByRole("tab", { name: "Melts" }).click();
  await page.getByTestId("new-melt").click();
  await seen(page, "Log a melt");
  await expect.poll(() => page.getByTestId("save-melt").count()).toBe(1);
}

let bigPhoto: string;
let smallPhoto: string;
let pdf: string;
beforeAll(async () => {
  const svg = (w: number, h: number) =>
    Buffer.from(
      `<svg xmlns="http://www.w3.org/2000/svg" width="${w}" height="${h}"><rect width="${w}" height="${h}" fill="#b8a27a"/>` +
        `<circle cx="${w / 2}" cy="${h / 2}" r="${h / 4}" fill="#8d949a"/></svg>`,
    );
  bigPhoto = join(files, "big-plate.jpg");
  writeFileSync(bigPhoto, await sharp(svg(3600, 2400)).jpeg({ quality: 90 }).toBuffer());
  smallPhoto = join(files, "small-plate.png");
  writeFileSync(smallPhoto, await sharp(svg(800, 600)).png().toBuffer());
  pdf = join(files, "pour-log.pdf");
  writeFileSync(pdf, "%PDF-1.4\n1 0 obj << /Type /Catalog >> endobj\ntrailer << /Root 1 0 R >>\n%%EOF\n");
});

describe("nothing lost at the bench", () => {
  it("refuses a melt saved with nothing typed, in the form, before anything is sent", async () => {
    const page = await signedIn(PHONE);
    await openNewMelt(page);
    let posts = 0;
    page.on("request", (r) => r.method() === "POST" && r.url().endsWith("/api/melts") && posts++);
    await page.getByTestId("save-melt").click();
    await seen(page, /Nothing about this melt was recorded/);
    expect(posts).toBe(0);
    await longShot(page, "phone-empty-melt-refused");
    await page.context().close();
  });

  it("keeps a half-typed melt through a reload, and forgets it after saving", async () => {
    const page = await signedIn(PHONE);
    await openNewMelt(page);
    const note = uniqueNote("Reload mid-form");
    await page.getByRole("radio", { name: "clean scrap" }).click();
    await page.getByLabel("Pour temperature (°C)").fill("742");
    await page.getByLabel("Notes").fill(note);
    await page.waitForTimeout(300); // the draft is written as it is typed; give storage a moment
    await page.reload();
    await expect.poll(() => page.getByTestId("draft-restored").count(), { timeout: 15000 }).toBe(1);
    expect(await page.getByLabel("Pour temperature (°C)").inputValue()).toBe("742");
    expect(await page.getByLabel("Notes").inputValue()).toBe(note);
    expect(await page.getByRole("radio", { name: "clean scrap" }).getAttribute("aria-checked")).toBe("true");
    await longShot(page, "phone-melt-draft-restored");
    await page.getByTestId("save-melt").click();
    await seen(page, "Castings from this melt");
    expect(await meltsWithNote(page, note)).toBe(1);
    // Saved: a new form starts clean.
    await page.goto(`${baseUrl}/melts/new`);
    await expect.poll(() => page.getByTestId("save-melt").count(), { timeout: 15000 }).toBe(1);
    expect(await page.getByTestId("draft-restored").count()).toBe(0);
    expect(await page.getByLabel("Notes").inputValue()).toBe("");
    await page.context().close();
  });

  for (const [size, name] of [
    [PHONE, "phone"],
    [WIDE, "wide"],
  ] as const)
    it(`saves a melt offline, shows it waiting to send, and sends it once when back online (${name})`, async () => {
      const page = await signedIn(size);
      await openNewMelt(page);
      const note = uniqueNote("Offline save");
      await page.getByLabel("Pour temperature (°C)").fill("748");
      await page.getByLabel("Notes").fill(note);
      let posts = 0;
      page.on("request", (r) => r.method() === "POST" && r.url().endsWith("/api/melts") && posts++);
      await page.context().setOffline(true);
      await page.getByTestId("save-melt").click();
      const waiting = page.getByTestId("waiting-melts").filter({ visible: true });
      await expect.poll(() => waiting.count(), { timeout: 10000 }).toBe(1);
      await seen(page, /1 melt is waiting to send/);
      await longShot(page, `${name}-melt-waiting-to-send`);
      await page.waitForTimeout(1500);
      expect(posts).toBe(0);
      await page.context().setOffline(false);
      await expect.poll(() => page.getByTestId("waiting-melts").count(), { timeout: 20000 }).toBe(0);
      await expect.poll(() => meltsWithNote(page, note), { timeout: 10000 }).toBe(1);
      // Going offline and online again sends nothing more.
      await page.context().setOffline(true);
      await page.context().setOffline(false);
      await page.waitForTimeout(1500);
      expect(posts).toBe(1);
      expect(await meltsWithNote(page, note)).toBe(1);
      await page.context().close();
    });

  for (const [size, name] of [
    [PHONE, "phone"],
    [WIDE, "wide"],
  ] as const)
    it(`saves a casting offline on its melt's page and sends it once when back online (${name})`, async () => {
      const page = await signedIn(size);
      await openNewMelt(page);
      await page.getByLabel("Notes").fill(uniqueNote("Offline casting melt"));
      await page.getByTestId("save-melt").click();
      await seen(page, "Castings from this melt");
      const meltId = Number(page.url().split("/").pop());
      let posts = 0;
      page.on("request", (r) => r.method() === "POST" && r.url().includes("/api/castings/melts/") && posts++);
      await page.context().setOffline(true);
      await page.getByLabel("Part").fill("Offline bracket");
      await page.getByTestId("save-casting").click();
      await seen(page, /Kept Offline bracket on this device: waiting to send/);
      await expect.poll(() => page.getByTestId("waiting-castings").count()).toBe(1);
      await longShot(page, `${name}-casting-waiting-to-send`);
      await page.context().setOffline(false);
      await expect.poll(() => page.getByTestId("waiting-castings").count(), { timeout: 20000 }).toBe(0);
      await expect.poll(() => page.getByRole("link", { name: /Offline bracket/ }).count(), { timeout: 10000 }).toBe(1);
      const melt = await (await page.request.get(`${baseUrl}/api/melts/${meltId}`)).json();
      expect(melt.castings.map((c: { partName: string }) => c.partName)).toEqual(["Offline bracket"]);
      expect(posts).toBe(1);
      await page.context().close();
    });

  it("keeps a half-typed casting through a reload of its melt's page", async () => {
    const page = await signedIn(PHONE);
    await openNewMelt(page);
    await page.getByLabel("Notes").fill(uniqueNote("Casting draft melt"));
    await page.getByTestId("save-melt").click();
    await seen(page, "Castings from this melt");
    await page.getByLabel("Part").fill("Half-typed pulley");
    await page.getByLabel("Thinnest section (mm)").fill("6");
    await page.waitForTimeout(300);
    await page.reload();
    await expect.poll(() => page.getByTestId("draft-restored").count(), { timeout: 15000 }).toBe(1);
    expect(await page.getByLabel("Part").inputValue()).toBe("Half-typed pulley");
    expect(await page.getByLabel("Thinnest section (mm)").inputValue()).toBe("6");
    // "Start over" forgets it, here and after another reload.
    await page.getByRole("button", { name: "Start over" }).click();
    expect(await page.getByLabel("Part").inputValue()).toBe("");
    await page.reload();
    await expect.poll(() => page.getByLabel("Part").count(), { timeout: 15000 }).toBe(1);
    expect(await page.getByTestId("draft-restored").count()).toBe(0);
    expect(await page.getByLabel("Part").inputValue()).toBe("");
    await page.context().close();
  });

  it("archives a melt with an undo, hidden from the melts list meanwhile", async () => {
    const page = await signedIn(WIDE);
    await openNewMelt(page);
    const note = uniqueNote("To archive");
    await page.getByLabel("Notes").fill(note);
    await page.getByTestId("save-melt").click();
    await seen(page, "Castings from this melt");
    const meltUrl = page.url();
    const meltId = Number(meltUrl.split("/").pop());
    await page.getByTestId("archive-melt").click();
    await expect.poll(() => page.getByTestId("archived-notice").count(), { timeout: 10000 }).toBe(1);
    await seen(page, "This melt is archived.");
    await longShot(page, "wide-melt-archived-undo");
    const ids = async () =>
      ((await (await page.request.get(`${baseUrl}/api/melts?pageSize=100`)).json()).items as { id: number }[]).map(
        (m) => m.id,
      );
    expect(await ids()).not.toContain(meltId);
    await page.getByRole("button", { name: "Undo" }).click();
    await expect.poll(() => page.getByTestId("archived-notice").count(), { timeout: 10000 }).toBe(0);
    expect(await ids()).toContain(meltId);
    await page.context().close();
  });
});

describe("photos in and refused", () => {
  async function castingPage(page: Page) {
    await openNewMelt(page);
    await page.getByLabel("Notes").fill(uniqueNote("Photo melt"));
    await page.getByTestId("save-melt").click();
    await seen(page, "Castings from this melt");
    await page.getByLabel("Part").fill("Photo test plate");
    await page.getByTestId("save-casting").click();
    await seen(page, "Saved Photo test plate");
    await page.getByRole("link", { name: /Photo test plate/ }).click();
    await seen(page, "Photos and marks");
  }
  async function choose(page: Page, ...paths: string[]) {
    const chooser = page.waitForEvent("filechooser");
    await page.getByTestId("choose-photo").click();
    await (await chooser).setFiles(paths);
  }

  it("refuses a PDF with one message when chosen or dropped, takes several photos at once and shrinks a big one", async () => {
    const page = await signedIn(WIDE);
    await castingPage(page);
    const castingId = Number(page.url().split("/").pop());
    const errors: string[] = [];
    page.on("pageerror", (e) => errors.push(e.message));
    await choose(page, pdf);
    await seen(page, "“pour-log.pdf” is not a photo we can read. Send a JPEG, PNG, WebP or HEIC picture.");
    // Dropped on the photo area: the same words for the same file.
    await page.getByTestId("photo-drop-zone").evaluate((zone, text) => {
      const data = new DataTransfer();
      data.items.add(new File([text], "pour-log.pdf", { type: "application/pdf" }));
      zone.dispatchEvent(new DragEvent("drop", { dataTransfer: data, bubbles: true, cancelable: true }));
    }, "%PDF-1.4");
    await expect
      .poll(() => page.getByText("“pour-log.pdf” is not a photo we can read.", { exact: false }).count())
      .toBe(1);
    await longShot(page, "wide-photo-refused");

    await choose(page, bigPhoto, smallPhoto);
    await expect.poll(() => page.getByTestId("casting-photo").count(), { timeout: 30000 }).toBe(2);
    const detail = await (await page.request.get(`${baseUrl}/api/castings/${castingId}`)).json();
    const widths = detail.photos.map((p: { width: number }) => p.width).sort((a: number, b: number) => a - b);
    // 3600 px shrunk on the device to 2560 px on its long side (lib/photo-files.ts); 800 px sent as it was.
    expect(widths).toEqual([800, 2560]);
    expect(errors).toEqual([]);
    await page.context().close();
  });

  it("says the same at phone size", async () => {
    const page = await signedIn(PHONE);
    await castingPage(page);
    await choose(page, pdf);
    await seen(page, "“pour-log.pdf” is not a photo we can read. Send a JPEG, PNG, WebP or HEIC picture.");
    await longShot(page, "phone-photo-refused");
    await page.context().close();
  });
});
