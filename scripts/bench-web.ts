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

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/**
 * Bytes on the wire (headers and compressed bodies) counted from the DevTools network events, with
 * each request's bytes, and `settled()`: resolves once nothing is in flight and nothing has started or
 * ended for `quietMs`.
 */
function countBytes(cdp: CDPSession) {
  const counter = { bytes: 0, requests: 0, each: [] as { url: string; bytes: number }[] };
  const urls = new Map<string, string>();
  const inFlight = new Set<string>();
  let lastAtMs = 0;
  cdp.on("Network.requestWillBeSent", (e) => {
    urls.set(e.requestId, e.request.url);
    inFlight.add(e.requestId);
    lastAtMs = performance.now();
  });
  cdp.on("Network.loadingFailed", (e) => inFlight.delete(e.requestId));
  cdp.on("Network.loadingFinished", (e) => {
    lastAtMs = performance.now();
    inFlight.delete(e.requestId);
    counter.bytes += e.encodedDataLength;
    counter.requests += 1;
    counter.each.push({ url: urls.get(e.requestId) ?? "?", bytes: e.encodedDataLength });
  });
  const settled = async (quietMs = 1500) => {
    while (inFlight.size > 0 || performance.now() - lastAtMs < quietMs) await sleep(100);
  };
  return Object.assign(counter, { settled });
}

/**
 * The requests made after `start()`, each as its start and end in ms after it: the waterfall between
 * sign-in and the first card, printed so that a slow step shows which request it waits on. DevTools
 * gives the start in wall time and the end on a monotonic clock; the end is the start plus the difference.
 */
function waterfall(cdp: CDPSession) {
  const started = new Map<string, { url: string; wallMs: number; monotonicS: number }>();
  const done: { url: string; startMs: number; endMs: number }[] = [];
  let sinceMs = Number.POSITIVE_INFINITY;
  cdp.on("Network.requestWillBeSent", (e) =>
    started.set(e.requestId, { url: e.request.url, wallMs: e.wallTime * 1000, monotonicS: e.timestamp }),
  );
  cdp.on("Network.loadingFinished", (e) => {
    const s = started.get(e.requestId);
    if (!s || s.wallMs < sinceMs) return;
    const endWallMs = s.wallMs + (e.timestamp - s.monotonicS) * 1000;
    done.push({ url: s.url, startMs: s.wallMs - sinceMs, endMs: endWallMs - sinceMs });
  });
  const name = (url: string) => {
    const u = new URL(url);
    return `${u.pathname}${u.search}`.slice(0, 70);
  };
  return {
    start: () => {
      sinceMs = Date.now();
      done.length = 0;
    },
    lines: () =>
      [...done]
        .sort((a, b) => a.startMs - b.startMs)
        .map((r) => `    ${r.startMs.toFixed(0).padStart(5)} -> ${r.endMs.toFixed(0).padStart(5)}  ${name(r.url)}`),
  };
}

declare global {
  interface Window {
    __bench: { submitAtMs: number; tabAtMs?: number; cardAtMs?: number };
  }
}

/**
 * Runs in the page: notes on the page's own clock when the Melts tab and then the first melt card come
 * on screen, looking only when the DOM changes. (Polling from the test every 20 ms, as this bench first
 * did, took the page's main thread for layout on every poll and slowed what it measured.)
 * A melt card links to /melts/<id>; the casebook's hidden cards link deeper, so they do not count.
 */
