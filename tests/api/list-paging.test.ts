import { beforeAll, describe, expect, it } from "vitest";
import type { CastingSummary, MeltSummary } from "../../lib/notebook-schemas";
import { migrateOnce, shopWithCrew, type Person } from "./helpers";
import { newCasting, newMelt } from "./notebook-fixtures";

beforeAll(migrateOnce);

/** Every page of a list, following `next`; `between` runs after the first page. */
async function allPages<T>(p: Person, path: string, pageSize: number, between?: () => Promise<unknown>) {
  const seen: T[] = [];
  let after: string | null = null;
  for (let n = 0; n < 50; n++) {
    const res = await p.agent.get(
      `${path}${path.includes("?") ? "&" : "?"}pageSize=${pageSize}${after ? `&after=${after}` : ""}`,
    );
    expect(res.status, res.text).toBe(200);
    expect(res.body.items.length).toBeLessThanOrEqual(pageSize);
    seen.push(...(res.body.items as T[]));
    after = res.body.next;
    if (!after) return seen;
    if (n === 0) await between?.();
  }
  throw new Error("the list never ended");
}

const ids = (rows: { id: number }[]) => rows.map((r) => r.id);
const byDayDesc = (a: { pouredOn: string; id: number }, b: { pouredOn: string; id: number }) =>
  b.pouredOn.localeCompare(a.pouredOn) || b.id - a.id;
const RANK = { scrap: 0, rework: 1, good: 2 } as Record<string, number>;
const rankOf = (o: string | null) => (o === null ? 3 : RANK[o]);

const MELT_ORDERS: Record<string, (a: MeltSummary, b: MeltSummary) => number> = {
  "date-desc": byDayDesc,
  "date-asc": (a, b) => -byDayDesc(a, b),
  alloy: (a, b) => (a.alloy < b.alloy ? -1 : a.alloy > b.alloy ? 1 : byDayDesc(a, b)),
  castings: (a, b) => b.castingCount - a.castingCount || byDayDesc(a, b),
};
const CASTING_ORDERS: Record<string, (a: CastingSummary, b: CastingSummary) => number> = {
  "date-desc": byDayDesc,
  "date-asc": (a, b) => -byDayDesc(a, b),
  part: (a, b) => {
    const [x, y] = [a.partName.toLowerCase(), b.partName.toLowerCase()];
    return x < y ? -1 : x > y ? 1 : b.id - a.id;
  },
  outcome: (a, b) => rankOf(a.outcome) - rankOf(b.outcome) || byDayDesc(a, b),
};

