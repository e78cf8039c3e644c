import type { Page } from "playwright-core";
import { describe, expect, inject, it } from "vitest";
import { PHONE, seen, shot, signedInAs, useBrowser, WIDE } from "./browser";

/**
 * The exported app under its Content-Security-Policy (server/http/security-headers.ts): the main
 * screens draw, fonts and photos load, and Chromium reports no violation on any of them.
 */
const baseUrl = inject("baseUrl");
const browser = useBrowser();

/** Every CSP refusal Chromium reports: in the console ("Refused to ...") and as DOM violation events. */
async function watchViolations(page: Page) {
  const refused: string[] = [];
  page.on("console", (m) => {
    if (/Refused to|Content Security Policy/i.test(m.text())) refused.push(m.text());
  });
  page.on("pageerror", (e) => refused.push(`page error: ${e.message}`));
  await page.addInitScript(() => {
    document.addEventListener("securitypolicyviolation", (e) =>
      console.error(`Refused to load ${e.blockedURI} (${e.violatedDirective}) by Content Security Policy`),
    );
  });
  return refused;
}

for (const [sizeName, size] of [
  ["phone", PHONE],
  ["wide", WIDE],
] as const) {
  describe(`the app under its content policy at ${sizeName} size (${size.width} px)`, () => {
    it("signs in, shows melts, a casting with its photo, the casebook, rulebook and trends with no refusal", async () => {
      const context = await browser().newContext({ viewport: size });
      const first = await context.newPage();
      const refused = await watchViolations(first);
      await first.goto(`${baseUrl}/sign-in`);
      await seen(first, "Sign in");
      await first.close();

      const page = await signedInAs(browser(), baseUrl, size, "mentor");
      refused.push(...(await watchViolations(page)));
      const headers = (await page.request.get(`${baseUrl}/`)).headers();
      expect(headers["content-security-policy"]).toContain("frame-ancestors 'none'");

      await page.goto(`${baseUrl}/melts`);
      await seen(page, /Melts/);
      const list = await (await page.request.get(`${baseUrl}/api/castings?pageSize=50`)).json();
      const withPhoto = list.items.find((c: { photoCount: number }) => c.photoCount > 0);
      if (!withPhoto) throw new Error("the demo shop has no casting with a photo");
      await page.goto(`${baseUrl}/melts/${withPhoto.meltId}/castings/${withPhoto.id}`);
      await seen(page, "Photos and marks");
      // The photo arrived and decoded (a refused image stays 0 px wide).
      await expect
        .poll(
          () =>
            page
              .locator("img")
              .evaluateAll((imgs) =>
                imgs.some((i) => (i as HTMLImageElement).naturalWidth > 0 && i.getAttribute("src")?.includes("/api/")),
              ),
          { timeout: 15000 },
        )
        .toBe(true);
      // Lora came from our own files (font-src 'self').
      await expect
        .poll(() => page.evaluate(() => document.fonts.check("16px Lora-SemiBold")), { timeout: 15000 })
        .toBe(true);
      await shot(page, `${sizeName}-csp-casting`);

      for (const [path, text] of [
        ["/", /Search the casebook|casebook/i],
        ["/rulebook", /Rulebook|rule/i],
        ["/trends", /Trends|defect rate/i],
      ] as const) {
        await page.goto(`${baseUrl}${path}`);
        await seen(page, text);
        await page.waitForTimeout(500);
      }
      await shot(page, `${sizeName}-csp-trends`);
      expect(refused).toEqual([]);
      await context.close();
      await page.context().close();
    });
  });
}
