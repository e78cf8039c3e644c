import request from "supertest";
import { beforeAll, describe, expect, it } from "vitest";
import { dbFingerprint } from "./db-fingerprint";
import { app, migrateOnce, ORIGIN, uniqueEmail, type Person } from "./helpers";
import { jsonWrites, type Write } from "./json-writes";
import { coldLostFoamMelt } from "./notebook-fixtures";
import { apiRoutes, fill } from "./route-table";

beforeAll(migrateOnce);

let owner: Person;
let writes: Write[];
const ids: Record<string, string | number> = {};

beforeAll(async () => {
  const made = await jsonWrites("Hostile Input Shop");
  owner = made.owner;
  writes = made.writes;
  Object.assign(ids, made.ids);
});

const send = (p: Person, w: { method: string; path: string }) =>
  w.method === "POST" ? p.agent.post(w.path) : w.method === "PUT" ? p.agent.put(w.path) : p.agent.patch(w.path);

/** Every string leaf of a body, as a path of keys. */
function leaves(v: unknown, path: (string | number)[] = [], kind: "string" | "number"): (string | number)[][] {
  if (typeof v === kind) return [path];
  if (Array.isArray(v)) return v.flatMap((x, i) => leaves(x, [...path, i], kind));
  if (v && typeof v === "object") return Object.entries(v).flatMap(([k, x]) => leaves(x, [...path, k], kind));
  return [];
}
function withLeaf(body: unknown, path: (string | number)[], value: unknown): unknown {
  const copy = structuredClone(body) as Record<string | number, unknown>;
  let at = copy;
  for (const k of path.slice(0, -1)) at = at[k] as typeof at;
  at[path[path.length - 1]] = value;
  return copy;
}

