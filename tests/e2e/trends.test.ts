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
    await longShot(page, "trends-wide");
  });
});
