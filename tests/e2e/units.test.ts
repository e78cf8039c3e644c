import { describe, expect, inject, it } from "vitest";
import { longShot, PHONE, seen, signedInAs, useBrowser, WIDE } from "./browser";

const baseUrl = inject("baseUrl");
const browser = useBrowser();

/** A figure followed by a metric unit: what a °F/in/lb person should not have to read. */
const METRIC_FIGURE = /\d\s*(°C|mm|kg\b|kg\/m³|m\/s)/;

describe("units in a °F/in/lb person's reasons, fixes and errors", () => {
  it("types °F and inch fractions, reads limits, reasons, fixes and cautions in °F and inches", async () => {
    const page = await signedInAs(browser(), baseUrl, PHONE, "caster");
    const us = { temperature: "F", length: "in", mass: "lb" };
    expect((await page.request.put(`${baseUrl}/api/people/me/units`, { data: us })).status()).toBe(200);
    try {
      await page.goto(`${baseUrl}/melts/new`);
      await seen(page, "Log a melt");
      await page.getByRole("radio", { name: "A356.0" }).click();
      await page.getByRole("radio", { name: "green sand" }).click();
      // The air can be below zero: its box asks for a keyboard with a minus sign.
      const air = page.getByLabel("Air temperature (°F)");
      expect(await air.getAttribute("inputmode")).toBe("text");
      await air.fill("-4");
      // Beyond the scale: the limit is said in °F (1,700 °C × 9/5 + 32 = 3,092 °F), before anything is sent.
      await page.getByLabel("Pour temperature (°F)").fill("3200");
      await page.getByTestId("save-melt").click();
      await seen(page, "above 3,092 °F");
      expect(await page.getByText(/°C/).count()).toBe(0);
      await longShot(page, "phone-units-melt-limit");
      // 1,290 °F = (1290 − 32) × 5/9 = 698.9 °C, under the 700-760 °C green-sand window (docs/foundry-facts.md).
      await page.getByLabel("Pour temperature (°F)").fill("1,290");
      const sent = page.waitForRequest((r) => r.method() === "POST" && r.url().endsWith("/api/melts"));
      await page.getByTestId("save-melt").click();
      const melt = (await sent).postDataJSON();
      expect(melt.pourTempC).toBeCloseTo(698.89, 2);
      // −4 °F = (−4 − 32) × 5/9 = −20 °C.
      expect(melt.ambientTempC).toBeCloseTo(-20, 6);
      await seen(page, "Castings from this melt");

      // Inches as casters write them; a slip gets told how to write them.
      await page.getByLabel("Part").fill("Vent cover");
      const thinnest = page.getByLabel("Thinnest section (in)");
      await thinnest.fill("1 3/2");
      await page.getByTestId("save-casting").click();
      await seen(page, /type inches as 1\.5, 1 1\/2, 1-1\/2 or 3\/4"/);
      await thinnest.fill("1/8");
      await page.getByLabel("Thickest section (in)").fill('1-1/2"');
      const cast = page.waitForRequest((r) => r.method() === "POST" && /\/api\/castings/.test(r.url()));
      await page.getByTestId("save-casting").click();
      const casting = (await cast).postDataJSON();
      // 1/8 in = 3.175 mm and 1 1/2 in = 38.1 mm (1 in = 25.4 mm exactly).
      expect(casting.minSectionMm).toBeCloseTo(3.175, 6);
      expect(casting.maxSectionMm).toBeCloseTo(38.1, 6);
      await seen(page, "Saved Vent cover");

      // A misrun at the thin wall, diagnosed through the API the page itself uses.
      const list = await (await page.request.get(`${baseUrl}/api/castings?pageSize=50`)).json();
      const target = list.items.find((c: { partName: string }) => c.partName === "Vent cover");
      const mark = { type: "misrun", location: "thin-section", severity: 3 };
      expect((await page.request.post(`${baseUrl}/api/marks/castings/${target.id}`, { data: mark })).status()).toBe(
        201,
      );
      expect((await page.request.post(`${baseUrl}/api/diagnosis/castings/${target.id}`)).status()).toBe(201);

      await page.goto(`${baseUrl}/melts/${target.meltId}/castings/${target.id}`);
      const whyButtons = page.getByRole("button", { name: /Why this cause/ });
      await expect.poll(() => whyButtons.count(), { timeout: 15000 }).toBeGreaterThan(0);
      while ((await whyButtons.count()) > 0) await whyButtons.first().click();
      // The fixes (tick boxes) and the reasons (bullets) of each cause; its sources are quoted as published.
      const cards = page.locator('[data-testid^="cause-"]');
      const causes = async () =>
        [
          ...(await cards.getByRole("checkbox").allTextContents()),
          ...(await cards.getByText(/^• /).allTextContents()),
        ].join(" ");
      // The thin wall in inches, and the rule's own figure too: 3-4 mm is 0.12-0.16 in.
      await expect.poll(causes, { timeout: 10000 }).toMatch(/Thinnest wall 0\.13 in, under the 0\.12-0\.16 in/);
      // The cold-pour fix's rise: 20-30 °C is 36-54 °F (9/5 per degree, no offset).
      expect(await causes()).toMatch(/by 36-54 °F/);
      expect(await causes()).not.toMatch(METRIC_FIGURE);
      // The cautions under the causes: the aluminium ceiling, 790 °C = 1,454 °F.
      const cautions = await page.getByText("Before you change the next pour").locator("..").innerText();
      expect(cautions).toMatch(/above about 1,454 °F/);
      expect(cautions).not.toMatch(METRIC_FIGURE);
      // The fixes offered for recording are the same sentences, in °F too.
      await seen(page, /^Pour hotter.*by 36-54 °F/);
      expect(await page.getByText(/by 20-30 °C/).count()).toBe(0);
      await longShot(page, "phone-units-casting");
      await page.setViewportSize(WIDE);
      await longShot(page, "wide-units-casting");
      // The wide form says the air's limit in °F too: 60 °C × 9/5 + 32 = 140 °F.
      await page.goto(`${baseUrl}/melts/new`);
      await seen(page, "Log a melt");
      await page.getByLabel("Air temperature (°F)").fill("150");
      await page.getByTestId("save-melt").click();
      await seen(page, "above 140 °F");
      await longShot(page, "wide-units-melt-limit");

      // A calculator takes inch fractions and answers in inches, rounded as a caster writes them.
      await page.setViewportSize(PHONE);
      await page.goto(`${baseUrl}/melts/calculators/riser?shape=plate`);
      await page.getByLabel("Length (in)").fill("5");
      await page.getByLabel("Width (in)").fill("3");
      const thickness = page.getByLabel(/^Thickness \(in\)/);
      expect(await thickness.getAttribute("inputmode")).toBe("text");
      await thickness.fill("3/4");
      await page.getByRole("button", { name: "Work it out" }).click();
      await seen(page, "Riser diameter = height");
      const result = await page.getByText("Riser diameter = height").locator("..").innerText();
      expect(result).toMatch(/\d in/);
      expect(result).not.toMatch(/\d\.\d{3} in/);
      expect(result).not.toMatch(METRIC_FIGURE);
      await longShot(page, "phone-units-riser");
      await page.setViewportSize(WIDE);
      await longShot(page, "wide-units-riser");

      // Trends: superheat bands are differences, 40-60 °C is 72-108 °F.
      await page.setViewportSize(PHONE);
      await page.goto(`${baseUrl}/trends`);
      await seen(page, "Defects by superheat");
      await seen(page, /^(under )?\d+(-\d+)? °F/);
      expect(await page.getByText(/^(under )?\d+(-\d+)? °C/).count()).toBe(0);
      await longShot(page, "phone-units-trends");
      await page.setViewportSize(WIDE);
      await longShot(page, "wide-units-trends");

      // A rule's page: its cause's fixes and its reason's figures in °F and inches, placeholders kept
      // (its sources are quoted as published).
      const pointsTo = () => page.getByText("It points to").locator("..").innerText();
      await page.setViewportSize(PHONE);
      await page.goto(`${baseUrl}/rulebook/misrun-thin-wall-sand`);
      await seen(page, /Reason shown: “Thinnest wall \{minSectionMm\} in, under the 0\.12-0\.16 in/);
      expect(await pointsTo()).not.toMatch(METRIC_FIGURE);
      await page.goto(`${baseUrl}/rulebook/fill-below-window`);
      await seen(page, /Reason shown: “Poured at \{pourTempC\} °F/);
      await seen(page, /raise the pour temperature by 36-54 °F/);
      await seen(page, /For walls of 0\.16 in or less/);
      expect(await pointsTo()).not.toMatch(METRIC_FIGURE);
      await longShot(page, "phone-units-rule");
      await page.setViewportSize(WIDE);
      await longShot(page, "wide-units-rule");
    } finally {
      await page.request.put(`${baseUrl}/api/people/me/units`, {
        data: { temperature: "C", length: "mm", mass: "kg" },
      });
      await page.context().close();
    }
  });
});
