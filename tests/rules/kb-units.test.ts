import { describe, expect, it } from "vitest";
import { textInUnits } from "../../lib/quantity-words";
import { superheatBandInUnits } from "../../lib/trends-schemas";
import { reasonInUnits, reasonTemplateInUnits } from "../../lib/reason-text";
import type { Units } from "../../lib/units";
import { factSpec } from "../../rules/fact-catalog";
import { BUILT_IN_RULE_SET } from "../../rules/knowledge-base";
import { FACT_PLACEHOLDER, siText } from "../../rules/quantity-text";
import type { Reason } from "../../rules/rank";
import { CAUTIONS, GENERAL_CAUTIONS } from "../../rules/safety";

const SI: Units = { temperature: "C", length: "mm", mass: "kg" };
const US: Units = { temperature: "F", length: "in", mass: "lb" };

/**
 * A figure followed by a metric unit that a °F/in/lb person chose not to read. Hydrogen (cm³ per 100 g),
 * pressure (kPa), times and percentages have one unit for everyone (lib/fact-display.ts).
 */
const SI_FIGURE = /\d\s*(°C|mm²?|kg\/m³|kg\b|m\/s|g\/cm³|cm\b(?!³ per 100 g)|m\b)/;
const BRACES = /[{}]/;

const { causes, rules } = BUILT_IN_RULE_SET;
const causeTexts = causes.flatMap((c) => [
  ...c.fixes.map((t) => ({ where: `${c.id} fix`, t })),
  ...(c.cautions ?? []).map((t) => ({ where: `${c.id} caution`, t })),
  ...Object.values(c.fixesByMetal ?? {}).flatMap((l) => l.map((t) => ({ where: `${c.id} metal fix`, t }))),
  ...Object.values(c.cautionsByMetal ?? {}).flatMap((l) => l.map((t) => ({ where: `${c.id} metal caution`, t }))),
]);
const safetyTexts = [...Object.values(CAUTIONS).map((c) => c.text), ...GENERAL_CAUTIONS].map((t) => ({
  where: "safety",
  t,
}));

/** A value of the fact's kind, so every placeholder of every reason is filled. */
function sampleValue(name: string): Reason["values"][string] {
  const spec = factSpec(name);
  if (!spec) throw new Error(`unknown fact ${name}`);
  if (spec.kind === "boolean") return true;
  if (spec.kind === "enum") return spec.values[0];
  return 12.7;
}
const reasonOf = (template: string): Reason => ({
  template,
  against: false,
  values: Object.fromEntries([...template.matchAll(FACT_PLACEHOLDER)].map(([, n]) => [n, sampleValue(n)])),
});

describe("every knowledge-base text in both unit systems", () => {
  it("has fixes, cautions and reasons to check", () => {
    expect(causeTexts.length).toBeGreaterThan(100);
    expect(rules.length).toBeGreaterThan(100);
  });

  it("says fixes and cautions in SI as written, and in °F/in/lb with no brace or metric figure left", () => {
    for (const { where, t } of [...causeTexts, ...safetyTexts]) {
      const si = textInUnits(t, SI);
      expect(si, where).toBe(siText(t));
      expect(si, `${where}: ${si}`).not.toMatch(BRACES);
      const us = textInUnits(t, US);
      expect(us, `${where}: ${us}`).not.toMatch(BRACES);
      expect(us, `${where}: ${us}`).not.toMatch(SI_FIGURE);
    }
  });

  it("says every rule's reason in °F/in/lb with no placeholder or metric figure left", () => {
    for (const r of rules) {
      const us = reasonInUnits(reasonOf(r.because), US);
      expect(us, `${r.id}: ${us}`).not.toMatch(BRACES);
      expect(us, `${r.id}: ${us}`).not.toMatch(SI_FIGURE);
      expect(us, `${r.id}: ${us}`).not.toMatch(/°C/);
      const si = reasonInUnits(reasonOf(r.because), SI);
      expect(si, `${r.id}: ${si}`).not.toMatch(BRACES);
    }
  });
});

