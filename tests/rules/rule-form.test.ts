import { describe, expect, it } from "vitest";
import { formFromRule, formToDraft } from "../../hooks/use-rule-draft";
import { draftToRule, ruleDraftInput, ruleToDraft, type RuleDraft } from "../../lib/rulebook-schemas";
import { checkRule, type KbRule } from "../../rules/kb-schema";
import { BUILT_IN_RULE_SET } from "../../rules/knowledge-base";
import { ruleChanges } from "../../rules/rule-diff";
import { describeLeaf } from "../../rules/rule-words";
import { contradictions } from "../../rules/satisfiable";

const leaf = (fact: string, operator: string, value: unknown) => ({ fact, operator, value });
const all = (...c: ReturnType<typeof leaf>[]) => ({ all: c });

describe("conditions that could never be true", () => {
  it("finds a pour temperature below 600 and above 700 °C", () => {
    const found = contradictions(all(leaf("pourTempC", "lessThan", 600), leaf("pourTempC", "greaterThan", 700)));
    expect(found).toHaveLength(1);
    expect(found[0].fact).toBe("pourTempC");
    expect(found[0].message).toBe(
      "pour temperature is below 600 °C and pour temperature is above 700 °C: these cannot all be true at once",
    );
  });

  it("lets possible ones through, edges included", () => {
    expect(contradictions(all(leaf("pourTempC", "greaterThan", 600), leaf("pourTempC", "lessThan", 700)))).toEqual([]);
    expect(
      contradictions(all(leaf("pourTempC", "greaterThanInclusive", 700), leaf("pourTempC", "lessThanInclusive", 700))),
    ).toEqual([]);
    expect(
      contradictions(all(leaf("pourTempC", "greaterThan", 700), leaf("pourTempC", "lessThanInclusive", 700))),
    ).toHaveLength(1);
    // Facts on their own never conflict with other facts here: that is left to the trial run.
    expect(contradictions(all(leaf("pourTempC", "lessThan", 600), leaf("meltTempC", "greaterThan", 900)))).toEqual([]);
  });

  it("knows the range a quantity can take, lists of values, yes/no and missing values", () => {
    expect(contradictions(all(leaf("humidityPct", "greaterThan", 100)))).toHaveLength(1);
    expect(contradictions(all(leaf("minSectionMm", "lessThan", 0)))).toHaveLength(1);
    expect(
      contradictions(all(leaf("process", "in", ["lost-foam"]), leaf("process", "notIn", ["lost-foam", "plaster"]))),
    ).toHaveLength(1);
    expect(
      contradictions(all(leaf("process", "in", ["lost-foam", "plaster"]), leaf("process", "notIn", ["lost-foam"]))),
    ).toEqual([]);
    expect(contradictions(all(leaf("fluxed", "equal", true), leaf("fluxed", "equal", false)))).toHaveLength(1);
    expect(contradictions(all(leaf("pourTempC", "isMissing", true), leaf("pourTempC", "lessThan", 650)))).toHaveLength(
      1,
    );
    expect(contradictions(all(leaf("pourTempC", "between", [700, 650])))).toHaveLength(1);
  });

  it("reads any, not and nesting: impossible only when every alternative is", () => {
    const either = {
      all: [
        leaf("pourTempC", "lessThan", 600),
        { any: [leaf("pourTempC", "greaterThan", 700), leaf("fluxed", "equal", true)] },
      ],
    };
    expect(contradictions(either)).toEqual([]);
    const neither = {
      all: [
        leaf("pourTempC", "lessThan", 600),
        { any: [leaf("pourTempC", "greaterThan", 700), leaf("pourTempC", "between", [650, 690])] },
      ],
    };
    expect(contradictions(neither).length).toBeGreaterThan(0);
    // "not below 650" also holds when nothing was logged (comparisons on missing values are false).
    expect(
      contradictions({ all: [{ not: leaf("pourTempC", "lessThan", 650) }, leaf("pourTempC", "isMissing", true)] }),
    ).toEqual([]);
    expect(
      contradictions({ all: [{ not: leaf("pourTempC", "isMissing", true) }, leaf("pourTempC", "isMissing", true)] }),
    ).toHaveLength(1);
  });

  it("finds none among the shipped rules", () => {
    for (const r of BUILT_IN_RULE_SET.rules) expect(contradictions(r.conditions), r.id).toEqual([]);
  });
});

const good: RuleDraft = {
  defectTypes: ["misrun"],
  locations: ["far-from-gate"],
  conditions: [
    { fact: "pourTempC", comparison: "below", value: 690 },
    { fact: "process", comparison: "one-of", value: ["lost-foam"] },
  ],
  cause: { kind: "existing", id: "cold-pour" },
  weight: 0.6,
  because: "Poured at {pourTempC} °C into foam",
  sources: ["shop experience"],
};
const fieldsOf = (d: unknown) => {
  const r = ruleDraftInput.safeParse(d);
  return r.success ? {} : Object.fromEntries(r.error.issues.map((i) => [i.path.join("."), i.message]));
};

