import { describe, expect, inject, it } from "vitest";
import { longShot, PHONE, seen, signedInAs, useBrowser, WIDE } from "./browser";

const baseUrl = inject("baseUrl");
const browser = useBrowser();

describe("trends", () => {
  it("shows the demo shop's rates as bars with their counts in words, at 390 px and 1280 px", async () => {
    const page = await signedInAs(browser(), baseUrl, PHONE, "mentor");
    await page.goto(`${baseUrl}/trends`);
    await seen(page, "Defects by superheat");
    expect(await page.getByRole("img", { name: /castings had defects/ }).count()).toBeGreaterThan(0);
    await longShot(page, "trends-phone");
    await page.setViewportSize(WIDE);
    await page.getByRole("radio", { name: "lost foam" }).click();
    await seen(page, "Scrap by month");
    expect(page.url()).toContain("process=lost-foam"); // the filters live in the URL
    // The demo mentor confirmed causes and the caster tried fixes: both charts have bars.
    await seen(page, "Fixes tried and how they worked");
    expect(await page.getByRole("img", { name: /^Pour hotter.*tried 1 times; 1 worked/ }).count()).toBe(1);
    await longShot(page, "trends-wide");
    // A bar opens the castings behind it: the casebook with the same filters.
    await page.getByRole("link", { name: /^lost foam: .*Open these castings/ }).click();
    await expect.poll(() => page.url(), { timeout: 10000 }).toMatch(/\/\?process=lost-foam$/);
    await seen(page, "Ribbed cover plate");
  });
});
