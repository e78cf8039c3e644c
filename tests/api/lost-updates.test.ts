import { beforeAll, describe, expect, it } from "vitest";
import { migrateOnce, shopWithCrew } from "./helpers";
import { newCasting, newMelt } from "./notebook-fixtures";

beforeAll(migrateOnce);

/**
 * Two people edit different fields of the same row at the same moment (real simultaneous HTTP
 * requests, 20 pairs per kind of row): both edits must survive. Before PATCH wrote only the
 * columns it named, each request wrote back the whole row it had read, and one edit was lost.
 */
describe("simultaneous edits to different fields", () => {
  it("keeps both edits of melts, castings, marks and fixes", async () => {
    const { owner, mentor, caster } = await shopWithCrew("Lost Update Shop");
    const melt = await newMelt(caster);
    const casting = await newCasting(caster, melt.id, { marks: [{ type: "misrun", location: "top", severity: 1 }] });
    const mark = (await caster.agent.get(`/api/castings/${casting.id}`)).body.marks[0];
    const fix = (await caster.agent.post(`/api/followups/castings/${casting.id}/fixes`).send({ fix: "Pour hotter" }))
      .body;
    const lost: string[] = [];
    for (let i = 0; i < 20; i++) {
      const [a, b, c, d, e, f, g, h] = await Promise.all([
        caster.agent.patch(`/api/melts/${melt.id}`).send({ furnace: `pot ${i}` }),
        mentor.agent.patch(`/api/melts/${melt.id}`).send({ notes: `note ${i}` }),
        caster.agent.patch(`/api/castings/${casting.id}`).send({ pattern: `pattern ${i}` }),
        owner.agent.patch(`/api/castings/${casting.id}`).send({ orientation: `side ${i}` }),
        caster.agent.patch(`/api/marks/${mark.id}`).send({ note: `mark ${i}` }),
        mentor.agent.patch(`/api/marks/${mark.id}`).send({ severity: (i % 3) + 1 }),
        caster.agent.patch(`/api/followups/fixes/${fix.id}`).send({ fix: `fix ${i}` }),
        mentor.agent.patch(`/api/followups/fixes/${fix.id}`).send({ worked: null }),
      ]);
      for (const r of [a, b, c, d, e, f, g, h]) expect(r.status).toBe(200);
      const m = (await caster.agent.get(`/api/melts/${melt.id}`)).body;
      if (m.furnace !== `pot ${i}` || m.notes !== `note ${i}`) lost.push(`melt ${i}`);
      const cast = (await caster.agent.get(`/api/castings/${casting.id}`)).body;
      if (cast.pattern !== `pattern ${i}` || cast.orientation !== `side ${i}`) lost.push(`casting ${i}`);
      const mk = cast.marks.find((x: { id: number }) => x.id === mark.id);
      if (mk.note !== `mark ${i}` || mk.severity !== (i % 3) + 1) lost.push(`mark ${i}`);
      const fx = (await caster.agent.get(`/api/followups/castings/${casting.id}`)).body.fixes[0];
      if (fx.fix !== `fix ${i}`) lost.push(`fix ${i}`);
    }
    expect(lost).toEqual([]);
  });
});
