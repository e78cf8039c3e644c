import { describe, expect, it } from "vitest";
import { factSpec, type Facts } from "../../rules/fact-catalog";
import { firedRuleIds, ruleSetFor } from "../../rules/engine";
import {
  evaluateLeaf,
  RuleFileError,
  ruleFileSchema,
  validateRuleFiles,
  type Condition,
  type KbRule,
  type Leaf,
} from "../../rules/kb-schema";
import { BUILT_IN_RULE_FILES, BUILT_IN_RULE_SET } from "../../rules/knowledge-base";
import filling from "../../rules/kb/filling.json";
import gas from "../../rules/kb/gas.json";

const rules = BUILT_IN_RULE_SET.rules;

/** Alternative sets of leaf requirements under which a condition comes out as `want`. */
function* ways(c: Condition, want: boolean): Generator<{ leaf: Leaf; want: boolean }[]> {
  if ("not" in c) return yield* ways(c.not, !want);
  if (!("all" in c) && !("any" in c)) return yield [{ leaf: c, want }];
  const parts = "all" in c ? c.all : c.any;
  if ("all" in c === want) {
    // Every part must come out as `want`: combine one way of each part.
    const combine = function* (i: number): Generator<{ leaf: Leaf; want: boolean }[]> {
      if (i === parts.length) return yield [];
      for (const head of ways(parts[i], want)) for (const rest of combine(i + 1)) yield [...head, ...rest];
    };
    yield* combine(0);
  } else for (const p of parts) yield* ways(p, want);
}

/** Values worth trying for a fact, from the rule's own thresholds. */
function candidates(name: string, needs: { leaf: Leaf }[]): unknown[] {
  const spec = factSpec(name)!;
  if (spec.kind === "boolean") return [true, false, undefined];
  if (spec.kind === "enum") return [...spec.values, undefined];
  const edges = needs.flatMap(({ leaf }) => (Array.isArray(leaf.value) ? leaf.value : [leaf.value]) as number[]);
  return [...edges.flatMap((v) => [v, v + 0.5, v - 0.5, v + 10, v - 10]), 0, undefined];
}

/** Facts (not a case) that make a rule's conditions true, or undefined when none were found. */
function factsThatFire(rule: KbRule): Facts | undefined {
  for (const needs of ways(rule.conditions, true)) {
    const facts: Facts = {};
    const names = [...new Set(needs.map((n) => n.leaf.fact))];
    const ok = names.every((name) => {
      const mine = needs.filter((n) => n.leaf.fact === name);
      const v = candidates(name, mine).find((x) => mine.every((n) => evaluateLeaf(n.leaf, x) === n.want));
      facts[name] = v as Facts[string];
      return v !== undefined || mine.every((n) => evaluateLeaf(n.leaf, undefined) === n.want);
    });
    if (ok) return facts;
  }
  return undefined;
}

describe("rule files", () => {
  it("every shipped rule file validates on its own and together", () => {
    for (const f of BUILT_IN_RULE_FILES) expect(ruleFileSchema.safeParse(f.json).success, f.name).toBe(true);
    expect(() => validateRuleFiles(BUILT_IN_RULE_FILES)).not.toThrow();
    expect(BUILT_IN_RULE_SET.version).toMatch(/^[0-9a-f]{16}$/);
  });

  it("filling and gas together hold about 45 rules, each defect type with at least 4 causes", () => {
    const mine = [...filling.rules, ...gas.rules] as KbRule[];
    expect(mine.length).toBeGreaterThanOrEqual(40);
    for (const type of [
      "misrun",
      "cold-shut",
      "rounded-edges",
      "fold",
      "carbon-residue",
      "gas-porosity",
      "blowhole",
      "blister",
    ]) {
      const causes = new Set(
        mine.filter((r) => r.effect !== "weakens" && r.explains.some((e) => e.type === type)).map((r) => r.cause),
      );
      expect(causes.size, type).toBeGreaterThanOrEqual(4);
    }
    expect(mine.some((r) => r.effect === "weakens")).toBe(true);
  });

  it("no two rules are the same rule under two ids", () => {
    const key = (r: KbRule) => JSON.stringify([r.cause, r.explains, r.conditions]);
    const keys = rules.map(key);
    expect(keys.filter((k, i) => keys.indexOf(k) !== i)).toEqual([]);
  });

  it.each(rules.map((r) => [r.id, r] as const))("rule %s can fire", async (_id, rule) => {
    const facts = factsThatFire(rule);
    expect(facts, "no facts satisfy the conditions").toBeDefined();
    for (const { type } of rule.explains)
      expect((await firedRuleIds(BUILT_IN_RULE_SET, type, facts!)).has(rule.id)).toBe(true);
  });
});