describe("lists paged by keyset", () => {
  it("gives every melt in use once, in each order, page by page; archived melts stay hidden", async () => {
    const { caster } = await shopWithCrew("Keyset Melts Shop");
    const days = ["2026-02-03", "2026-02-01", "2026-02-03", "2026-01-20", "2026-02-01", "2025-12-31", "2026-02-03"];
    const alloysUsed = ["A356.0", "319.0", "A356.0", "356.0", "319.0", "A356.0", "356.0"];
    const made = [];
    for (const [i, pouredOn] of days.entries()) {
      const alloy = alloysUsed[i];
      // 356.0 and 319.0 need no lost-foam pour temperature of their own: the fixture's 700 °C is above each solidus.
      made.push(await newMelt(caster, { pouredOn, alloy }));
    }
    for (const [i, count] of [3, 0, 1, 2, 1, 0, 2].entries())
      for (let k = 0; k < count; k++) await newCasting(caster, made[i].id, { outcome: "good" });
    const gone = await newMelt(caster, { pouredOn: "2026-02-02" });
    expect((await caster.agent.post(`/api/melts/${gone.id}/archive`)).status).toBe(200);

    for (const [sort, order] of Object.entries(MELT_ORDERS)) {
      const listed = await allPages<MeltSummary>(caster, `/api/melts?sort=${sort}`, 2);
      expect(new Set(ids(listed)), sort).toEqual(new Set(ids(made)));
      expect(ids(listed), sort).toEqual(ids([...listed].sort(order)));
    }
    const busiest = (await caster.agent.get("/api/melts?sort=castings&pageSize=1")).body.items[0];
    expect(busiest).toMatchObject({ id: made[0].id, castingCount: 3 });
  });

  it("neither repeats nor skips a row when melts are added between pages", async () => {
    const { caster } = await shopWithCrew("Keyset Moving Shop");
    const before = [];
    for (const pouredOn of ["2026-03-05", "2026-03-04", "2026-03-03", "2026-03-02", "2026-03-01"])
      before.push(await newMelt(caster, { pouredOn }));
    let ahead = { id: 0 };
    let behind = { id: 0 };
    const listed = await allPages<MeltSummary>(caster, "/api/melts?sort=date-desc", 2, async () => {
      behind = await newMelt(caster, { pouredOn: "2026-03-09" }); // before the cursor: the next pages skip it
      ahead = await newMelt(caster, { pouredOn: "2026-02-01" }); // after the cursor: it comes once, last
    });
    expect(ids(listed)).toEqual([...ids(before), ahead.id]);
    expect(ids(listed)).not.toContain(behind.id);
  });

  it("gives every casting in use once, in each order; archived castings and archived melts' castings stay hidden", async () => {
    const { caster } = await shopWithCrew("Keyset Castings Shop");
    const early = await newMelt(caster, { pouredOn: "2026-01-05" });
    const late = await newMelt(caster, { pouredOn: "2026-01-09" });
    const hiddenMelt = await newMelt(caster, { pouredOn: "2026-01-07" });
    const parts: [number, string, "good" | "rework" | "scrap" | undefined][] = [
      [early.id, "bracket", "good"],
      [early.id, "Bracket", "scrap"],
      [late.id, "Arm", undefined],
      [late.id, "cover plate", "rework"],
      [early.id, "Arm", "scrap"],
      [late.id, "bracket", "good"],
      [late.id, "Zinc-free boss", "scrap"],
    ];
    const made = [];
    for (const [meltId, partName, outcome] of parts) made.push(await newCasting(caster, meltId, { partName, outcome }));
    const archived = await newCasting(caster, late.id, { partName: "Archived arm" });
    expect((await caster.agent.post(`/api/castings/${archived.id}/archive`)).status).toBe(200);
    await newCasting(caster, hiddenMelt.id, { partName: "Under an archived melt" });
    expect((await caster.agent.post(`/api/melts/${hiddenMelt.id}/archive`)).status).toBe(200);

    for (const [sort, order] of Object.entries(CASTING_ORDERS)) {
      const listed = await allPages<CastingSummary>(caster, `/api/castings?sort=${sort}`, 3);
      expect(new Set(ids(listed)), sort).toEqual(new Set(ids(made)));
      expect(ids(listed), sort).toEqual(ids([...listed].sort(order)));
    }
    // The melt page still lists the archived melt's casting for its owner to restore.
    expect((await caster.agent.get(`/api/melts/${hiddenMelt.id}`)).body.castings).toHaveLength(1);
  });

  it("keeps the list keys with their melt: a new day moves its castings, archiving changes the count", async () => {
    const { caster } = await shopWithCrew("Keyset Keys Shop");
    const a = await newMelt(caster, { pouredOn: "2026-04-01" });
    const b = await newMelt(caster, { pouredOn: "2026-04-02" });
    const onA = await newCasting(caster, a.id);
    const onB = await newCasting(caster, b.id);
    const extra = await newCasting(caster, b.id);
    const first = async (path: string) => (await caster.agent.get(path)).body.items[0];
    expect(await first("/api/castings?sort=date-desc")).toMatchObject({ id: extra.id, pouredOn: "2026-04-02" });
    expect(await first("/api/melts?sort=castings")).toMatchObject({ id: b.id, castingCount: 2 });

    const moved = await caster.agent.patch(`/api/melts/${a.id}`).send({ pouredOn: "2026-04-20" });
    expect(moved.status, moved.text).toBe(200);
    expect(await first("/api/castings?sort=date-desc")).toMatchObject({ id: onA.id, pouredOn: "2026-04-20" });

    await caster.agent.post(`/api/castings/${extra.id}/archive`);
    await caster.agent.post(`/api/castings/${onB.id}/archive`);
    // Both melts now count 1 and 0 castings in use: the moved melt (one casting) leads.
    const counts = (await caster.agent.get("/api/melts?sort=castings")).body.items as MeltSummary[];
    expect(counts.map((m) => [m.id, m.castingCount])).toEqual([
      [a.id, 1],
      [b.id, 0],
    ]);
    await caster.agent.post(`/api/castings/${onB.id}/restore`);
    await caster.agent.post(`/api/castings/${onB.id}/restore`); // a second restore adds nothing
    const again = (await caster.agent.get("/api/melts?sort=castings")).body.items as MeltSummary[];
    // One casting each: the later day leads.
    expect(again.map((m) => [m.id, m.castingCount])).toEqual([
      [a.id, 1],
      [b.id, 1],
    ]);
  });

  it("shows another shop nothing, even with this shop's cursor", async () => {
    const mine = await shopWithCrew("Keyset Own Shop");
    const theirs = await shopWithCrew("Keyset Other Shop");
    for (const pouredOn of ["2026-05-01", "2026-05-02", "2026-05-03"]) {
      const melt = await newMelt(mine.caster, { pouredOn });
      await newCasting(mine.caster, melt.id);
    }
    for (const path of ["/api/melts", "/api/castings"]) {
      const page = (await mine.caster.agent.get(`${path}?pageSize=1`)).body;
      expect(page.next).toEqual(expect.any(String));
      const other = await theirs.mentor.agent.get(`${path}?pageSize=1&after=${page.next}`);
      expect(other.status).toBe(200);
      expect(other.body).toEqual({ items: [], pageSize: 1, next: null });
      expect((await theirs.owner.agent.get(path)).body.items).toEqual([]);
    }
  });

  it("answers a bad cursor with 400 and a message, never 500", async () => {
    const { caster } = await shopWithCrew("Keyset Bad Cursor Shop");
    for (const day of ["2026-06-01", "2026-06-02"]) await newMelt(caster, { pouredOn: day });
    const good = (await caster.agent.get("/api/melts?pageSize=1")).body.next as string;
    const b64 = (v: unknown) => Buffer.from(JSON.stringify(v)).toString("base64url");
    const cases: [string, string, RegExp][] = [
      ["/api/melts", "not a cursor!", /previous answer/],
      ["/api/melts", Buffer.from("{{{").toString("base64url"), /previous answer/],
      ["/api/melts", "x".repeat(1200), /previous answer/],
      ["/api/melts?sort=date-asc", good, /another list or sort order/],
      ["/api/castings", good, /another list/],
      ["/api/melts", b64(["melts:date-desc", "2026-13-45", 1]), /previous answer/],
      ["/api/melts", b64(["melts:date-desc", "2026-06-01", 0]), /previous answer/],
      ["/api/melts", b64(["melts:date-desc", "2026-06-01", 2 ** 31]), /previous answer/],
      ["/api/melts", b64(["melts:date-desc", "2026-06-01"]), /previous answer/],
      ["/api/melts", b64({ sort: "melts:date-desc" }), /previous answer/],
      ["/api/melts?sort=castings", b64(["melts:castings", -1, "2026-06-01", 4]), /previous answer/],
      ["/api/melts?sort=alloy", b64(["melts:alloy", "A356.0\u0000", 1, "2026-06-01", 4]), /previous answer/],
      ["/api/castings?sort=part", b64(["castings:part", 7, 1]), /previous answer/],
      ["/api/castings?sort=outcome", b64(["castings:outcome", 1.5, "2026-06-01", 3]), /previous answer/],
    ];
    for (const [path, after, message] of cases) {
      const res = await caster.agent.get(`${path}${path.includes("?") ? "&" : "?"}after=${encodeURIComponent(after)}`);
      expect(res.status, `${path} ${after}`).toBe(400);
      expect(res.body.error.fields.after, `${path} ${after}`).toMatch(message);
    }
    // The good cursor still works where it belongs.
    const next = await caster.agent.get(`/api/melts?pageSize=1&after=${good}`);
    expect(next.body.items.map((m: MeltSummary) => m.pouredOn)).toEqual(["2026-06-01"]);
  });
});
