import type { Page } from "playwright-core";
import { describe, expect, inject, it } from "vitest";
import { longShot, PHONE, shot, signedInAs, useBrowser, WIDE } from "./browser";

const baseUrl = inject("baseUrl");
const browser = useBrowser();

/** The scrolling view's full height and where the first cause's card starts in it, in CSS px. */
async function measure(page: Page) {
  return page.evaluate(() => {
    const scrollers = [...document.querySelectorAll("div")].filter((d) => d.scrollHeight > d.clientHeight + 10);
    const main = scrollers.sort((a, b) => b.scrollHeight - a.scrollHeight)[0];
    const cause = document.querySelector('[data-testid="cause-1"]');
    const top =
      cause && main ? cause.getBoundingClientRect().top - main.getBoundingClientRect().top + main.scrollTop : -1;
    return { pageHeight: main?.scrollHeight ?? document.body.scrollHeight, firstCauseY: Math.round(top) };
  });
}

/** A demo casting with a photo and marks, diagnosed through the API the page uses: everything the page can show. */
async function fullCasting(page: Page) {
  const list = await (await page.request.get(`${baseUrl}/api/castings?pageSize=100`)).json();
  const c = list.items.find((x: { markCount: number; photoCount: number }) => x.markCount > 0 && x.photoCount > 0);
  if (!c) throw new Error("no demo casting with a photo and marks");
  expect((await page.request.post(`${baseUrl}/api/diagnosis/castings/${c.id}`)).status()).toBe(201);
  return `${baseUrl}/melts/${c.meltId}/castings/${c.id}`;
}

describe("a casting's page on a phone", () => {
  it("puts the first likely cause within the first screen, or one tap away", async () => {
    const page = await signedInAs(browser(), baseUrl, PHONE, "caster");
    const url = await fullCasting(page);
    await page.goto(url);
    await expect.poll(() => page.getByTestId("cause-1").count(), { timeout: 15000 }).toBe(1);
    await page.waitForTimeout(500);
    const m = await measure(page);
    console.log(`casting page at 390 px: height ${m.pageHeight} px, first cause at y ${m.firstCauseY} px`);
    await shot(page, "phone-casting-first-screen");
    await longShot(page, "phone-casting-whole");
    const top = await page.getByTestId("top-cause").boundingBox();
    // Within the first screen: the compact header names the top cause; its link jumps to the causes.
    expect(top && top.y + top.height).toBeLessThanOrEqual(PHONE.height);
    await page.getByTestId("jump-causes").click();
    await page.waitForTimeout(600);
    const card = await page.getByTestId("cause-1").boundingBox();
    expect(card).not.toBeNull();
    expect(card!.y).toBeGreaterThanOrEqual(0);
    expect(card!.y).toBeLessThan(PHONE.height);
    await shot(page, "phone-casting-after-jump");
  });

  it("keeps the wide layout at 1280 px, with the top cause named near the top", async () => {
    const page = await signedInAs(browser(), baseUrl, WIDE, "mentor");
    await page.goto(await fullCasting(page));
    await expect.poll(() => page.getByTestId("cause-1").count(), { timeout: 15000 }).toBe(1);
    await page.waitForTimeout(500);
    const m = await measure(page);
    console.log(`casting page at 1280 px: height ${m.pageHeight} px, first cause at y ${m.firstCauseY} px`);
    await longShot(page, "wide-casting-whole");
    const top = await page.getByTestId("top-cause").boundingBox();
    expect(top!.y + top!.height).toBeLessThan(WIDE.height);
    // The photo and its marks keep their two panes.
    const photo = await page.getByTestId("casting-photo").first().boundingBox();
    const marks = await page.getByTestId("mark-list").boundingBox();
    expect(marks!.x).toBeGreaterThan(photo!.x + photo!.width - 1);
  });
});
