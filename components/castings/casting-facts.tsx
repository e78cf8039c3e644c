import { FactGrid } from "@/components/diagnosis/fact-grid";
import { castingConditionRows } from "@/lib/condition-rows";
import type { Casting } from "@/lib/notebook-schemas";
import type { Units } from "@/lib/units";

/** A casting's sizes and gating in the person's units. */
export function CastingFacts({ casting, units }: { casting: Casting; units: Units }) {
  return <FactGrid rows={castingConditionRows(casting, units)} />;
}
