import { mkdirSync } from "node:fs";
import { join } from "node:path";
import { chromium, type Browser, type Page } from "playwright-core";
import { afterAll, beforeAll, expect } from "vitest";
import { DEMO_PEOPLE } from "../../server/seed/demo-people";

/** Debian's chromium, headless, with the flags this closed network needs; playwright gives it a new empty profile. */
export async function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
    headless: true,
    args: [
      "--no-sandbox",
      "--disable-gpu",
      "--disable-quic",
      "--no-first-run",
      "--disable-background-networking",
      "--disable-component-update",
      "--disable-sync",
    ],
  });
}

export const PHONE = { width: 390, height: 844 };
export const WIDE = { width: 1280, height: 800 };

const shotsDir = join(import.meta.dirname, "screenshots");

/** Keeps a picture of the page for a person to look at (the folder is git-ignored). */
export async function shot(page: Page, name: string) {
  mkdirSync(shotsDir, { recursive: true });
  await page.screenshot({ path: join(shotsDir, `${name}.png`), fullPage: true });
}

export async function signIn(page: Page, baseUrl: string, email: string, password: string) {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
}

/** One browser for a test file: started before its tests, closed after them. Call at the file's top. */
export function useBrowser(): () => Browser {
  let browser: Browser | undefined;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });
  return () => browser!;
}

/** A new window of the given size, signed in as the demo person with that role. */
export async function signedInAs(
  browser: Browser,
  baseUrl: string,
  size: { width: number; height: number },
  role: string,
) {
  const person = DEMO_PEOPLE.find((p) => p.role === role)!;
  const page = await (await browser.newContext({ viewport: size })).newPage();
  await signIn(page, baseUrl, person.email, person.password);
  await expect.poll(() => page.getByTestId("active-role").textContent(), { timeout: 15000 }).toBe(role);
  return page;
}

/** Waits until some text is on the page. */
export const seen = (page: Page, text: string | RegExp) =>
  expect.poll(() => page.getByText(text).count(), { timeout: 15000 }).toBeGreaterThan(0);

/**
 * The app scrolls inside its own view, so a full-page picture would show one screen only: stretch
 * the window to the content's height for the picture (same width, so the same layout), then put it back.
 */
export async function longShot(page: Page, name: string) {
  const size = page.viewportSize()!;
  const tallest = await page.evaluate(() =>
    Math.max(...[...document.querySelectorAll("div")].map((d) => d.scrollHeight)),
  );
  await page.setViewportSize({ width: size.width, height: Math.min(6000, Math.max(size.height, tallest + 140)) });
  await page.waitForTimeout(300);
  await shot(page, name);
  await page.setViewportSize(size);
}
