import { FactGrid, type FactRow } from "@/components/diagnosis/fact-grid";
import { CASTING_CONDITIONS } from "@/lib/condition-fields";
import { loggedConditions } from "@/lib/condition-drafts";
import type { Casting } from "@/lib/notebook-schemas";
import { formatValue, type Units } from "@/lib/units";

const yesNo = (v: boolean | null) => (v === null ? null : v ? "yes" : "no");

/** A casting's sizes and gating in the person's units. */
export function CastingFacts({ casting: c, units }: { casting: Casting; units: Units }) {
  const len = (v: number | null) => (v === null ? null : formatValue("length", v, units));
  const rows: FactRow[] = [
    { label: "Pattern", value: c.pattern },
    { label: "Thinnest section", value: len(c.minSectionMm) },
    { label: "Thickest section", value: len(c.maxSectionMm) },
    { label: "Sprue height", value: len(c.sprueHeightMm) },
    { label: "Pour time", value: c.pourTimeS === null ? null : `${c.pourTimeS} s` },
    { label: "Riser", value: yesNo(c.hasRiser) },
    { label: "Overflow", value: yesNo(c.hasOverflow) },
    { label: "Vents", value: yesNo(c.hasVents) },
    ...loggedConditions(CASTING_CONDITIONS, c, units),
    { label: "Orientation", value: c.orientation },
  ];
  return <FactGrid rows={rows} />;
}
