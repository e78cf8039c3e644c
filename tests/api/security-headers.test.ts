import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import request from "supertest";
import { afterAll, describe, expect, it, vi } from "vitest";

/**
 * Headers of issue 9, item 14 (server/http/security-headers.ts), on the API and on the web app.
 * HSTS depends on PUBLIC_URL, which the server reads once per process, so each case loads the
 * server afresh with its own PUBLIC_URL.
 */
const webDir = mkdtempSync(join(tmpdir(), "casebook-headers-"));
writeFileSync(join(webDir, "index.html"), '<!DOCTYPE html><div id="root"></div>');
afterAll(() => rmSync(webDir, { recursive: true, force: true }));

async function appWith(publicUrl: string) {
  vi.resetModules();
  process.env.PUBLIC_URL = publicUrl;
  const { createApp } = await import("../../server/app");
  return createApp({ webDir });
}

const directives = (csp: string | undefined) =>
  Object.fromEntries(
    (csp ?? "")
      .split(";")
      .map((d) => d.trim().split(/\s+/))
      .map(([k, ...v]) => [k, v.join(" ")]),
  );

describe("security headers over http", () => {
  it("the web app gets its content policy, no framing, and no HSTS", async () => {
    const app = await appWith("http://127.0.0.1:8080");
    for (const path of ["/", "/melts/3"]) {
      const res = await request(app).get(path);
      expect(res.status).toBe(200);
      const csp = directives(res.headers["content-security-policy"]);
      expect(csp["frame-ancestors"]).toBe("'none'");
      // Scripts only from our own files: no inline script, no eval.
      expect(csp["script-src"]).toBe("'self'");
      expect(csp["img-src"]).toContain("blob:");
      expect(csp["object-src"]).toBe("'none'");
      expect("upgrade-insecure-requests" in csp).toBe(false);
      expect(res.headers["x-frame-options"]).toBe("DENY");
      expect(res.headers["x-content-type-options"]).toBe("nosniff");
      expect(res.headers["strict-transport-security"]).toBeUndefined();
    }
  });

  it("API answers, errors included, carry a policy that loads nothing and no HSTS", async () => {
    const app = await appWith("http://127.0.0.1:8080");
    for (const path of ["/api/health", "/api/no-such-thing", "/api/melts"]) {
      const res = await request(app).get(path);
      expect([200, 401, 404, 503]).toContain(res.status);
      const csp = directives(res.headers["content-security-policy"]);
      expect(csp["default-src"]).toBe("'none'");
      expect(csp["frame-ancestors"]).toBe("'none'");
      expect(res.headers["x-frame-options"]).toBe("DENY");
      expect(res.headers["strict-transport-security"]).toBeUndefined();
    }
    // better-auth's answers too.
    const auth = await request(app).get("/api/auth/get-session");
    expect(auth.headers["content-security-policy"]).toContain("default-src 'none'");
  });
});

describe("security headers with an https PUBLIC_URL", () => {
  it("adds HSTS and upgrades insecure requests, on the app and the API", async () => {
    const app = await appWith("https://casebook.example.org");
    for (const path of ["/", "/api/health"]) {
      const res = await request(app).get(path);
      expect(res.headers["strict-transport-security"]).toBe("max-age=15552000");
      expect(res.headers["content-security-policy"]).toContain("frame-ancestors 'none'");
    }
    const page = directives((await request(app).get("/")).headers["content-security-policy"]);
    expect("upgrade-insecure-requests" in page).toBe(true);
  });
});