describe("quantities in braces", () => {
  it("converts temperatures with the offset and rises without it", () => {
    // °F = °C × 9/5 + 32 (the Fahrenheit scale's definition, NIST SP 811): 730 °C = 1346 °F, 790 °C = 1454 °F;
    // a rise of 20-30 °C is 36-54 °F (9/5 per degree, no offset).
    const fix = "raise the pour by {20-30 K} and pour at {730-790 °C}";
    expect(textInUnits(fix, US)).toBe("raise the pour by 36-54 °F and pour at 1,346-1,454 °F");
    expect(textInUnits(fix, SI)).toBe("raise the pour by 20-30 °C and pour at 730-790 °C");
  });

  it("rounds both ends of a size range alike, as a caster writes them", () => {
    // 3 mm = 0.118 in and 4 mm = 0.157 in (1 in = 25.4 mm exactly): "0.12-0.16 in".
    expect(textInUnits("under the {3-4 mm} that sand runs", US)).toBe("under the 0.12-0.16 in that sand runs");
    // 150 mm = 5.906 in.
    expect(textInUnits("a {150 mm} riser", US)).toBe("a 5.9 in riser");
    // 19-24 kg/m³ / 16.0185 (1 lb/ft³, from the 1959 pound and foot) = 1.19-1.50 lb/ft³.
    expect(textInUnits("foam of {19-24 kg/m³}", US)).toBe("foam of 1.2-1.5 lb/ft³");
    // 0.5 m/s = 19.69 in/s.
    expect(textInUnits("under {0.5 m/s}", US)).toBe("under 20 in/s");
  });

  it("groups thousands in limits", () => {
    // 1700 °C × 9/5 + 32 = 3092 °F.
    expect(textInUnits("above {1700 °C}", SI)).toBe("above 1,700 °C");
    expect(textInUnits("above {1700 °C}", US)).toBe("above 3,092 °F");
  });

  it("converts the figures a rule's author wrote into its reason, beside the quoted values", () => {
    const reason = {
      template: "Thinnest wall {minSectionMm} mm, under the {3-4 mm} that {process} usually runs in aluminium",
      against: false,
      values: { minSectionMm: 3, process: "green-sand" },
    };
    expect(reasonInUnits(reason, US)).toBe(
      "Thinnest wall 0.12 in, under the 0.12-0.16 in that green sand usually runs in aluminium",
    );
    expect(reasonInUnits(reason, SI)).toBe(
      "Thinnest wall 3 mm, under the 3-4 mm that green sand usually runs in aluminium",
    );
  });
});

describe("trend bands", () => {
  it("says superheat bands in °F as differences", () => {
    // A superheat is a difference: 40-60 °C is 72-108 °F (9/5 per degree, no offset).
    expect(superheatBandInUnits("40-60 °C", US)).toBe("72-108 °F");
    expect(superheatBandInUnits("100 °C and over", US)).toBe("180 °F and over");
    expect(superheatBandInUnits("not logged", US)).toBe("not logged");
    expect(superheatBandInUnits("under 40 °C", SI)).toBe("under 40 °C");
  });
});

describe("a rule's reason as the rulebook shows it", () => {
  it("keeps the placeholders and says the figures and units in the reader's", () => {
    // 3-4 mm = 0.12-0.16 in (1 in = 25.4 mm exactly).
    const t = "Thinnest wall {minSectionMm} mm, under the {3-4 mm} that {process} usually runs";
    expect(reasonTemplateInUnits(t, US)).toBe(
      "Thinnest wall {minSectionMm} in, under the 0.12-0.16 in that {process} usually runs",
    );
    expect(reasonTemplateInUnits(t, SI)).toBe(
      "Thinnest wall {minSectionMm} mm, under the 3-4 mm that {process} usually runs",
    );
  });
});
