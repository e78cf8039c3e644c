import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import request from "supertest";
import { afterAll, describe, expect, it } from "vitest";
import { compressWebExport } from "../../scripts/web-compress";
import { createApp } from "../../server/app";

// A small export laid out as `expo export` lays it out, compressed by the real build step.
const dir = mkdtempSync(join(tmpdir(), "web-delivery-"));
const BUNDLE = "/_expo/static/js/web/entry-84c905baa366eac7dda1c4c80e4abe13.js";
const bundleText = `console.log(${JSON.stringify("melt ".repeat(2000))});`;
mkdirSync(join(dir, "_expo/static/js/web"), { recursive: true });
writeFileSync(join(dir, BUNDLE), bundleText);
writeFileSync(join(dir, "index.html"), `<!doctype html><title>t</title><script src="${BUNDLE}"></script>`);
writeFileSync(join(dir, "favicon.ico"), "x");
compressWebExport(dir);
const app = createApp({ webDir: dir });
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe("the web app's delivery", () => {
  it("sends brotli to a browser that accepts it, with Vary", async () => {
    const res = await request(app).get(BUNDLE).set("Accept-Encoding", "gzip, deflate, br").buffer(true);
    expect(res.status).toBe(200);
    expect(res.headers["content-encoding"]).toBe("br");
    expect(res.headers["vary"]).toMatch(/Accept-Encoding/i);
    expect(res.headers["content-type"]).toMatch(/javascript/);
    expect(Number(res.headers["content-length"])).toBeLessThan(bundleText.length / 10);
  });

  it("sends gzip when only gzip is accepted, and the plain file otherwise", async () => {
    const gz = await request(app).get(BUNDLE).set("Accept-Encoding", "gzip");
    expect(gz.headers["content-encoding"]).toBe("gzip");
    expect(gz.text).toBe(bundleText); // supertest inflates gzip: the same file arrives
    const plain = await request(app).get(BUNDLE).set("Accept-Encoding", "identity");
    expect(plain.headers["content-encoding"]).toBeUndefined();
    expect(Number(plain.headers["content-length"])).toBe(bundleText.length);
  });

  it("keeps files with a content hash for a year and checks the rest every time", async () => {
    const hashed = await request(app).get(BUNDLE).set("Accept-Encoding", "br");
    expect(hashed.headers["cache-control"]).toBe("public, max-age=31536000, immutable");
    const index = await request(app).get("/");
    expect(index.headers["cache-control"]).toBe("no-cache");
    expect(index.text).toContain(BUNDLE);
    const icon = await request(app).get("/favicon.ico");
    expect(icon.headers["cache-control"]).toBe("no-cache");
  });

  it("answers a repeat with its ETag by 304 and no body", async () => {
    const first = await request(app).get(BUNDLE).set("Accept-Encoding", "br");
    const etag = first.headers["etag"];
    expect(etag).toBeTruthy();
    const again = await request(app).get(BUNDLE).set("Accept-Encoding", "br").set("If-None-Match", etag);
    expect(again.status).toBe(304);
    const index = await request(app).get("/index.html");
    const indexAgain = await request(app).get("/index.html").set("If-None-Match", index.headers["etag"]);
    expect(indexAgain.status).toBe(304);
  });

  it("falls back to index.html for the app's routes, uncached, and leaves /api alone", async () => {
    const route = await request(app).get("/melts/12");
    expect(route.status).toBe(200);
    expect(route.headers["cache-control"]).toBe("no-cache");
    expect(route.text).toContain(BUNDLE);
    const api = await request(app).get("/api/no-such-thing");
    expect(api.status).toBe(404);
    expect(api.headers["content-type"]).toMatch(/json/);
  });
});