describe("hostile input at the edge", () => {
  it("has a hostile-input case for every JSON write route", () => {
    // Photos and pour-log imports take multipart files, not JSON; their own tests send them bad files
    // (photos.test.ts; import.test.ts: NUL bytes, empty, oversized, not CSV).
    const bodiless =
      /\/(publish|retire|resend|cancel|make-owner|archive|restore|seen)$|^\/api\/people\/leave$|^\/api\/diagnosis\/castings\/|^\/api\/(photos|import)(\/|$)/;
    const routes = apiRoutes().filter((r) => r.method !== "GET" && r.method !== "DELETE" && !bodiless.test(r.path));
    for (const r of routes) {
      const pattern = new RegExp(`^${r.path.replace(/:\w+/g, "[^/]+")}$`);
      expect(
        writes.some((w) => w.method === r.method && pattern.test(w.path)),
        `${r.method} ${r.path}`,
      ).toBe(true);
    }
  });

  it("refuses a NUL byte in any text field with 400 and a field message, changing no row", async () => {
    const before = await dbFingerprint();
    for (const w of writes)
      for (const path of leaves(w.body, [], "string")) {
        const res = await send(owner, w).send(withLeaf(w.body, path, "ok\u0000no") as object);
        expect(res.status, `${w.method} ${w.path} ${path.join(".")}`).toBe(400);
        // Field messages come from the edge (lib/fields.ts), not from the database backstop.
        expect(res.body.error.fields, `${w.method} ${w.path} ${path.join(".")}`).toBeTruthy();
      }
    expect(await dbFingerprint()).toEqual(before);
  });

  it("never answers 5xx to huge or fractional numbers, and refuses ids beyond 32 bits", async () => {
    for (const w of writes)
      for (const path of leaves(w.body, [], "number"))
        for (const value of [2 ** 31, 2 ** 53 + 1, 1e308, -1e308, 0.5]) {
          const res = await send(owner, w).send(withLeaf(w.body, path, value) as object);
          expect(res.status, `${w.method} ${w.path} ${path.join(".")}=${value}`).toBeLessThan(500);
        }
    const before = await dbFingerprint();
    const fixRes = await owner.agent
      .post(`/api/followups/castings/${ids.casting}/fixes`)
      .send({ fix: "x", nextCastingId: 2 ** 31 });
    expect(fixRes.status).toBe(400);
    expect(fixRes.body.error.fields.nextCastingId).toBeTruthy();
    const markRes = await owner.agent
      .post(`/api/marks/castings/${ids.casting}`)
      .send({ type: "misrun", location: "top", severity: 1, photoId: 2 ** 40, x: 0.5, y: 0.5 });
    expect(markRes.status).toBe(400);
    expect(markRes.body.error.fields.photoId).toBeTruthy();
    expect(await dbFingerprint()).toEqual(before);
  });

  it("refuses year-0 and impossible dates with a field message", async () => {
    const before = await dbFingerprint();
    for (const pouredOn of ["0000-01-01", "2026-02-30", "2026-13-01", "99999-01-01"]) {
      const res = await owner.agent.post("/api/melts").send({ ...coldLostFoamMelt, pouredOn });
      expect(res.status, pouredOn).toBe(400);
      expect(res.body.error.fields.pouredOn).toBeTruthy();
      const patched = await owner.agent.patch(`/api/melts/${ids.melt}`).send({ pouredOn });
      expect(patched.status, pouredOn).toBe(400);
    }
    expect((await owner.agent.get("/api/search?from=0000-01-01")).status).toBe(400);
    expect(await dbFingerprint()).toEqual(before);
  });

  it("answers 400 for control bytes in an address or query, 404 for ids past 32 bits", async () => {
    for (const path of ["/api/shops/%00", "/api/rulebook/rules/%00", "/api/melts/%00", "/api/shops/a%0Ab"])
      expect((await owner.agent.get(path)).status, path).toBe(400);
    expect((await owner.agent.get("/api/melts/99999999999")).status).toBe(404);
    expect((await owner.agent.get("/api/castings/2147483648")).status).toBe(404);
    for (const q of ["q=%00", "alloy=%00", "cause=a%00b", "page=1e300"])
      expect((await owner.agent.get(`/api/search?${q}`)).status, q).toBe(400);
    for (const q of ["pageSize=1e300", "after=%00", "after=a%22b"])
      for (const list of ["/api/melts", "/api/castings"])
        expect((await owner.agent.get(`${list}?${q}`)).status, `${list}?${q}`).toBe(400);
  });

  it("answers 413 to a 2 MB body on every write route, API and sign-in alike, changing no row", async () => {
    const big = { notes: "x".repeat(2 * 1024 * 1024) };
    const before = await dbFingerprint();
    const targets = apiRoutes()
      .filter((r) => r.method !== "GET" && r.method !== "DELETE" && !r.path.startsWith("/api/photos"))
      .map((r) => ({ method: r.method, path: fill(r.path, ids) }));
    for (const t of targets) expect((await send(owner, t).send(big)).status, `${t.method} ${t.path}`).toBe(413);
    for (const path of ["/api/auth/sign-in/email", "/api/auth/sign-up/email", "/api/auth/organization/create"]) {
      const res = await request(app)
        .post(path)
        .set("Origin", ORIGIN)
        .send({ email: "a@b.example", password: "x", name: big.notes });
      expect(res.status, path).toBe(413);
      const plain = await request(app)
        .post(path)
        .set("Origin", ORIGIN)
        .set("Content-Type", "text/plain")
        .send(big.notes);
      expect(plain.status, `${path} as text`).toBe(413);
    }
    expect(await dbFingerprint()).toEqual(before);
  });

  it("bounds and cleans the text better-auth stores: names, e-mails, shop names", async () => {
    const before = await dbFingerprint();
    const signUp = (body: object) => request(app).post("/api/auth/sign-up/email").set("Origin", ORIGIN).send(body);
    const password = "correct-horse-9";
    expect((await signUp({ name: "Ann\u0000", email: uniqueEmail("nul"), password })).status).toBe(400);
    expect((await signUp({ name: "A".repeat(81), email: uniqueEmail("long"), password })).status).toBe(400);
    expect((await signUp({ name: "Ann", email: `a\u0000${uniqueEmail("nul")}`, password })).status).toBe(400);
    const shop = await owner.agent
      .post("/api/auth/organization/create")
      .set("Origin", ORIGIN)
      .send({ name: "S".repeat(5000), slug: "s-long" });
    expect(shop.status).toBe(400);
    const rename = await owner.agent
      .post("/api/auth/update-user")
      .set("Origin", ORIGIN)
      .send({ name: "N".repeat(200) });
    expect(rename.status).toBe(400);
    expect(await dbFingerprint()).toEqual(before);
  });
});
