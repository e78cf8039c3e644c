import { FactGrid } from "@/components/diagnosis/fact-grid";
import { meltConditionRows } from "@/lib/condition-rows";
import type { Melt } from "@/lib/notebook-schemas";
import type { Units } from "@/lib/units";

/** A melt's conditions in the person's units. */
export function MeltFacts({ melt, units }: { melt: Melt; units: Units }) {
  return <FactGrid rows={meltConditionRows(melt, units)} />;
}
