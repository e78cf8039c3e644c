import { patternSizeMm, shrinkPctToInPerFt } from "../compute/pattern";
import type { CalcAlloy, CalcResult, CalcValue } from "./result";

export type PatternInput = { alloy: string; lengthMm: number; widthMm?: number; heightMm?: number };

/** A shrink rule's marking to the nearest 1/64 in per foot, as patternmakers' rules are sold ("5/32 in/ft"). */
export function shrinkRuleMarking(inchesPerFoot: number): string {
  let n = Math.round(inchesPerFoot * 64);
  let d = 64;
  while (n % 2 === 0 && d > 1) {
    n /= 2;
    d /= 2;
  }
  return d === 1 ? `${n} in/ft` : `${n}/${d} in/ft`;
}

/** The pattern's sizes for a casting's sizes, with the allowance the alloy table gives and its shrink rule. */
export function patternSize(input: PatternInput, alloy: CalcAlloy): CalcResult {
  const pct = alloy.shrinkAllowancePct;
  const inPerFt = shrinkPctToInPerFt(pct);
  const given: [string, number | undefined][] = [
    ["Length", input.lengthMm],
    ["Width", input.widthMm],
    ["Height", input.heightMm],
  ];
  const sizes = given.filter((s): s is [string, number] => s[1] !== undefined);
  const source = `rules/compute/pattern.ts; allowance from the alloy table (${alloy.designation}: ${pct} %)`;
  return {
    summary: `Shrink ${pct} % (${shrinkRuleMarking(inPerFt)} rule)`,
    inputs: [
      ...sizes.map(([label, mm]): CalcValue => ({
        label: `Casting ${label.toLowerCase()}`,
        quantity: "length",
        si: mm,
      })),
      { label: `Shrink allowance of ${alloy.designation}`, quantity: "percent", si: pct },
    ],
    lines: [
      ...sizes.map(([label, mm]) => ({
        label: `Pattern ${label.toLowerCase()}`,
        quantity: "length" as const,
        si: patternSizeMm(mm, pct),
        formula: "L_pattern = L_casting · (1 + allowance)",
        source,
      })),
      {
        label: `Shrink rule (${shrinkRuleMarking(inPerFt)})`,
        quantity: "in-per-ft",
        si: inPerFt,
        formula: "in/ft = allowance × 12 in",
        source: "rules/compute/pattern.ts; [web] patternmakers' shrink-rule charts",
      },
    ],
    notes: [
      "The allowance is for free shrinkage; a core or a rigid mould that holds the metal back makes it smaller (common practice).",
    ],
    warnings: [],
  };
}
