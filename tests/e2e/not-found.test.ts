import { describe, expect, inject, it } from "vitest";
import { PHONE, seen, shot, signedInAs, useBrowser, WIDE } from "./browser";

const baseUrl = inject("baseUrl");
const browser = useBrowser();

describe("an address the app does not have", () => {
  for (const [sizeName, size] of [
    ["phone", PHONE],
    ["wide", WIDE],
  ] as const) {
    it(`says so and leads back to the casebook (${sizeName})`, async () => {
      const page = await signedInAs(browser(), baseUrl, size, "caster");
      await page.goto(`${baseUrl}/no-such-page/here`);
      await seen(page, "Nothing at this address");
      // Our own page, not the framework's list of every route.
      expect(await page.getByText("sitemap", { exact: false }).count()).toBe(0);
      await shot(page, `${sizeName}-not-found`);
      await page.getByTestId("not-found-home").click();
      await expect.poll(() => new URL(page.url()).pathname, { timeout: 15000 }).toBe("/");
      await page.context().close();
    });
  }
});
