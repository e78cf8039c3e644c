import { beforeAll, describe, expect, it } from "vitest";
import { migrateOnce, shopWithCrew } from "./helpers";
import { newCasting, newMelt } from "./notebook-fixtures";

beforeAll(migrateOnce);

type Listed = { id: number; newAnswer: boolean };
const marked = async (agent: Awaited<ReturnType<typeof shopWithCrew>>["caster"]["agent"]) =>
  ((await agent.get("/api/castings?pageSize=100")).body.items as Listed[]).filter((c) => c.newAnswer).map((c) => c.id);

describe("a caster's own cases with a new answer are marked", () => {
  it("marks the caster's casting once a mentor answers, clears it when read, marks it again on a newer answer", async () => {
    const { caster, mentor } = await shopWithCrew("New Answer Shop");
    const melt = await newMelt(caster);
    const mine = await newCasting(caster, melt.id, {
      marks: [{ type: "misrun", location: "thin-section", severity: 2 }],
    });
    const theirs = await newCasting(mentor, melt.id, {
      marks: [{ type: "misrun", location: "thin-section", severity: 2 }],
    });
    expect(await marked(caster.agent)).toEqual([]);

    const confirm = (id: number, causeId: string) =>
      mentor.agent.post(`/api/review/castings/${id}/confirmations`).send({ causeId });
    expect((await confirm(mine.id, "cold-pour")).status).toBe(201);
    expect((await confirm(theirs.id, "cold-pour")).status).toBe(201);
    // Only the author's own casting, and only for them: the mentor answered their own casting themselves.
    expect(await marked(caster.agent)).toEqual([mine.id]);
    expect(await marked(mentor.agent)).toEqual([]);
    const onMeltPage = (await caster.agent.get(`/api/melts/${melt.id}`)).body.castings as Listed[];
    expect(onMeltPage.find((c) => c.id === mine.id)?.newAnswer).toBe(true);

    expect((await caster.agent.post(`/api/review/castings/${mine.id}/seen`)).status).toBe(204);
    expect(await marked(caster.agent)).toEqual([]);
    // A correction afterwards is a new answer.
    await new Promise((r) => setTimeout(r, 5));
    expect((await confirm(mine.id, "section-too-thin")).status).toBe(201);
    expect(await marked(caster.agent)).toEqual([mine.id]);
  });

  it("another shop's casting, or no casting at all, is not found", async () => {
    const a = await shopWithCrew("New Answer A");
    const b = await shopWithCrew("New Answer B");
    const melt = await newMelt(a.caster);
    const casting = await newCasting(a.caster, melt.id);
    expect((await b.caster.agent.post(`/api/review/castings/${casting.id}/seen`)).status).toBe(404);
    expect((await a.caster.agent.post(`/api/review/castings/abc/seen`)).status).toBe(404);
  });
});
