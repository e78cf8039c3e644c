import { beforeAll, describe, expect, it } from "vitest";
import { migrateOnce, ORIGIN, shopWithCrew, signUp, type Person } from "./helpers";

beforeAll(migrateOnce);

const roleOf = async (p: Person) => (await p.agent.get("/api/shops/me")).body.activeShop?.role ?? null;
const setRole = (by: Person, target: Person, role: string) =>
  by.agent.patch(`/api/people/members/${target.userId}`).set("Origin", ORIGIN).send({ role });
const remove = (by: Person, target: Person) =>
  by.agent.delete(`/api/people/members/${target.userId}`).set("Origin", ORIGIN);
const makeOwner = (by: Person, target: Person) =>
  by.agent.post(`/api/people/members/${target.userId}/make-owner`).set("Origin", ORIGIN);
const leave = (p: Person) => p.agent.post("/api/people/leave").set("Origin", ORIGIN);
const changes = async (owner: Person) =>
  (await owner.agent.get("/api/people/changes")).body.changes as {
    action: string;
    subjectEmail: string;
    detail: string;
    actorName: string;
    at: string;
  }[];

describe("members", () => {
  it("lets the owner change a role; the new role takes effect at once and is recorded", async () => {
    const { owner, caster } = await shopWithCrew("Role Change Shop");
    expect((await setRole(owner, caster, "mentor")).status).toBe(200);
    expect(await roleOf(caster)).toBe("mentor");
    const [last] = await changes(owner);
    expect(last).toMatchObject({ action: "role-changed", subjectEmail: caster.email, detail: "caster -> mentor" });
    expect(last.actorName).toBe("Role Change Shop-owner");
    expect(Date.now() - new Date(last.at).getTime()).toBeLessThan(60_000);
  });

  it("refuses members' changes from mentors and casters (403), and bad input (400)", async () => {
    const { owner, mentor, caster } = await shopWithCrew("Guarded Shop");
    for (const p of [mentor, caster]) {
      const other = p === mentor ? caster : mentor;
      expect((await setRole(p, other, "owner")).status).toBe(403);
      expect((await remove(p, other)).status).toBe(403);
      expect((await makeOwner(p, other)).status).toBe(403);
    }
    expect(await roleOf(mentor)).toBe("mentor");
    expect(await roleOf(caster)).toBe("caster");
    const bad = await setRole(owner, caster, "boss");
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.role).toBeTruthy();
    expect(
      (await owner.agent.patch(`/api/people/members/${caster.userId}`).set("Origin", ORIGIN).send({})).status,
    ).toBe(400);
    expect(await changes(owner)).toEqual([]);
  });

  it("keeps at least one owner: the only owner cannot step down, be removed or leave", async () => {
    const { owner } = await shopWithCrew("Last Owner Shop");
    const res = await setRole(owner, owner, "mentor");
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/at least one owner/);
    expect((await leave(owner)).status).toBe(409);
    expect((await remove(owner, owner)).status).toBe(400);
    expect(await roleOf(owner)).toBe("owner");
  });

  it("removes a member, who then no longer sees the shop; recorded", async () => {
    const { owner, caster } = await shopWithCrew("Removal Shop");
    expect((await remove(owner, caster)).status).toBe(200);
    expect((await caster.agent.get("/api/shops/current")).status).toBe(403);
    expect((await caster.agent.get("/api/melts")).status).toBe(403);
    expect((await changes(owner))[0]).toMatchObject({
      action: "removed",
      subjectEmail: caster.email,
      detail: "caster",
    });
    expect((await remove(owner, caster)).status).toBe(404);
  });

  it("hands ownership on: the other becomes owner, the old owner a mentor", async () => {
    const { owner, mentor } = await shopWithCrew("Handover Shop");
    expect((await makeOwner(owner, mentor)).status).toBe(200);
    expect(await roleOf(mentor)).toBe("owner");
    expect(await roleOf(owner)).toBe("mentor");
    expect((await changes(mentor))[0]).toMatchObject({ action: "ownership-transferred", subjectEmail: mentor.email });
    // The old owner may no longer manage members.
    expect((await setRole(owner, mentor, "caster")).status).toBe(403);
    expect((await makeOwner(mentor, mentor)).status).toBe(400);
  });

  it("lets a member leave, and an owner leave once another owner exists", async () => {
    const { owner, mentor, caster } = await shopWithCrew("Leaving Shop");
    expect((await leave(caster)).status).toBe(200);
    expect((await caster.agent.get("/api/shops/me")).body.shops).toEqual([]);
    expect((await setRole(owner, mentor, "owner")).status).toBe(200);
    expect((await leave(owner)).status).toBe(200);
    const log = await changes(mentor);
    expect(log.map((c) => c.action)).toEqual(["left", "role-changed", "left"]);
  });

  it("cannot touch another shop's members (404), nor someone who is not a member", async () => {
    const a = await shopWithCrew("Members A");
    const b = await shopWithCrew("Members B");
    expect((await setRole(a.owner, b.caster, "mentor")).status).toBe(404);
    expect((await remove(a.owner, b.caster)).status).toBe(404);
    expect((await makeOwner(a.owner, b.caster)).status).toBe(404);
    expect(await roleOf(b.caster)).toBe("caster");
    const loner = await signUp("loner");
    expect((await leave(loner)).status).toBe(403);
  });
});
