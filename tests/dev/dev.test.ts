import { spawn, type ChildProcess } from "node:child_process";
import { mkdtempSync, rmSync } from "node:fs";
import { createServer } from "node:net";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ensureChromium } from "../../scripts/debian-packages";
import { freePort } from "../../scripts/local-postgres";
import { launchBrowser, signedInAs, PHONE } from "../e2e/browser";

const root = fileURLToPath(new URL("../..", import.meta.url));

/** Whether something on 127.0.0.1 still accepts on the port (a listen attempt fails then). */
const portInUse = (port: number) =>
  new Promise<boolean>((resolve) => {
    const srv = createServer();
    srv.once("error", () => resolve(true));
    srv.listen(port, "127.0.0.1", () => srv.close(() => resolve(false)));
  });

/**
 * This process's environment without the product's settings: the browser tests' global setup runs in
 * the same vitest process and sets PUBLIC_URL, SMTP_URL, MAIL_DIR, UPLOAD_DIR and S3_* for its own server.
 * Inherited, they would point the dev server at that server's origin (so it refuses the browser's
 * sign-in as another site's) and at its mail catcher.
 */
function ownConfiguration(): NodeJS.ProcessEnv {
  const env = { ...process.env };
  for (const key of ["PUBLIC_URL", "SMTP_URL", "MAIL_DIR", "UPLOAD_DIR", "PORT"]) delete env[key];
  for (const key of Object.keys(env)) if (key.startsWith("S3_")) delete env[key];
  return env;
}

// `npm run dev` as a developer runs it: on free ports, with a database folder of its own.
describe("npm run dev", () => {
  let dev: ChildProcess;
  let ports: { web: number; metro: number; pg: number };
  let dataParent: string;
  let output = "";

  beforeAll(async () => {
    ensureChromium(process.env.CHROMIUM_PATH);
    ports = { web: await freePort(), metro: await freePort(), pg: await freePort() };
    dataParent = mkdtempSync(join(tmpdir(), "casebook-dev-"));
    dev = spawn("npm", ["run", "dev"], {
      cwd: root,
      env: {
        ...ownConfiguration(),
        DATABASE_URL: "",
        PORT: String(ports.web),
        METRO_PORT: String(ports.metro),
        LOCAL_PG_PORT: String(ports.pg),
        LOCAL_PG_DIR: join(dataParent, "pg"),
        UPLOAD_DIR: join(dataParent, "uploads"), // its object store stand-in keeps the demo photos there
        NODE_ENV: "development",
      },
      stdio: ["ignore", "pipe", "pipe"],
      detached: true, // its own process group, as a terminal's foreground job is
    });
    dev.stdout!.on("data", (d) => (output += d));
    dev.stderr!.on("data", (d) => (output += d));
    // The first page asks Metro for a cold bundle: allow it minutes on a busy machine.
    const deadline = Date.now() + 240000;
    for (;;) {
      const res = await fetch(`http://127.0.0.1:${ports.web}/sign-in`).catch(() => undefined);
      if (res?.status === 200) {
        // Ask for the page's script too, so the cold bundle is built before the browser waits on it.
        const src = /<script[^>]+src="([^"]+)"/.exec(await res.text())?.[1];
        if (!src || (await fetch(new URL(src, res.url)).catch(() => undefined))?.status === 200) break;
      }
      if (dev.exitCode !== null || Date.now() > deadline) throw new Error(`npm run dev did not come up:\n${output}`);
      await new Promise((r) => setTimeout(r, 1000));
    }
  });

  afterAll(async () => {
    // A failed test still stops the whole dev session the way Ctrl-C would.
    if (dev.exitCode === null && dev.signalCode === null) {
      process.kill(-dev.pid!, "SIGINT");
      await new Promise((r) => dev.once("exit", r));
    } else {
      try {
        process.kill(-dev.pid!, "SIGKILL"); // anything of the group still left over
      } catch {
        /* the group has gone, as it should */
      }
    }
    rmSync(dataParent, { recursive: true, force: true });
  });

  it("signs the demo caster in on one origin, then Ctrl-C frees every port", async () => {
    // A fresh checkout has no Metro cache: have the dev server build the first bundle before the
    // browser's shorter waits start (on a loaded 2-core machine that cold build can take a minute).
    const base = `http://127.0.0.1:${ports.web}`;
    const html = await (await fetch(base)).text();
    const src = /<script src="([^"]+)"/.exec(html)?.[1];
    if (src) await (await fetch(new URL(src, base))).arrayBuffer();
    const browser = await launchBrowser();
    try {
      // signedInAs waits for the signed-in shell to show the caster's role.
      const page = await signedInAs(browser, `http://127.0.0.1:${ports.web}`, PHONE, "caster");
      const cookies = await page.context().cookies(`http://127.0.0.1:${ports.web}`);
      expect(cookies.some((c) => c.name.includes("session"))).toBe(true);
    } finally {
      await browser.close();
    }

    const exited = new Promise<void>((r) => dev.once("exit", () => r()));
    // Ctrl-C in a terminal signals the whole foreground process group, not npm alone.
    process.kill(-dev.pid!, "SIGINT");
    await exited; // npm itself ends by the signal; what matters is that nothing keeps a port
    for (const port of [ports.web, ports.metro, ports.pg]) {
      await expect.poll(() => portInUse(port), { timeout: 10000 }).toBe(false);
    }
  }, 240_000);
});