describe("the schema refuses bad rules", () => {
  const good = filling.rules[0] as KbRule;
  const problems = (rule: Record<string, unknown>, extra: KbRule[] = []) => {
    const file = { family: "t", title: "test", causes: [], rules: [{ ...good, id: "bad-rule", ...rule }, ...extra] };
    try {
      validateRuleFiles([...BUILT_IN_RULE_FILES, { name: "t.json", json: file }]);
    } catch (e) {
      return (e as RuleFileError).problems.join("\n");
    }
    return "";
  };
  const leaf = (fact: string, operator: string, value: unknown) => ({
    conditions: { all: [{ fact, operator, value }] },
  });

  it.each([
    [
      "an unknown fact",
      leaf("pourTemp", "greaterThan", 1),
      /rule "bad-rule" conditions\.all\[0\]\.fact: "pourTemp" is not a known fact/,
    ],
    [
      "greaterThan on an enum",
      leaf("process", "greaterThan", 1),
      /rule "bad-rule" conditions\.all\[0\]: operator "greaterThan" on enum fact "process" is not allowed/,
    ],
    [
      "greaterThan on a boolean",
      leaf("hasVents", "greaterThan", 0),
      /operator "greaterThan" on boolean fact "hasVents" is not allowed/,
    ],
    [
      "an enum value the fact never takes",
      leaf("degassing", "equal", "vacuum"),
      /value "vacuum" is not one of degassing's values/,
    ],
    [
      "a word where a number belongs",
      leaf("pourTempC", "lessThan", "700"),
      /operator "lessThan" on number fact "pourTempC" needs a number/,
    ],
    ["between with the ends swapped", leaf("pourTempC", "between", [760, 700]), /needs \[low, high\]/],
    ["an unknown cause", { cause: "bad-luck" }, /rule "bad-rule" cause: "bad-luck" is not a defined cause id/],
    ["weight 0", { weight: 0 }, /rule "bad-rule" weight: weight must be above 0/],
    ["weight above 1", { weight: 1.5 }, /rule "bad-rule" weight: weight must be at most 1/],
    [
      "a placeholder that is no fact",
      { because: "Poured at {pourTemp} °C" },
      /rule "bad-rule" because: placeholder \{pourTemp\} is not a fact name/,
    ],
    ["no sources", { sources: [] }, /rule "bad-rule" sources: name at least one source/],
    ["an unknown defect type", { explains: [{ type: "bubble" }] }, /rule "bad-rule" explains\.0\.type/],
  ])("%s", (_what, rule, message) => expect(problems(rule)).toMatch(message));

  it("a rule id used twice", () =>
    expect(problems({ id: "fill-below-window" })).toMatch(/rule "fill-below-window" is defined twice/));
});

describe("ruleSetFor", () => {
  const shopRule = { ...(gas.rules[0] as KbRule), id: "shop-no-degas-again", weight: 0.3 };
  it("adds a shop's rules, drops disabled ones and versions the result", () => {
    const rs = ruleSetFor(BUILT_IN_RULE_SET, [shopRule], ["h2-tablet-only"]);
    expect(rs.rules.some((r) => r.id === "shop-no-degas-again")).toBe(true);
    expect(rs.rules.some((r) => r.id === "h2-tablet-only")).toBe(false);
    expect(rs.version).not.toBe(BUILT_IN_RULE_SET.version);
    expect(ruleSetFor(BUILT_IN_RULE_SET, [shopRule], ["h2-tablet-only"]).version).toBe(rs.version);
  });
  it("refuses a shop rule that reuses an id or names an unknown cause", () => {
    expect(() => ruleSetFor(BUILT_IN_RULE_SET, [{ ...shopRule, id: "h2-no-degassing" }])).toThrow(/defined twice/);
    expect(() => ruleSetFor(BUILT_IN_RULE_SET, [{ ...shopRule, cause: "gremlins" }])).toThrow(
      /"gremlins" is not a defined cause id/,
    );
  });
});
