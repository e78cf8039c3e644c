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
    // (The alloy chips arrive with the shop's alloy list, a moment after the process chips.)
    await expect.poll(() => page.getByRole("radio", { checked: true }).count()).toBeGreaterThanOrEqual(2);
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

  it("opens every other calculator from an aluminium melt, prefilled, works each out and saves it on the melt", async () => {
    const page = await signedInAs(browser(), baseUrl, WIDE, "mentor");
    const melts = await (await page.request.get(`${baseUrl}/api/melts?pageSize=50`)).json();
    const melt = melts.items.find((m: { alloy: string; pourTempC: number | null }) => m.alloy === "A356.0");
    const meltUrl = `${baseUrl}/melts/${melt.id}`;
    // Values that read sensibly in mm or in; temperatures come prefilled from the melt, in the person's units.
    const steps: [string, (p: typeof page) => Promise<void>, string | RegExp][] = [
      [
        "Metal to melt",
        async (p) => {
          await p.getByRole("radio", { name: "pattern volume" }).click();
          await p.getByLabel(/^Pattern volume/).fill("500");
          await p.getByLabel(/^Casting yield/).fill("60");
          await p.getByLabel(/^Melt loss/).fill("5");
        },
        "Metal poured",
      ],
      ["Pattern size", async (p) => void (await p.getByLabel(/^Length/).fill("100")), /^Shrink rule/],
      [
        "Riser",
        async (p) => {
          await p.getByRole("radio", { name: "plate" }).click();
          await p.getByLabel(/^Length/).fill("125");
          await p.getByLabel(/^Width/).fill("75");
          await p.getByLabel(/^Thickness/).fill("20");
        },
        "Riser diameter = height",
      ],
      [
        "Gating",
        async (p) => {
          await p.getByLabel(/^Sprue height/).fill("200");
          await p.getByLabel(/^Sprue-base \(choke\) area/).fill("2.5");
          await p.getByRole("radio", { name: "a gating ratio" }).click();
          await p.getByRole("radio", { name: "1:2:4" }).click();
          await p.getByRole("radio", { name: "bottom" }).click();
        },
        "Ingate velocity",
      ],
      [
        "Hydrogen",
        async (p) => {
          // A melt logged by another test may have no melt temperature: 1300 is liquid A356 in °C or °F.
          const box = p.getByLabel(/^Melt temperature/);
          if (!(await box.inputValue())) await box.fill("1300");
        },
        /Upper bound/,
      ],
    ];
    for (const [title, fill, shows] of steps) {
      await page.goto(meltUrl);
      await page.getByRole("link", { name: title, exact: true }).click();
      await page.getByRole("button", { name: "Work it out" }).waitFor();
      await fill(page);
      await page.getByRole("button", { name: "Work it out" }).click();
      await seen(page, shows);
      await page.getByRole("button", { name: /^Save on melt/ }).click();
      await seen(page, /^Saved on melt/);
    }
    await page.goto(meltUrl);
    const saved = page.getByLabel("Saved results");
    for (const [title] of steps) await expect.poll(() => saved.getByText(`${title}:`).count()).toBeGreaterThan(0);
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
