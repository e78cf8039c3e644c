import { describe, expect, it } from "vitest";
import { reasonText } from "../../lib/search-schemas";
import { defectBit, markCode, similarCases, type SimilarInput } from "../../server/search/similarity";

/** Hand-built cases around a cold lost-foam misrun at the top of a 4 mm wall (superheat 85 °C). */
const base: SimilarInput = {
  id: 0,
  pouredOn: "2026-01-10",
  defects: [{ type: "misrun", location: "top", severity: 2 }],
  defectMask: defectBit("misrun"),
  markCodes: [markCode("misrun", "top")],
  process: "lost-foam",
  alloy: "A356.0",
  alloyKey: "A356.0",
  alloyFamily: "al-si",
  superheatC: 85,
  degassing: "argon-lance",
  minSectionMm: 4,
  cause: null,
  fixWorked: null,
};
const like = (id: number, over: Partial<SimilarInput>): SimilarInput =>
  withMask({ ...base, id, pouredOn: `2026-02-${String(id).padStart(2, "0")}`, ...over });
function withMask(c: SimilarInput): SimilarInput {
  return {
    ...c,
    defectMask: c.defects.reduce((m, d) => m | defectBit(d.type), 0),
    markCodes: c.defects.map((d) => markCode(d.type, d.location)),
  };
}
const confirmedAndFixed = {
  cause: { id: "cold-pour", title: "Metal too cold", confirmed: true },
  fixWorked: "yes" as const,
};

const target = base;
const twin = like(1, {});
const taught = like(2, { superheatC: 115, ...confirmedAndFixed });
const sideOnly = like(3, {
  defects: [{ type: "misrun", location: "side", severity: 1 }],
  alloy: "356.0",
  alloyKey: "356.0",
  superheatC: 90,
  degassing: null,
  minSectionMm: null,
});
const greenSand = like(4, {
  process: "green-sand",
  alloy: "319.0",
  alloyKey: "319.0",
  alloyFamily: "al-si-cu",
  superheatC: null,
  degassing: null,
  minSectionMm: 10,
});
const looselyTaught = like(5, {
  defects: [
    { type: "misrun", location: "bottom", severity: 1 },
    { type: "gas-porosity", location: "top", severity: 1 },
    { type: "shrinkage", location: "thick-section", severity: 2 },
  ],
  process: "green-sand",
  alloy: "319.0",
  alloyKey: "319.0",
  alloyFamily: "al-si-cu",
  superheatC: null,
  degassing: null,
  minSectionMm: null,
  ...confirmedAndFixed,
});
const otherDefect = like(6, { defects: [{ type: "cold-shut", location: "top", severity: 2 }] });

describe("cases like this one", () => {
  it("puts a confirmed case whose fix worked first, then the closest, and never a case without the defect", () => {
    const found = similarCases(target, [greenSand, otherDefect, looselyTaught, sideOnly, twin, taught, target]);
    expect(found.map((f) => f.doc.id)).toEqual([2, 1, 3, 4, 5]);
    expect(found.map((f) => f.similarity)).toEqual([0.95, 1, 0.592, 0.5, 0.1]);
  });

  it("says why, in the person's units", () => {
    const [first] = similarCases(target, [taught]);
    expect(first.parts.map((p) => p.kind)).toEqual(["defect", "process", "alloy", "superheat", "degassing", "section"]);
    expect(reasonText(first.parts)).toBe(
      "same misrun at the top, lost foam, A356.0, superheat 30 °C higher, argon lance degassing, similar 4 mm section",
    );
    expect(reasonText(first.parts, { temperature: "F", length: "in", mass: "lb" })).toBe(
      "same misrun at the top, lost foam, A356.0, superheat 54 °F higher, argon lance degassing, similar 0.16 in section",
    );
    const [side] = similarCases(target, [sideOnly]);
    expect(reasonText(side.parts)).toBe("same misrun, lost foam, 356.0 (same family), superheat 5 °C higher");
  });

  it("ranks by conditions alone when the casting has no marks, and keeps to five", () => {
    const unmarked = { ...target, defects: [], defectMask: 0, markCodes: [] };
    const many = Array.from({ length: 8 }, (_, i) => like(10 + i, { superheatC: 85 + i * 10 }));
    const found = similarCases(unmarked, [greenSand, ...many]);
    expect(found).toHaveLength(5);
    expect(found.map((f) => f.doc.id)).toEqual([10, 11, 12, 13, 14]);
  });
});
