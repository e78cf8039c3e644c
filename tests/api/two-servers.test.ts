import { spawn, type ChildProcess } from "node:child_process";
import { mkdtempSync, rmSync, statSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import sharp from "sharp";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { freePort } from "../../scripts/local-postgres";
import { ORIGIN, migrateOnce, uniqueEmail, type Person } from "./helpers";
import { newCasting, newMelt } from "./notebook-fixtures";

/**
 * Two real app processes (`tsx server/index.ts`, as each server behind a load balancer runs) on this
 * file's database and object store bucket, neither given a session secret: they make one in a fresh
 * AUTH_SECRET_FILE (both at once, so the race is real) and must agree on it.
 */
const root = fileURLToPath(new URL("../..", import.meta.url));
const scratch = mkdtempSync(join(tmpdir(), "casebook-two-servers-"));
const secretFile = join(scratch, "auth-secret");
type AppServer = { url: string; child: ChildProcess; output: () => string };

async function startServer(): Promise<AppServer> {
  const port = await freePort();
  const env: NodeJS.ProcessEnv = {
    ...process.env,
    PORT: String(port),
    HOST: "127.0.0.1",
    AUTH_SECRET_FILE: secretFile,
  };
  delete env.BETTER_AUTH_SECRET;
  const child = spawn(join(root, "node_modules", ".bin", "tsx"), ["server/index.ts"], { cwd: root, env });
  let output = "";
  child.stdout!.on("data", (d) => (output += d));
  child.stderr!.on("data", (d) => (output += d));
  const url = `http://127.0.0.1:${port}`;
  for (let waited = 0; ; waited += 200) {
    if (child.exitCode !== null) throw new Error(`server exited: ${output}`);
    const up = await fetch(`${url}/api/health`).then(
      (r) => r.ok,
      () => false,
    );
    if (up) return { url, child, output: () => output };
    if (waited > 30_000) throw new Error(`server did not start: ${output}`);
    await new Promise((r) => setTimeout(r, 200));
  }
}

async function stopServer(s: AppServer | undefined) {
  if (!s || s.child.exitCode !== null) return;
  const exited = new Promise((r) => s.child.once("exit", r));
  s.child.kill("SIGTERM");
  await exited;
}

/** The same signed-in person, as seen by one server: the session cookie went out from the other. */
function through(server: AppServer, person: Person, cookie: string): Person {
  const agent = request.agent(server.url);
  agent.set("Cookie", cookie);
  agent.set("Origin", ORIGIN);
  return { ...person, agent };
}

let a: AppServer | undefined;
let b: AppServer | undefined;
beforeAll(async () => {
  await migrateOnce();
  [a, b] = await Promise.all([startServer(), startServer()]);
}, 90_000);
afterAll(async () => {
  await Promise.all([stopServer(a), stopServer(b)]);
  rmSync(scratch, { recursive: true, force: true });
});

describe("two app servers on one database and one object store", () => {
  it("share sign-ins, cases, diagnoses and photos, and a restarted server keeps the session", async () => {
    // Signed up and shop made through A.
    const email = uniqueEmail("two-servers");
    const password = "correct-horse-9";
    const signUp = await request(a!.url)
      .post("/api/auth/sign-up/email")
      .set("Origin", ORIGIN)
      .send({ name: "Two Servers", email, password });
    expect(signUp.status, signUp.text).toBe(200);
    // Sign-up makes no session (a taken address must be answered alike): sign in through A.
    const signIn = await request(a!.url)
      .post("/api/auth/sign-in/email")
      .set("Origin", ORIGIN)
      .send({ email, password });
    expect(signIn.status, signIn.text).toBe(200);
    const cookie = (signIn.headers["set-cookie"] as unknown as string[]).map((c) => c.split(";")[0]).join("; ");
    const person: Person = { agent: request.agent(a!.url), userId: signIn.body.user.id, email, password };
    const viaA = through(a!, person, cookie);
    const viaB = through(b!, person, cookie);
    const shop = await viaA.agent
      .post("/api/auth/organization/create")
      .send({ name: "Two Server Foundry", slug: `two-servers-${Date.now()}` });
    expect(shop.status, shop.text).toBe(200);
    const active = await viaA.agent.post("/api/auth/organization/set-active").send({ organizationId: shop.body.id });
    expect(active.status).toBe(200);

    // B knows the session A signed, and made the same secret file, readable by its owner only.
    const session = await viaB.agent.get("/api/auth/get-session");
    expect(session.status).toBe(200);
    expect(session.body?.user?.email).toBe(email);
    expect(statSync(secretFile).mode & 0o777).toBe(0o600);
    expect((await request(b!.url).get("/api/melts")).status).toBe(401); // and no cookie is still no one

    // A case written through A, with a photo...
    const melt = await newMelt(viaA, { notes: "Twoserver quenchmark pour on a cold morning" });
    const casting = await newCasting(viaA, melt.id, {
      marks: [{ type: "misrun", location: "far-from-gate", severity: 3 }],
    });
    const jpeg = await sharp({ create: { width: 90, height: 60, channels: 3, background: "#8a5" } })
      .jpeg()
      .toBuffer();
    const photo = await viaA.agent.post(`/api/photos/castings/${casting.id}`).attach("photo", jpeg, "two.jpg");
    expect(photo.status, photo.text).toBe(201);

    // ...is found in the casebook, diagnosed and its photo served through B.
    const found = await viaB.agent.get("/api/search").query({ q: "quenchmark" });
    expect(found.status, found.text).toBe(200);
    expect(found.body.items.map((i: { id: number }) => i.id)).toContain(casting.id);
    // Each server keeps a typo's similar words under the shop's vocabulary version, which lives in the
    // database: a word first written through A widens B's next search of the same typo, and A's.
    const typo = async (s: Person) => {
      const res = await s.agent.get("/api/search").query({ q: "glintwark" });
      expect(res.status, res.text).toBe(200);
      return res.body.items.map((i: { id: number }) => i.id) as number[];
    };
    expect(await typo(viaB)).toEqual([]);
    expect(await typo(viaA)).toEqual([]);
    const glint = await newCasting(viaA, melt.id, { partName: "Glintwork bracket", marks: [] });
    expect(await typo(viaB)).toEqual([glint.id]);
    expect(await typo(viaA)).toEqual([glint.id]);
    const diagnosis = await viaB.agent.post(`/api/diagnosis/castings/${casting.id}`);
    expect(diagnosis.status, diagnosis.text).toBe(201);
    // 700 °C lost foam is a cold pour ([mem] docs/foundry-facts.md), whichever server answers.
    expect(diagnosis.body.result.causes[0].id).toBe("cold-pour");
    // B keeps its learning by the shop's revision, which lives in the database: a cause confirmed
    // through A counts in B's very next diagnosis.
    type Cause = { id: string; record: { confirmed: number } };
    const coldPour = (body: { result: { causes: Cause[] } }) => body.result.causes.find((c) => c.id === "cold-pour")!;
    expect(coldPour(diagnosis.body).record.confirmed).toBe(0);
    const other = await newCasting(viaA, melt.id, { marks: [{ type: "misrun", location: "top", severity: 2 }] });
    const confirmed = await viaA.agent
      .post(`/api/review/castings/${other.id}/confirmations`)
      .send({ causeId: "cold-pour" });
    expect(confirmed.status, confirmed.text).toBe(201);
    const after = await viaB.agent.post(`/api/diagnosis/castings/${casting.id}`);
    expect(coldPour(after.body).record.confirmed).toBe(1);

    const image = await viaB.agent.get(photo.body.imageUrl).buffer(true);
    expect(image.status).toBe(200);
    expect(image.headers["content-type"]).toBe("image/jpeg");
    expect((await sharp(image.body).metadata()).width).toBe(90);

    // A restarted server (a new process, still no secret given) keeps everyone signed in.
    await stopServer(a);
    a = await startServer();
    const again = await through(a, person, cookie).agent.get(`/api/castings/${casting.id}`);
    expect(again.status).toBe(200);
    expect(again.body.photos).toHaveLength(1);

    // Signed out through A, the same cookie is refused by B's shop gate on its very next request.
    expect((await viaB.agent.get("/api/melts")).status).toBe(200);
    expect((await through(a, person, cookie).agent.post("/api/auth/sign-out").send({})).status).toBe(200);
    expect((await viaB.agent.get("/api/melts")).status).toBe(401);
  });
});
