// `npm run bench:web`: the web app as a phone sees it. Builds the export when stale, starts the real
// server on a throwaway database with the demo shop, and drives Debian's chromium at 390 x 844 with the
// CPU slowed 4x through the DevTools protocol. Prints figures beside their aims; asserts nothing.
import { chromium, type CDPSession, type Page } from "playwright-core";
import { benchGround, ROOT } from "./bench-harness";
import { ensureLocalObjectStore } from "./local-object-store";
import { ensureWebBuild } from "./web-build";

delete process.env.S3_ENDPOINT; // the demo photos go to a stand-in with the throwaway database
let objectStore: Awaited<ReturnType<typeof ensureLocalObjectStore>> | undefined;
const ground = await benchGround({
  name: "web",
  webDir: () => ensureWebBuild(ROOT),
  before: async () => {
    objectStore = await ensureLocalObjectStore(ROOT);
  },
  prepare: async () => {
    const { seedDemoShop } = await import("../server/seed/seed");
    await seedDemoShop();
  },
});
const baseUrl = ground.origin;
const { DEMO_PEOPLE } = await import("../server/seed/demo-people");

/** Bytes on the wire (headers and compressed bodies) counted from the DevTools network events. */
function countBytes(cdp: CDPSession) {
  const counter = { bytes: 0, requests: 0 };
  cdp.on("Network.loadingFinished", (e) => {
    counter.bytes += e.encodedDataLength;
    counter.requests += 1;
  });
  return counter;
}

async function firstPaintMs(page: Page): Promise<number> {
  return page.evaluate(() => performance.getEntriesByName("first-contentful-paint")[0]?.startTime ?? Number.NaN);
}

const browser = await chromium.launch({
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
try {
  const context = await browser.newContext({ viewport: { width: 390, height: 844 } });
  const page = await context.newPage();
  const cdp = await context.newCDPSession(page);
  await cdp.send("Network.enable");
  await cdp.send("Emulation.setCPUThrottlingRate", { rate: 4 });
  const first = countBytes(cdp);

  await page.goto(`${baseUrl}/sign-in`, { waitUntil: "networkidle" });
  await page.getByLabel("E-mail").waitFor();
  // The first paint is the opening screen from index.html; the form appears once the script has run.
  const formMs = await page.evaluate(() => performance.now());
  const firstLoad = { ...first };
  const fcpMs = await firstPaintMs(page);

  const owner = DEMO_PEOPLE[0];
  await page.getByLabel("E-mail").fill(owner.email);
  await page.getByLabel("Password").fill(owner.password);
  const submitAt = Date.now();
  await page.getByRole("button", { name: "Sign in" }).click();
  // Signed in, the app opens on the casebook; one tap on Melts shows the pour log.
  await page
    .getByRole("link", { name: "Melts" })
    .or(page.getByText("Melts", { exact: true }))
    .first()
    .click();
  // A melt card links to /melts/<id>; the casebook's hidden cards link deeper, so they do not count.
  await page.waitForFunction(
    () =>
      [...document.querySelectorAll("a[href^='/melts/']")].some(
        (a) => /^\/melts\/\d+$/.test(a.getAttribute("href") ?? "") && (a as HTMLElement).offsetParent !== null,
      ),
    undefined,
    { timeout: 30_000, polling: 20 },
  );
  const firstCardMs = Date.now() - submitAt;

  await page.waitForLoadState("networkidle");
  first.bytes = 0;
  first.requests = 0;
  await page.goto(`${baseUrl}/sign-in`, { waitUntil: "networkidle" });
  const repeat = { ...first };

  const kb = (n: number) => `${(n / 1024).toFixed(1)} KB`;
  const rows: [string, string, string][] = [
    ["first load of the sign-in page", `${kb(firstLoad.bytes)} in ${firstLoad.requests} requests`, "<= 500 KB"],
    ["first contentful paint", `${fcpMs.toFixed(0)} ms`, "<= 1200 ms"],
    ["sign-in form on screen (at most)", `${formMs.toFixed(0)} ms`, "(no aim; after the script runs)"],
    ["sign-in submit to the first melt card", `${firstCardMs} ms`, "<= 1500 ms"],
    ["repeat visit (signed in)", `${kb(repeat.bytes)} in ${repeat.requests} requests`, "< 20 KB"],
  ];
  console.log("\nWeb app at 390 x 844, CPU 4x slower");
  for (const [what, got, aim] of rows) console.log(`  ${what.padEnd(40)} ${got.padEnd(26)} aim ${aim}`);
} finally {
  await browser.close();
  await ground.stop();
  await objectStore?.close();
}
