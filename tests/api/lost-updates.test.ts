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

/**
 * Optimistic concurrency (server/http/row-version.ts): GET answers an ETag, a PATCH that sends a stale
 * If-Match answers 412 with the row as it now stands and changes nothing.
 */
describe("If-Match on PATCH", () => {
  it("refuses a stale version with the current row, saves a fresh one with a new ETag", async () => {
    const { mentor, caster } = await shopWithCrew("Version Check Shop");
    const melt = await newMelt(caster);
    const opened = await caster.agent.get(`/api/melts/${melt.id}`);
    const etag = opened.headers.etag;
    expect(etag).toMatch(/^"\d+"$/);

    const first = await mentor.agent.patch(`/api/melts/${melt.id}`).set("If-Match", etag).send({ furnace: "theirs" });
    expect(first.status).toBe(200);
    expect(first.headers.etag).not.toBe(etag);
    expect(first.body.version).toBe(melt.version + 1);

    const stale = await caster.agent.patch(`/api/melts/${melt.id}`).set("If-Match", etag).send({ furnace: "mine" });
    expect(stale.status).toBe(412);
    expect(stale.body.error.message).toBe("Changed by someone else since you opened it");
    expect(stale.body.error.current.furnace).toBe("theirs");
    expect(stale.body.error.current.version).toBe(first.body.version);
    const after = await caster.agent.get(`/api/melts/${melt.id}`);
    expect(after.body.furnace).toBe("theirs");
    expect(after.headers.etag).toBe(first.headers.etag);

    // Keeping one's own: send again with the version the 412 answered.
    const again = await caster.agent
      .patch(`/api/melts/${melt.id}`)
      .set("If-Match", `"${stale.body.error.current.version}"`)
      .send({ furnace: "mine" });
    expect(again.status).toBe(200);
    expect(again.body.furnace).toBe("mine");

    // Without If-Match an edit saves as it always did.
    const plain = await mentor.agent.patch(`/api/melts/${melt.id}`).send({ notes: "no header" });
    expect(plain.status).toBe(200);
  });

  it("does the same for castings, marks and fixes", async () => {
    const { mentor, caster } = await shopWithCrew("Version Rows Shop");
    const melt = await newMelt(caster);
    const casting = await newCasting(caster, melt.id, { marks: [{ type: "misrun", location: "top", severity: 1 }] });
    const got = await caster.agent.get(`/api/castings/${casting.id}`);
    expect(got.headers.etag).toBe(`"${casting.version}"`);
    const mark = got.body.marks[0];
    const fix = (await caster.agent.post(`/api/followups/castings/${casting.id}/fixes`).send({ fix: "Pour hotter" }))
      .body;
    const rows = [
      {
        url: `/api/castings/${casting.id}`,
        version: casting.version,
        theirs: { pattern: "A" },
        mine: { pattern: "B" },
      },
      { url: `/api/marks/${mark.id}`, version: mark.version, theirs: { note: "A" }, mine: { note: "B" } },
      { url: `/api/followups/fixes/${fix.id}`, version: fix.version, theirs: { fix: "A" }, mine: { fix: "B" } },
    ];
    for (const row of rows) {
      const etag = `"${row.version}"`;
      const first = await mentor.agent.patch(row.url).set("If-Match", etag).send(row.theirs);
      expect(first.status, row.url).toBe(200);
      expect(first.headers.etag).toBe(`"${row.version + 1}"`);
      const stale = await caster.agent.patch(row.url).set("If-Match", etag).send(row.mine);
      expect(stale.status, row.url).toBe(412);
      expect(stale.body.error.current).toMatchObject({ ...row.theirs, version: row.version + 1 });
    }
    const after = (await caster.agent.get(`/api/castings/${casting.id}`)).body;
    expect(after.pattern).toBe("A");
    expect(after.marks[0].note).toBe("A");
    const fx = (await caster.agent.get(`/api/followups/castings/${casting.id}`)).body.fixes[0];
    expect(fx.fix).toBe("A");
  });

  it("lets only one of two simultaneous saves from the same version win", async () => {
    const { owner, caster } = await shopWithCrew("Same Version Shop");
    const melt = await newMelt(caster);
    const casting = await newCasting(caster, melt.id, { marks: [{ type: "misrun", location: "top", severity: 1 }] });
    const mark = (await caster.agent.get(`/api/castings/${casting.id}`)).body.marks[0];
    const fix = (await caster.agent.post(`/api/followups/castings/${casting.id}/fixes`).send({ fix: "Pour hotter" }))
      .body;
    // Marks and fixes have no GET of their own: their version comes with the row in the casting.
    const castingEtag = async () => (await caster.agent.get(`/api/castings/${casting.id}`)).headers.etag;
    const rows = [
      {
        url: `/api/melts/${melt.id}`,
        field: "notes",
        opened: async () => (await caster.agent.get(`/api/melts/${melt.id}`)).headers.etag,
      },
      { url: `/api/castings/${casting.id}`, field: "pattern", opened: castingEtag },
      {
        url: `/api/marks/${mark.id}`,
        field: "note",
        opened: async () => `"${(await caster.agent.get(`/api/castings/${casting.id}`)).body.marks[0].version}"`,
      },
      {
        url: `/api/followups/fixes/${fix.id}`,
        field: "fix",
        opened: async () =>
          `"${(await caster.agent.get(`/api/followups/castings/${casting.id}`)).body.fixes[0].version}"`,
      },
    ];
    for (const row of rows) {
      for (let i = 0; i < 10; i++) {
        const version = await row.opened();
        const [a, b] = await Promise.all([
          caster.agent
            .patch(row.url)
            .set("If-Match", version)
            .send({ [row.field]: `caster ${i}` }),
          owner.agent
            .patch(row.url)
            .set("If-Match", version)
            .send({ [row.field]: `owner ${i}` }),
        ]);
        expect([a.status, b.status].sort(), `${row.url} round ${i}`).toEqual([200, 412]);
        const winner = a.status === 200 ? `caster ${i}` : `owner ${i}`;
        const loser = a.status === 200 ? b : a;
        expect(loser.body.error.current[row.field]).toBe(winner);
      }
    }
  });

  it("answers another shop 404 and a malformed If-Match 412, never 500", async () => {
    const { caster } = await shopWithCrew("Header Shop");
    const other = await shopWithCrew("Other Header Shop");
    const melt = await newMelt(caster);
    const etag = (await caster.agent.get(`/api/melts/${melt.id}`)).headers.etag;
    const outsider = await other.owner.agent.patch(`/api/melts/${melt.id}`).set("If-Match", etag).send({ notes: "x" });
    expect(outsider.status).toBe(404);
    expect(outsider.body.error.current).toBeUndefined();
    for (const bad of ["1", 'W/"1"', '"abc"', '"99999999999999999999"', '"1", "2"', "", "\u00ff"]) {
      const res = await caster.agent.patch(`/api/melts/${melt.id}`).set("If-Match", bad).send({ notes: "bad" });
      expect(res.status, JSON.stringify(bad)).toBe(412);
    }
    const after = (await caster.agent.get(`/api/melts/${melt.id}`)).body;
    expect(after.notes).not.toBe("bad");
    expect(after.version).toBe(melt.version);
    // "*" matches whatever version the row is at.
    const any = await caster.agent.patch(`/api/melts/${melt.id}`).set("If-Match", "*").send({ notes: "any" });
    expect(any.status).toBe(200);
  });
});

describe("row versions and the browser's cache", () => {
  it("API answers are never kept by the browser, so a melt's ETag cannot turn a changed page into a 304", async () => {
    const { caster } = await shopWithCrew("No Store Shop");
    const melt = await newMelt(caster);
    const first = await caster.agent.get(`/api/melts/${melt.id}`);
    expect(first.headers["cache-control"]).toBe("no-store");
    await newCasting(caster, melt.id);
    // With no-store a browser keeps nothing, so it never asks If-None-Match and always gets the new page.
    const again = await caster.agent.get(`/api/melts/${melt.id}`);
    expect(again.status).toBe(200);
    expect(again.headers.etag).toBe(first.headers.etag); // the melt row itself did not change
    expect(again.body.castings).toHaveLength(1);
  });
});
