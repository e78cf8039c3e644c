import { describe, expect, it } from "vitest";
import { fixSuggestions } from "../../lib/fix-suggestions";

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
