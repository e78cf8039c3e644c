import { beforeAll, describe, expect, it } from "vitest";
import type { SimilarAnswer } from "../../lib/search-schemas";
import { migrateOnce } from "./helpers";
import { buildCasebook, type Casebook } from "./search-fixtures";

let book: Casebook;
let other: Casebook;
beforeAll(async () => {
  await migrateOnce();
  book = await buildCasebook("Similar Shop");
  other = await buildCasebook("Other Similar Shop");
}, 120_000);

const similar = async (b: Casebook, id: number) => {
  const res = await b.caster.agent.get(`/api/search/castings/${id}/similar`);
  expect(res.status, res.text).toBe(200);
  return res.body as SimilarAnswer;
};

describe("GET /api/search/castings/:id/similar", () => {
  it("finds the confirmed misrun whose fix worked, and says why", async () => {
    const { items } = await similar(book, book.ids.c1);
    expect(items.map((i) => i.id)).toEqual([book.ids.c5]);
    expect(items[0]).toMatchObject({
      partName: "Ribbed cover plate",
      cause: { id: "cold-pour", confirmed: true },
      fixWorked: "yes",
      reason:
        "same misrun at the top, lost foam, A356.0, superheat 30 °C higher, argon lance degassing, similar 4 mm section",
    });
  });

  it("orders by likeness: gas porosity in the same alloy before anything else", async () => {
    const { items } = await similar(book, book.ids.c7);
    expect(items.map((i) => i.id)).toEqual([book.ids.c2]);
    expect(items[0].reason).toMatch(/^same gas porosity, A356\.0, superheat 40 °C lower/);
  });

  it("ranks an unmarked casting by its conditions alone", async () => {
    const { items } = await similar(book, book.ids.c4);
    expect(items[0].id).toBe(book.ids.c3); // same melt: 319.0, green sand, same superheat
    expect(items).toHaveLength(5);
    expect(items.map((i) => i.id)).not.toContain(book.ids.c4);
  });

  it("answers 404 for another shop's casting and never lists its cases", async () => {
    const res = await book.caster.agent.get(`/api/search/castings/${other.ids.c1}/similar`);
    expect(res.status).toBe(404);
    const mine = Object.values(book.ids);
    for (const id of mine) for (const item of (await similar(book, id)).items) expect(mine).toContain(item.id);
  });
});
