import { describe, expect, inject, it } from "vitest";
import { longShot, PHONE, seen, signedInAs, useBrowser, WIDE } from "./browser";

const baseUrl = inject("baseUrl");
const browser = useBrowser();

describe("calculators", () => {
  it("opens the pour-temperature calculator prefilled from a melt, works it out and saves it on the melt", async () => {
    const page = await signedInAs(browser(), baseUrl, PHONE, "caster");
    await page.goto(`${baseUrl}/melts`);
    await page.getByText(/melt/i).first().waitFor();
    const meltHref = await page
      .locator('a[href^="/melts/"]')
      .evaluateAll((as) => as.map((a) => a.getAttribute("href")).find((h) => h && /^\/melts\/\d+$/.test(h)));
    expect(meltHref).toBeTruthy();
    await page.goto(`${baseUrl}${meltHref}`);
    await page.getByRole("link", { name: "Pour temperature" }).click();
    await seen(page, "Transfer loss, furnace to mould");
    // The melt's alloy and process arrive chosen.
    expect(await page.getByRole("radio", { checked: true }).count()).toBeGreaterThanOrEqual(2);
    await page.getByLabel(/Transfer loss/).fill("30");
    await page.getByRole("button", { name: "Work it out" }).click();
    await seen(page, "Melt temperature to reach");
    await seen(page, /Source: rules\/compute\/pour-window\.ts/);
    await longShot(page, "calculator-pour-phone");
    await page.getByRole("button", { name: /^Save on melt/ }).click();
    await seen(page, /^Saved on melt/);
    await page.goto(`${baseUrl}${meltHref}`);
    await seen(page, /Pour temperature: Pour .* reach .* in the furnace/);
    await page.setViewportSize(WIDE);
    await page.goto(`${baseUrl}/melts/calculators/riser?shape=plate&lengthMm=125&widthMm=75&thicknessMm=20`);
    await page.getByRole("button", { name: "Work it out" }).click();
    await seen(page, "Riser diameter = height");
    await longShot(page, "calculator-riser-wide");
  });

  it("refuses a riser of negative volume with a message on the field", async () => {
    const page = await signedInAs(browser(), baseUrl, PHONE, "caster");
    await page.goto(`${baseUrl}/melts/calculators/riser?shape=typed`);
    await page.getByLabel(/^Volume/).fill("-5");
    await page.getByLabel(/^Cooling area/).fill("10");
    await page.getByRole("button", { name: "Work it out" }).click();
    await seen(page, "the volume is more than 0");
  });
});
