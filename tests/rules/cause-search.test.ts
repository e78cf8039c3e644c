import { describe, expect, it } from "vitest";
import { causeFinder } from "../../lib/cause-search";
import { BUILT_IN_RULE_SET } from "../../rules/knowledge-base";

const options = [
  ...BUILT_IN_RULE_SET.causes.map((c) => ({ id: c.id, title: c.title, fixes: c.fixes, shop: false })),
  { id: "shop-ladle-lip-froze-over", title: "Ladle lip froze over", fixes: ["Preheat the lip"], shop: true },
];
const find = causeFinder(options);

describe("finding a rulebook cause by words", () => {
  it("finds built-in and shop causes by a word or two, with a slip", () => {
    expect(find("poured too cold").map((c) => c.id)).toContain("cold-pour");
    expect(find("ladle").map((c) => c.id)).toEqual(["shop-ladle-lip-froze-over"]);
    expect(find("ladel lip").map((c) => c.id)).toEqual(["shop-ladle-lip-froze-over"]);
    expect(find("hydrogen").map((c) => c.id)).toContain("hydrogen-pickup");
  });

  it("needs every word to match, and finds nothing for nothing typed", () => {
    expect(find("")).toEqual([]);
    expect(find("  x ")).toEqual([]);
    expect(find("hydrogen ladle")).toEqual([]);
    expect(find("cold", 3).length).toBeLessThanOrEqual(3);
  });
});