// Passed as text: tsx would wrap the named functions of a compiled one in a helper the page lacks.
const watchForFirstCard = `(() => {
  const seen = { submitAtMs: 0 };
  window.__bench = seen;
  const tab = () =>
    document.evaluate("//*[text()='Melts']", document, null, XPathResult.FIRST_ORDERED_NODE_TYPE).singleNodeValue;
  const card = () =>
    [...document.querySelectorAll("a[href^='/melts/']")].some(
      (a) => /^\\/melts\\/\\d+$/.test(a.getAttribute("href") ?? "") && a.offsetParent !== null,
    );
  // The next click is the one on "Sign in".
  document.addEventListener("click", () => (seen.submitAtMs = performance.now()), { capture: true, once: true });
  const observer = new MutationObserver(() => {
    if (!seen.tabAtMs && tab()) seen.tabAtMs = performance.now();
    if (seen.tabAtMs && card()) {
      seen.cardAtMs = performance.now();
      observer.disconnect();
    }
  });
  observer.observe(document.body, { childList: true, subtree: true, attributes: true, attributeFilter: ["style"] });
})()`;

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
  const requests = waterfall(cdp);

  await page.goto(`${baseUrl}/sign-in`, { waitUntil: "networkidle" });
  await page.getByLabel("E-mail").waitFor();
  // The first paint is the opening screen from index.html; the form appears once the script has run.
  const formMs = await page.evaluate(() => performance.now());
  const firstLoad = { ...first };
  const fcpMs = await firstPaintMs(page);

  const owner = DEMO_PEOPLE[0];
  await page.getByLabel("E-mail").fill(owner.email);
  await page.getByLabel("Password").fill(owner.password);
  await page.evaluate(watchForFirstCard);
  requests.start();
  await page.getByRole("button", { name: "Sign in" }).click();
  // Signed in, the app opens on the casebook; one tap on Melts shows the pour log.
  await page.waitForFunction(() => window.__bench.tabAtMs, undefined, { timeout: 30_000, polling: 100 });
  // Found by its text, as the watcher found it: a role query works out names over the whole page, at 4x.
  await page.locator("xpath=//*[text()='Melts']").first().click();
  await page.waitForFunction(() => window.__bench.cardAtMs, undefined, { timeout: 30_000, polling: 100 });
  const seen = await page.evaluate(() => window.__bench);
  const tabMs = Math.round(seen.tabAtMs! - seen.submitAtMs);
  const firstCardMs = Math.round(seen.cardAtMs! - seen.submitAtMs);
  const firstCardRequests = requests.lines();

  await page.waitForLoadState("networkidle");
  first.bytes = 0;
  first.requests = 0;
  first.each = [];
  // Signed in, the app goes on to its first screen: counted until the network has been quiet for 1.5 s
  // with nothing in flight (the script comes from the cache, so the page's own "network idle" can come
  // while the script is still starting, before the app has asked for anything).
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByText("Melts").first().waitFor({ timeout: 60_000 });
  await first.settled();
  const repeat = { ...first, each: [...first.each] };

  const kb = (n: number) => `${(n / 1024).toFixed(1)} KB`;
  const rows: [string, string, string][] = [
    ["first load of the sign-in page", `${kb(firstLoad.bytes)} in ${firstLoad.requests} requests`, "<= 500 KB"],
    ["first contentful paint", `${fcpMs.toFixed(0)} ms`, "<= 1200 ms"],
    ["sign-in form on screen (at most)", `${formMs.toFixed(0)} ms`, "(no aim; after the script runs)"],
    ["sign-in submit to the Melts tab on screen", `${tabMs} ms`, "(no aim)"],
    ["sign-in submit to the first melt card", `${firstCardMs} ms`, "<= 1500 ms"],
    ["repeat visit (signed in)", `${kb(repeat.bytes)} in ${repeat.requests} requests`, "< 20 KB"],
  ];
  console.log("\nWeb app at 390 x 844, CPU 4x slower");
  for (const [what, got, aim] of rows) console.log(`  ${what.padEnd(40)} ${got.padEnd(26)} aim ${aim}`);
  console.log("  the repeat visit's requests (bytes on the wire, headers included):");
  for (const r of repeat.each)
    console.log(`    ${String(r.bytes).padStart(6)}  ${new URL(r.url).pathname}${new URL(r.url).search}`);
  console.log("  requests from sign-in to the first card (ms after the submit):");
  for (const line of firstCardRequests) console.log(line);
} finally {
  await browser.close();
  await ground.stop();
  await objectStore?.close();
}
