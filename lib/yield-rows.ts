import { castingYieldPct, meltYield, type Weighed } from "../rules/compute/casting-yield";
import type { ConditionRow } from "./condition-rows";
import { formatValue, type Units } from "./units";

/*
 * The weights and yield in words, in the person's units (the casting page, the melt page, the printed
 * sheet and the export read these). A yield is written in whole percent, as a shop quotes it.
 */
const pct = (v: number) => `${Math.round(v)} %`;
const kg = (v: number | null | undefined, units: Units) => formatValue("mass", v, units);

/**
 * The casting's weights and its yield. Only what was weighed: a weight is no input of the diagnosis,
 * so it does not belong in the grid's "not recorded" line.
 */
export function castingWeightRows(c: Weighed, units: Units): ConditionRow[] {
  const y = castingYieldPct(c.castingWeightKg, c.pouredWeightKg);
  const rows: ConditionRow[] = [];
  if (c.castingWeightKg !== null) rows.push({ label: "Casting weight (cleaned)", value: kg(c.castingWeightKg, units) });
  if (c.pouredWeightKg !== null)
    rows.push({ label: "Metal poured (with gating and risers)", value: kg(c.pouredWeightKg, units) });
  if (y !== undefined) rows.push({ label: "Yield", value: pct(y) });
  return rows;
}

/**
 * The melt's yield over its weighed castings, and the metal poured against the charge. Rows only for
 * what the weights allow; a pour heavier than the charge is said, since one of the weights is wrong.
 */
export function meltYieldRows(castings: Weighed[], chargeKg: number | null, units: Units): ConditionRow[] {
  const y = meltYield(castings, chargeKg);
  const rows: ConditionRow[] = [];
  if (y.yieldPct !== undefined) {
    const of = y.weighed === y.castings ? "" : `; ${y.weighed} of ${y.castings} castings weighed`;
    rows.push({
      label: "Yield of the castings",
      value: `${pct(y.yieldPct)}: ${kg(y.castingKg, units)} of castings from ${kg(y.pouredKg, units)} poured${of}`,
    });
  }
  if (y.chargeKg !== undefined && y.leftOrLostKg !== undefined && y.pouredOfChargePct !== undefined) {
    const of = y.pouredWeighed === y.castings ? "" : ` (${y.pouredWeighed} of ${y.castings} moulds weighed)`;
    rows.push({
      label: "Metal poured of the charge",
      value: `${kg(y.pouredAllKg, units)} of ${kg(y.chargeKg, units)}, ${pct(y.pouredOfChargePct)}${of}`,
    });
    rows.push({
      label: "Left in the crucible or lost as dross",
      value:
        y.leftOrLostKg < 0
          ? `none: more was poured than the charge weighed (${kg(-y.leftOrLostKg, units)} more), so a weight is off`
          : kg(y.leftOrLostKg, units),
    });
  }
  return rows;
}
