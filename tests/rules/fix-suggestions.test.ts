import { describe, expect, it } from "vitest";
import { fixSuggestions, fixWords } from "../../lib/fix-suggestions";

const rulebook = [
  { id: "cold-pour", title: "Metal poured too cold", fixes: ["Pour hotter", "Shorten the carry"], shop: false },
  { id: "wet-mould", title: "Wet mould", fixes: ["Dry the mould", "Vent the cope"], shop: false },
];
const ranked = [
  { id: "turbulent-fill", fixes: ["Shorten the drop", "Pour hotter"] },
  { id: "cold-pour", fixes: ["Pour hotter", "Shorten the carry"] },
];

describe("fixes offered when recording a fix", () => {
  it("puts the confirmed cause's fixes first, even when the diagnosis did not list it", () => {
    const s = fixSuggestions({ confirmedCauseId: "wet-mould", rulebook, ranked, ticked: [] });
    expect(s.confirmed).toEqual({ title: "Wet mould", fixes: ["Dry the mould", "Vent the cope"] });
    expect(s.others).toEqual(["Shorten the drop", "Pour hotter", "Shorten the carry"]);
  });

  it("offers each fix once, ticked ones before the rest of the likely causes'", () => {
    const s = fixSuggestions({
      confirmedCauseId: "cold-pour",
      rulebook,
      ranked,
      ticked: ["Vent the cope", "Pour hotter"],
    });
    expect(s.confirmed?.fixes).toEqual(["Pour hotter", "Shorten the carry"]);
    expect(s.others).toEqual(["Vent the cope", "Shorten the drop"]);
  });

  it("offers the likely causes' fixes, best first, with no confirmed cause", () => {
    const s = fixSuggestions({ confirmedCauseId: null, rulebook, ranked, ticked: [] });
    expect(s.confirmed).toBeNull();
    expect(s.others).toEqual(["Shorten the drop", "Pour hotter", "Shorten the carry"]);
    // A typed cause the rulebook lacks has no fixes of its own.
    expect(fixSuggestions({ confirmedCauseId: undefined, rulebook: undefined, ranked: [], ticked: [] })).toEqual({
      confirmed: null,
      others: [],
    });
  });
});

describe("suggested fixes read in the person's units", () => {
  it("finds each SI fix's template, index for index, and leaves a fix without one as it is", () => {
    const causes = [
      { fixes: ["Pour hotter by 20-30 °C"], fixTemplates: ["Pour hotter by {20-30 K}"] },
      { fixes: ["Skim the melt"] },
    ];
    // A rise of 20-30 K is 36-54 °F: a difference scales by 9/5 with no offset (the definition of the °F).
    const say = fixWords(causes, (t) => t.replace("{20-30 K}", "36-54 °F"));
    expect(say("Pour hotter by 20-30 °C")).toBe("Pour hotter by 36-54 °F");
    expect(say("Skim the melt")).toBe("Skim the melt");
    expect(say("Typed by a caster")).toBe("Typed by a caster");
  });
});
