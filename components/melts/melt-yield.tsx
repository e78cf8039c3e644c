import { FactGrid } from "@/components/diagnosis/fact-grid";
import { Heading } from "@/components/ui/heading";
import type { MeltDetail } from "@/lib/notebook-schemas";
import type { Units } from "@/lib/units";
import { meltYieldRows } from "@/lib/yield-rows";

/** The melt's yield from its weighed castings, and how much of the charge was poured; nothing until something is weighed. */
export function MeltYield({ melt, units }: { melt: MeltDetail; units: Units }) {
  const rows = meltYieldRows(melt.castings, melt.chargeWeightKg, units);
  if (!rows.length) return null;
  return (
    <>
      <Heading level={3}>Weights and yield</Heading>
      <FactGrid rows={rows} />
    </>
  );
}