describe("the rule form's checks", () => {
  it("builds a json-rules-engine rule the knowledge base accepts, and reads it back", () => {
    const rule = draftToRule(ruleDraftInput.parse(good), "shop-1", "cold-pour");
    expect(rule.conditions).toEqual({
      all: [leaf("pourTempC", "lessThan", 690), leaf("process", "in", ["lost-foam"])],
    });
    expect(rule.explains).toEqual([{ type: "misrun", locations: ["far-from-gate"] }]);
    expect(checkRule(rule, new Set(BUILT_IN_RULE_SET.causes.map((c) => c.id)))).toEqual([]);
    expect(ruleToDraft(rule)).toMatchObject({ ...good, effect: "supports" });
  });

  it("shows a stored rule in the person's units and reads their typing back to SI", () => {
    const rule = draftToRule(ruleDraftInput.parse(good), "shop-1", "cold-pour");
    const imperial = { temperature: "F", length: "in", mass: "lb" } as const;
    const form = formFromRule(rule, imperial);
    expect(form.rows[0]).toMatchObject({ fact: "pourTempC", comparison: "below", low: "1274" }); // 690 °C × 9/5 + 32
    const back = ruleDraftInput.parse(
      formToDraft({ ...form, rows: [{ ...form.rows[0], low: "1292" }, form.rows[1]] }, imperial),
    );
    expect(back.conditions[0].value).toBeCloseTo(700, 6); // (1292 − 32) × 5/9
    expect(back.conditions[1]).toEqual({ fact: "process", comparison: "one-of", value: ["lost-foam"] });
    expect(back.sources).toEqual(["shop experience"]);
    // Text that is not a number is refused on its own field.
    const typo = formToDraft({ ...form, rows: [{ ...form.rows[0], low: "12o0" }] }, imperial);
    expect(fieldsOf(typo)).toEqual({ "conditions.0.value": "type a number" });
  });

  it("names the field of each problem: unknown fact, comparison that does not fit, empty cause", () => {
    expect(fieldsOf({ ...good, conditions: [{ fact: "pourTemp", comparison: "below", value: 690 }] })).toEqual({
      "conditions.0.fact": '"pourTemp" is not something the rulebook knows about',
    });
    expect(fieldsOf({ ...good, conditions: [{ fact: "fluxed", comparison: "below", value: 3 }] })).toEqual({
      "conditions.0.comparison": '"is below" does not fit flux used',
    });
    expect(fieldsOf({ ...good, cause: { kind: "existing", id: "" } })).toEqual({ "cause.id": "choose a cause" });
    expect(fieldsOf({ ...good, cause: { kind: "new", title: " ", fixes: [] } })).toMatchObject({
      "cause.title": "name the cause",
      "cause.fixes": "give at least one fix to try",
    });
    expect(Object.keys(fieldsOf({ ...good, cause: undefined }))).toEqual(["cause"]);
    expect(
      fieldsOf({ ...good, conditions: [{ fact: "pourTempC", comparison: "between", value: [700, 650] }] }),
    ).toEqual({
      "conditions.0.value": "the first number is above the second",
    });
    expect(
      fieldsOf({ ...good, conditions: [{ fact: "process", comparison: "one-of", value: ["sandcastle"] }] }),
    ).toMatchObject({
      "conditions.0.value": '"sandcastle" is not a value of process',
    });
    expect(
      Object.keys(fieldsOf({ ...good, defectTypes: [], conditions: [], because: "", sources: [] })).sort(),
    ).toEqual(["because", "conditions", "defectTypes", "sources"]);
    expect(fieldsOf({ ...good, because: "at {pourTemp}" })).toHaveProperty("because");
  });
});

describe("differences between versions", () => {
  const v1: KbRule = draftToRule(ruleDraftInput.parse(good), "shop-1", "cold-pour");
  it("says what changed in words", () => {
    const v2: KbRule = {
      ...v1,
      weight: 0.8,
      explains: [{ type: "misrun" }, { type: "cold-shut" }],
      conditions: { all: [leaf("pourTempC", "lessThan", 680), leaf("process", "in", ["lost-foam"])] },
      sources: ["shop experience", "ASM Handbook Vol. 15"],
    };
    expect(ruleChanges({ rule: v1, status: "draft" }, { rule: v2, status: "draft" })).toEqual([
      "Now also explains cold shut",
      "Where on the part: far from gate → anywhere",
      "Condition added: pour temperature is below 680 °C",
      "Condition removed: pour temperature is below 690 °C",
      "Weight: 0.6 → 0.8",
      "Source added: ASM Handbook Vol. 15",
    ]);
    expect(ruleChanges({ rule: v2, status: "draft" }, { rule: v2, status: "published" })).toEqual([
      "Published: now used in every diagnosis here",
    ]);
    expect(ruleChanges({ rule: v2, status: "published" }, { rule: v2, status: "retired" })).toEqual([
      "Retired: no longer used",
    ]);
    expect(ruleChanges(null, { rule: v1, status: "draft" })).toEqual(["Written as a draft rule"]);
  });

  it("uses the person's units and labels when given them", () => {
    const fahrenheit = (_: unknown, c: number) => `${Math.round((c * 9) / 5 + 32)} °F`;
    expect(describeLeaf(leaf("pourTempC", "lessThan", 690), fahrenheit)).toBe("pour temperature is below 1274 °F");
    const v2 = { ...v1, cause: "misrun-other" };
    expect(
      ruleChanges(
        { rule: v1, status: "draft" },
        { rule: v2, status: "draft" },
        { causeTitle: (id) => id.toUpperCase() },
      ),
    ).toEqual(["Cause: COLD-POUR → MISRUN-OTHER"]);
  });
});
