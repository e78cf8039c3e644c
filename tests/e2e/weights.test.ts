import { describe, expect, inject, it } from "vitest";
import { addDays, localDay } from "@/lib/dates";
import { longShot, PHONE, seen, signedInAs, useBrowser, WIDE } from "./browser";

const baseUrl = inject("baseUrl");
const browser = useBrowser();
const LB = 0.45359237; // kg per lb, the 1959 international pound (lib/units.ts)

describe("weights, yield and the day of the pour", () => {
  it("picks 'Poured on' from the calendar, takes weights in lb, shows the yield and stores kilograms", async () => {
    const page = await signedInAs(browser(), baseUrl, PHONE, "mentor");
    const lb = { temperature: "C", length: "mm", mass: "lb" };
    expect((await page.request.put(`${baseUrl}/api/people/me/units`, { data: lb })).status()).toBe(200);
    try {
      await page.goto(`${baseUrl}/melts/new`);
      await seen(page, "Log a melt");
      const day = page.getByLabel("Poured on", { exact: true });
      expect(await day.inputValue()).toBe(localDay());
      await seen(page, /, today$/);
      // A day past tomorrow is refused, typed as the schema says (lib/notebook-schemas.ts meltConflicts).
      await day.fill(addDays(localDay(), 5));
      await page.getByRole("radio", { name: "A356.0" }).click();
      await page.getByRole("radio", { name: "green sand" }).click();
      await page.getByLabel("Charge weight, into the furnace (lb)").fill("20");
      await page.getByLabel("Pour temperature (°C)").fill("720");
      await page.getByTestId("save-melt").click();
      await seen(page, "that date has not come yet");
      // The calendar (the browser's own date input) sets the box, and the words follow.
      const calendar = page.getByLabel("Poured on, from a calendar");
      expect(await calendar.getAttribute("max")).toBe(addDays(localDay(), 1));
      await calendar.fill(addDays(localDay(), -1));
      expect(await day.inputValue()).toBe(addDays(localDay(), -1));
      await expect.poll(() => page.getByTestId("poured-on-words").textContent()).toMatch(/, yesterday$/);
      await longShot(page, "phone-melt-date-picked");
      const sent = page.waitForRequest((r) => r.method() === "POST" && r.url().endsWith("/api/melts"));
      await page.getByTestId("save-melt").click();
      const melt = (await sent).postDataJSON();
      expect(melt.pouredOn).toBe(addDays(localDay(), -1));
      expect(melt.chargeWeightKg).toBeCloseTo(20 * LB, 9); // 9.072 kg
      await seen(page, "Castings from this melt");

      // A casting heavier than its pour is refused by the form, saying why.
      await page.getByLabel("Part").fill("Yield plaque");
      await page.getByRole("button", { name: /More details/ }).click();
      const castingWeight = page.getByLabel("Casting weight (cleaned) (lb)");
      const poured = page.getByLabel("Metal poured (with gating and risers) (lb)");
      await castingWeight.fill("7");
      await poured.fill("6.6");
      await page.getByTestId("save-casting").click();
      await seen(page, /weighs more than the metal poured into its mould/);
      // 4 lb from 6.6 lb is 60.6 %: the yield shows as typed, the same ratio as in kg (docs/calculator-facts.md).
      await castingWeight.fill("4");
      await expect.poll(() => page.getByTestId("casting-yield").textContent()).toMatch(/^Yield 61 %/);
      const cast = page.waitForRequest((r) => r.method() === "POST" && /\/api\/castings\/melts\//.test(r.url()));
      await page.getByTestId("save-casting").click();
      const casting = (await cast).postDataJSON();
      expect(casting.castingWeightKg).toBeCloseTo(4 * LB, 9); // 1.814 kg
      expect(casting.pouredWeightKg).toBeCloseTo(6.6 * LB, 9); // 2.994 kg
      await seen(page, "Saved Yield plaque");

      // The melt's page: the castings' yield and what of the 20 lb charge was poured (6.6 of 20 lb, 33 %).
      await seen(page, "Weights and yield");
      await seen(page, "61 %: 4 lb of castings from 6.6 lb poured");
      await seen(page, "6.6 lb of 20 lb, 33 %");
      await seen(page, "13.4 lb");
      await seen(page, /nothing marked · yield 61 %/);
      const meltId = Number(new URL(page.url()).pathname.split("/")[2]);
      const stored = await (await page.request.get(`${baseUrl}/api/melts/${meltId}`)).json();
      expect(stored.chargeWeightKg).toBeCloseTo(20 * LB, 9);
      expect(stored.castings[0].pouredWeightKg).toBeCloseTo(6.6 * LB, 9);
      await longShot(page, "phone-melt-yield");

      // The casting's own page says its weights and yield in lb.
      await page.goto(`${baseUrl}/melts/${meltId}/castings/${stored.castings[0].id}`);
      await seen(page, "Yield plaque");
      await page.getByRole("button", { name: /Sizes, gating and weights/ }).click();
      await seen(page, "6.6 lb");
      await seen(page, "61 %");
      await longShot(page, "phone-casting-weights");

      const wide = await signedInAs(browser(), baseUrl, WIDE, "mentor");
      await wide.goto(`${baseUrl}/melts/${meltId}`);
      await seen(wide, "Weights and yield");
      await longShot(wide, "wide-melt-yield");
      await wide.goto(`${baseUrl}/melts/new`);
      await seen(wide, "Log a melt");
      await wide.getByLabel("Poured on, from a calendar").fill("2026-03-14");
      await seen(wide, "Saturday 14 March 2026");
      await longShot(wide, "wide-melt-date-picked");
    } finally {
      await page.request.put(`${baseUrl}/api/people/me/units`, {
        data: { temperature: "C", length: "mm", mass: "kg" },
      });
    }
  });
});
