import { randomUUID } from "node:crypto";
import type { Page } from "playwright-core";
import { describe, expect, inject, it } from "vitest";
import { longShot, PHONE, seen, useBrowser, WIDE } from "./browser";

const baseUrl = inject("baseUrl");
const browser = useBrowser();
const MELTS = 23; // more than one page of 20

/** A new person with a shop of its own holding MELTS melts, signed in in a new window of `size`. */
async function shopWithManyMelts(size: { width: number; height: number }): Promise<Page> {
  const page = await (await browser().newContext({ viewport: size })).newPage();
  const headers = { origin: baseUrl };
  const tag = randomUUID().slice(0, 8);
  const post = async (path: string, data: unknown) => {
    const res = await page.request.post(`${baseUrl}${path}`, { data, headers });
    expect(res.status(), await res.text()).toBeLessThan(300);
  };
  const email = `paging-${tag}@test.example`;
  const password = "correct-horse-9";
  await post("/api/auth/sign-up/email", { name: "Paging Caster", email, password });
  // Sign-up makes no session (server/people/auth-hooks.ts): sign in as the app does.
  await post("/api/auth/sign-in/email", { email, password });
  await post("/api/auth/organization/create", { name: "Long Pour Log Lab", slug: `long-log-${tag}` });
  for (let i = 0; i < MELTS; i++) {
    const day = new Date(Date.UTC(2026, 0, 1 + i)).toISOString().slice(0, 10);
    await post("/api/melts", { pouredOn: day, alloy: "A356.0", process: "green-sand", pourTempC: 720 + i });
  }
  await page.goto(`${baseUrl}/melts`);
  return page;
}

describe("the pour log pages by 'Show more'", () => {
  for (const [name, size] of [
    ["phone", PHONE],
    ["wide", WIDE],
  ] as const) {
    it(`shows the newest 20 melts, then the rest on 'Show more' (${name})`, async () => {
      const page = await shopWithManyMelts(size);
      await seen(page, "20 melts shown");
      await longShot(page, `${name}-melts-first-page`);
      // Newest first: the 23rd of January leads, the 4th closes the first page.
      const body = () => page.locator("body").innerText();
      expect(await body()).toMatch(/23 Jan/);
      expect(await body()).not.toMatch(/\b3 Jan/);
      await page.getByTestId("more-melts").click();
      await seen(page, `All ${MELTS} melts shown`);
      expect(await page.getByTestId("more-melts").count()).toBe(0);
      expect(await body()).toMatch(/\b1 Jan/);
      await longShot(page, `${name}-melts-all-shown`);
      await page.context().close();
    });
  }
});
