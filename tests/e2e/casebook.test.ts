import type { Page } from "playwright-core";
import { describe, expect, inject, it } from "vitest";
import { DEMO_PEOPLE } from "../../server/seed/demo-people";
import { PHONE, shot, signIn, useBrowser, WIDE } from "./browser";

/** The casebook on the demo shop: a misspelled defect still finds its cases, a chip narrows them. */
const baseUrl = inject("baseUrl");
const browser = useBrowser();

const caster = DEMO_PEOPLE.find((p) => p.role === "caster")!;
const total = async (page: Page) =>
  Number(((await page.getByTestId("casebook-total").textContent()) ?? "").replace(/\D/g, ""));

for (const [sizeName, size] of [
  ["phone", PHONE],
  ["wide", WIDE],
] as const) {
  describe(`casebook at ${sizeName} size (${size.width} px)`, () => {
    it("finds misruns from a misspelling, marks the word, and narrows with a process chip", async () => {
      const page = await (await browser().newContext({ viewport: size })).newPage();
      await signIn(page, baseUrl, caster.email, caster.password);
      await expect
        .poll(() => page.getByRole("searchbox", { name: "Search the casebook" }).count(), { timeout: 15000 })
        .toBe(1);
      await expect.poll(() => total(page), { timeout: 10000 }).toBeGreaterThan(10);
      await shot(page, `${sizeName}-casebook-all`);
      if (sizeName === "wide") {
        // Part names wrap in the table rather than being cut off ("Pump impeller ...").
        const clipped = await page.getByRole("cell").evaluateAll((cells) =>
          cells
            .flatMap((c) => [...c.querySelectorAll("div[dir], span, div")])
            .filter((t) => t.scrollHeight > t.clientHeight + 1 || t.scrollWidth > t.clientWidth + 1)
            .map((t) => t.textContent),
        );
        expect(clipped).toEqual([]);
      }

      await page.getByRole("searchbox", { name: "Search the casebook" }).fill("misrnu");
      await expect
        .poll(async () => (await page.getByTestId("search-hit").allTextContents()).join(" "), { timeout: 10000 })
        .toMatch(/misr/i);
      const found = await total(page);
      expect(found).toBeGreaterThanOrEqual(3);
      const rows = sizeName === "phone" ? page.getByTestId("case-card") : page.getByRole("row");
      expect(await rows.count()).toBeGreaterThanOrEqual(3);
      await shot(page, `${sizeName}-casebook-misspelled`);

      if (sizeName === "phone") await page.getByRole("button", { name: "Filters" }).click();
      const chip = page.getByRole("group", { name: "Process" }).getByRole("checkbox", { name: /lost foam/i });
      await chip.click();
      await expect.poll(() => chip.getAttribute("aria-checked")).toBe("true");
      await expect.poll(() => total(page), { timeout: 10000 }).toBeLessThan(found);
      expect(await total(page)).toBeGreaterThan(0);
      if (sizeName === "phone") await page.getByRole("button", { name: /^Show \d+ cases?$/ }).click();
      await shot(page, `${sizeName}-casebook-filtered`);

      // The question is in the URL: a reload (or the link sent to someone) shows the same cases.
      await expect.poll(() => new URL(page.url()).searchParams.get("q")).toBe("misrnu");
      expect(new URL(page.url()).searchParams.get("process")).toBe("lost-foam");
      const narrowed = await total(page);
      await page.reload();
      await expect.poll(() => total(page), { timeout: 15000 }).toBe(narrowed);
      expect(await page.getByRole("searchbox", { name: "Search the casebook" }).inputValue()).toBe("misrnu");

      await page.getByRole("searchbox", { name: "Search the casebook" }).fill("zzqx");
      await expect
        .poll(() => page.getByTestId("casebook-empty").textContent(), { timeout: 10000 })
        .toMatch(/No cases matching “zzqx” poured in lost foam yet/);
      await shot(page, `${sizeName}-casebook-empty`);
      await page.context().close();
    });
  });
}
