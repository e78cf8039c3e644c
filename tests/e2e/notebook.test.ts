import { mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import type { Page } from "playwright-core";
import sharp from "sharp";
import { beforeAll, describe, expect, inject, it } from "vitest";
import { longShot, PHONE, seen, shot, signedInAs, useBrowser, WIDE } from "./browser";

const baseUrl = inject("baseUrl");
const files = mkdtempSync(join(tmpdir(), "casebook-notebook-e2e-"));
const browser = useBrowser();
let photoPath: string;

beforeAll(async () => {
  // A small JPEG drawn here: a grey plate with a darker patch, like a casting on the bench.
  const plate = Buffer.from(
    `<svg xmlns="http://www.w3.org/2000/svg" width="640" height="480"><rect width="640" height="480" fill="#c9b58f"/>` +
      `<rect x="120" y="90" width="400" height="300" rx="30" fill="#9aa0a6"/><circle cx="250" cy="200" r="18" fill="#5c6166"/></svg>`,
  );
  photoPath = join(files, "casting.jpg");
  writeFileSync(photoPath, await sharp(plate).jpeg({ quality: 80 }).toBuffer());
});
const signedIn = (size: { width: number; height: number }, role = "caster") =>
  signedInAs(browser(), baseUrl, size, role);

/** Clicks the photo at fractions of its size, as a person taps a spot. */
async function tapPhoto(page: Page, fx: number, fy: number) {
  const photo = page.getByTestId("casting-photo").first();
  const box = (await photo.boundingBox())!;
  await photo.click({ position: { x: box.width * fx, y: box.height * fy } });
}

/** Where a pin's centre sits, as fractions of the photo. */
async function pinAt(page: Page, n: number) {
  const photo = (await page.getByTestId("casting-photo").first().boundingBox())!;
  const pin = (await page.getByTestId(`pin-${n}`).boundingBox())!;
  return { x: (pin.x + pin.width / 2 - photo.x) / photo.width, y: (pin.y + pin.height / 2 - photo.y) / photo.height };
}

/**
 * expo-image-picker's web picker makes a hidden file input and clicks it; with a listener on the
 * file chooser, playwright catches that chooser and sets the file on that input.
 */
async function choosePhoto(page: Page, path: string) {
  const chooser = page.waitForEvent("filechooser");
  await page.getByTestId("choose-photo").click();
  await (await chooser).setFiles(path);
}

async function addMark(page: Page, fx: number, fy: number, defect: string, where: string) {
  await tapPhoto(page, fx, fy);
  await expect.poll(() => page.getByTestId("mark-editor").count()).toBe(1);
  // The form opens where it can be seen: its top inside the window, not below the screen's edge.
  const height = page.viewportSize()!.height;
  await expect
    .poll(async () => {
      const top = (await page.getByTestId("mark-editor").boundingBox())!.y;
      return top >= 0 && top < height * 0.6;
    })
    .toBe(true);
  await page.getByRole("radio", { name: defect, exact: true }).click();
  await page.getByRole("radio", { name: where, exact: true }).click();
  await page.getByRole("button", { name: "Add the mark" }).click();
  await expect.poll(() => page.getByTestId("mark-editor").count(), { timeout: 10000 }).toBe(0);
}

describe("the notebook at phone size (390 px)", () => {
  it("logs a melt, three castings, a photo with two marks that survive a reload, and the likely causes", async () => {
    const page = await signedIn(PHONE);
    await page.getByRole("tab", { name: "Melts" }).click();
    await page.getByTestId("new-melt").click();
    await seen(page, "Log a melt");
    await page.getByRole("radio", { name: "A356.0" }).click();
    await page.getByRole("radio", { name: "green sand" }).click();
    await page.getByRole("radio", { name: "clean scrap" }).click();
    await page.getByLabel("Hottest the melt got (°C)").fill("780");
    // Below A356.0's solidus (555 °C): refused next to the field before anything is sent.
    await page.getByLabel("Pour temperature (°C)").fill("500");
    let posts = 0;
    page.on("request", (r) => r.method() === "POST" && r.url().endsWith("/api/melts") && posts++);
    await page.getByTestId("save-melt").click();
    await seen(page, /at or below A356\.0's solidus/);
    expect(posts).toBe(0);
    await longShot(page, "phone-melt-form-error");
    await page.getByLabel("Pour temperature (°C)").fill("745");
    await page.getByLabel("Humidity (%)").fill("62");
    await page.getByTestId("save-melt").click();
    await seen(page, "Castings from this melt");
    expect(posts).toBe(1);

    // Three castings from one melt: the form stays open and keeps the part and sizes.
    await page.getByLabel("Part").fill("Test bracket 1");
    await page.getByLabel("Thinnest section (mm)").fill("4");
    await page.getByLabel("Thickest section (mm)").fill("20");
    for (const [n, outcome] of [
      [1, "scrap"],
      [2, "good"],
      [3, "needs rework"],
    ] as const) {
      await page.getByLabel("Part").fill(`Test bracket ${n}`);
      await page.getByRole("radio", { name: outcome }).click();
      await page.getByTestId("save-casting").click();
      await seen(page, `Saved Test bracket ${n}`);
    }
    await expect.poll(() => page.getByRole("link", { name: /Test bracket \d/ }).count()).toBe(3);
    await longShot(page, "phone-melt-with-castings");

    await page.getByRole("link", { name: /Test bracket 1/ }).click();
    await seen(page, "Photos and marks");
    const castingUrl = page.url();

    // A text file named like a photo is refused by its content (415), in plain words.
    const fake = join(files, "not-a-photo.jpg");
    writeFileSync(fake, "just some text, not an image\n".repeat(20));
    await choosePhoto(page, fake);
    await seen(page, /“not-a-photo\.jpg” is not a photo we can read\. Send a JPEG, PNG, WebP or HEIC picture\./);

    await choosePhoto(page, photoPath);
    await expect.poll(() => page.getByTestId("casting-photo").count(), { timeout: 20000 }).toBe(1);
    await addMark(page, 0.39, 0.42, "Gas porosity", "top");
    await addMark(page, 0.7, 0.7, "Shrinkage", "thick section");
    await expect.poll(() => page.getByTestId("pin-2").count()).toBe(1);

    await page.reload();
    await expect.poll(() => page.getByTestId("pin-2").count(), { timeout: 15000 }).toBe(1);
    expect(await page.getByTestId("pin-1").count()).toBe(1);
    const first = await pinAt(page, 1);
    expect(first.x).toBeCloseTo(0.39, 1);
    expect(first.y).toBeCloseTo(0.42, 1);
    expect(await page.getByTestId("mark-list").getByText("Gas porosity").count()).toBe(1);
    expect(await page.getByTestId("mark-list").getByText("Shrinkage").count()).toBe(1);
    // Severity by rings as well as in words for a screen reader, with a legend for the rings.
    expect(await page.getByLabel("Mark 1: Gas porosity, clear").count()).toBe(1);
    expect(await page.getByLabel("Pins: one ring slight, two rings clear, three rings severe").count()).toBe(1);
    await longShot(page, "phone-casting-marks");

    // Move mark 2: select it, then tap the new spot.
    await page.getByTestId("pin-2").click();
    await page.getByRole("button", { name: "Move on the photo" }).click();
    await tapPhoto(page, 0.2, 0.8);
    await expect.poll(async () => (await pinAt(page, 2)).x, { timeout: 10000 }).toBeLessThan(0.3);

    await page.getByTestId("find-causes").click();
    await expect.poll(() => page.getByTestId("cause-1").count(), { timeout: 20000 }).toBe(1);
    await page
      .getByTestId("cause-1")
      .getByRole("button", { name: /Why this cause/ })
      .click();
    await longShot(page, "phone-casting-causes");
    // A caster reads when the causes were worked out, not the rulebook version's hash.
    expect(await page.getByTestId("diagnosis").textContent()).toMatch(/Worked out/);
    expect(await page.getByTestId("diagnosis").textContent()).not.toMatch(/rules version/);
    expect(page.url()).toBe(castingUrl);
    await page.context().close();
  });
});

describe("the notebook at wide size (1280 px)", () => {
  it("shows the melts as a sortable table and a casting with its photo beside the marks", async () => {
    const page = await signedIn(WIDE, "mentor");
    await page.getByRole("tab", { name: "Melts" }).click();
    await expect.poll(() => page.getByRole("table").count(), { timeout: 15000 }).toBe(1);
    const firstAlloy = () => page.getByRole("row").nth(1).getByRole("cell").nth(1).textContent();
    await page.getByRole("columnheader", { name: /Alloy/ }).click();
    await expect.poll(() => page.getByRole("columnheader", { name: /Alloy ↑/ }).count()).toBe(1);
    // The header turns at once; the rows follow when the sorted page arrives (the last page stays meanwhile).
    const rowAlloys = () =>
      page.getByRole("row").evaluateAll((rows) => rows.slice(1).map((r) => r.children[1]?.textContent ?? ""));
    await expect
      .poll(
        async () => {
          const a = await rowAlloys();
          return a.join("|") === [...a].sort().join("|");
        },
        { timeout: 10000 },
      )
      .toBe(true);
    const alloys = await rowAlloys();
    expect(await firstAlloy()).toBe(alloys[0]);
    await shot(page, "wide-melt-table");

    await page.getByRole("row").nth(1).click();
    await seen(page, "Castings from this melt");
    await page
      .getByRole("link")
      .filter({ hasText: /marks?:|nothing marked/ })
      .first()
      .click();
    await seen(page, "Photos and marks");
    await seen(page, "Likely causes");
    await longShot(page, "wide-casting");
    // A mentor, who writes rules, can match the answer to a rulebook version.
    expect(await page.getByTestId("diagnosis").textContent()).toMatch(/rules version [0-9a-f]{8}/);

    // Dropping a photo file from the desktop onto the photo area uploads it.
    const photos = await page.getByTestId("casting-photo").count();
    const dropped = await page.evaluateHandle((b64) => {
      const data = new DataTransfer();
      data.items.add(
        new File([Uint8Array.from(atob(b64), (c) => c.charCodeAt(0))], "dropped.jpg", { type: "image/jpeg" }),
      );
      return data;
    }, readFileSync(photoPath).toString("base64"));
    await page.getByTestId("photo-drop-zone").dispatchEvent("drop", { dataTransfer: dropped });
    await expect.poll(() => page.getByTestId("casting-photo").count(), { timeout: 20000 }).toBe(photos + 1);
    await page.context().close();
  });

  it("shows temperatures in °F once a person chooses them, and sends °C", async () => {
    const page = await signedIn(WIDE, "owner");
    await page.getByRole("tab", { name: "More" }).click();
    // The person's own units (the shop's defaults for new members below have a °F chip too).
    const fahrenheit = page
      .getByRole("radiogroup", { name: "Temperatures", exact: true })
      .getByRole("radio", { name: "°F" });
    await fahrenheit.click();
    await expect.poll(() => fahrenheit.getAttribute("aria-checked")).toBe("true");
    await page.getByRole("tab", { name: "Melts" }).click();
    await seen(page, /\d °F/);
    await page.getByTestId("new-melt").click();
    await page.getByLabel("Pour temperature (°F)").fill("1373");
    const sent = page.waitForRequest((r) => r.method() === "POST" && r.url().endsWith("/api/melts"));
    await page.getByRole("radio", { name: "green sand" }).click();
    await page.getByTestId("save-melt").click();
    // 1373 °F = (1373 − 32) × 5/9 = 745 °C.
    expect((await sent).postDataJSON().pourTempC).toBeCloseTo(745, 6);
    await page.getByText("Castings from this melt").waitFor({ state: "visible", timeout: 15000 });
    await seen(page, "1373 °F");
    await shot(page, "wide-melt-in-fahrenheit");
    // The reasons behind a cause follow the person's units too: find a demo casting whose causes quote
    // a temperature, and read them on its page.
    type Snapshot = { result: { causes: { reasons: { template: string }[] }[] } };
    const quotesTemperature = (s: Snapshot) =>
      s.result.causes.some((c) => c.reasons.some((r) => /\{[a-zA-Z]*C\} °C/.test(r.template)));
    const list = await (await page.request.get(`${baseUrl}/api/castings?pageSize=100`)).json();
    let target: { id: number; meltId: number } | undefined;
    for (const c of list.items.filter((x: { markCount: number }) => x.markCount > 0)) {
      const snapshot: Snapshot = await (await page.request.post(`${baseUrl}/api/diagnosis/castings/${c.id}`)).json();
      if (quotesTemperature(snapshot)) {
        target = c;
        break;
      }
    }
    expect(target).toBeDefined();
    await page.goto(`${baseUrl}/melts/${target!.meltId}/castings/${target!.id}`);
    const whyButtons = page.getByRole("button", { name: /Why this cause/ });
    await expect.poll(() => whyButtons.count(), { timeout: 10000 }).toBeGreaterThan(0);
    while ((await whyButtons.count()) > 0) await whyButtons.first().click();
    // Only the reasons inside the cause cards here; fixes and cautions: tests/e2e/units.test.ts.
    const reasons = () =>
      page
        .locator('[data-testid^="cause-"]')
        .getByText(/^• /)
        .allTextContents()
        .then((t) => t.join(" "));
    await expect.poll(reasons, { timeout: 10000 }).toMatch(/\d °F/);
    expect(await reasons()).not.toMatch(/\d °C/);
    await page.getByRole("tab", { name: "More" }).click();
    const celsius = page
      .getByRole("radiogroup", { name: "Temperatures", exact: true })
      .getByRole("radio", { name: "°C" });
    await celsius.click();
    await expect.poll(() => celsius.getAttribute("aria-checked")).toBe("true");
    await page.context().close();
  });
});
