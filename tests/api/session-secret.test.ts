import { spawnSync } from "node:child_process";
import { mkdtempSync, readFileSync, rmSync, statSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { afterAll, describe, expect, it } from "vitest";
import { localSessionSecret } from "../../server/auth/local-secret";

const root = fileURLToPath(new URL("../..", import.meta.url));
const scratch = mkdtempSync(join(tmpdir(), "casebook-secret-"));
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

/** loadEnv() in a fresh process, as a server starts, with the given environment. */
function loadEnvWith(env: Record<string, string | undefined>) {
  const childEnv: NodeJS.ProcessEnv = { ...process.env, ...env };
  for (const [k, v] of Object.entries(env)) if (v === undefined) delete childEnv[k];
  return spawnSync(
    join(root, "node_modules", ".bin", "tsx"),
    ["-e", 'import("./server/env.ts").then((m) => console.log(m.loadEnv().BETTER_AUTH_SECRET.length))'],
    { cwd: root, env: childEnv, encoding: "utf8", timeout: 30_000 },
  );
}

describe("the session secret", () => {
  it("is made once under the data folder with mode 0600 and read back on every later start", () => {
    const file = join(scratch, "nested", "auth-secret");
    const first = localSessionSecret(file);
    expect(first).toMatch(/^[0-9a-f]{64}$/);
    expect(statSync(file).mode & 0o777).toBe(0o600);
    expect(localSessionSecret(file)).toBe(first);
    expect(readFileSync(file, "utf8")).toBe(first);
  });

  it("refuses a kept secret that is too short rather than signing sessions with it", () => {
    const file = join(scratch, "short-secret");
    writeFileSync(file, "tooshort");
    expect(() => localSessionSecret(file)).toThrow(/shorter than 32 characters/);
  });

  it("is still required in production, and a set one is used as given", () => {
    const file = join(scratch, "prod-secret");
    const prod = loadEnvWith({ NODE_ENV: "production", BETTER_AUTH_SECRET: undefined, AUTH_SECRET_FILE: file });
    expect(prod.status).not.toBe(0);
    expect(prod.stderr).toMatch(/BETTER_AUTH_SECRET must be set in production/);
    expect(() => statSync(file)).toThrow(); // nothing was generated for production
    const given = loadEnvWith({ NODE_ENV: "production", BETTER_AUTH_SECRET: "x".repeat(40), AUTH_SECRET_FILE: file });
    expect(given.stdout.trim()).toBe("40");
  });
});
