import { FactGrid, type FactRow } from "@/components/diagnosis/fact-grid";
import { MELT_CONDITIONS } from "@/lib/condition-fields";
import { loggedConditions } from "@/lib/condition-drafts";
import { CHARGE_LABELS, DEGASSING_LABELS, PROCESS_LABELS } from "@/lib/labels";
import type { Melt } from "@/lib/notebook-schemas";
import { formatValue, type Quantity, type Units } from "@/lib/units";

const yesNo = (v: boolean | null) => (v === null ? null : v ? "yes" : "no");

/** A melt's conditions in the person's units. */
export function MeltFacts({ melt, units }: { melt: Melt; units: Units }) {
  const q = (quantity: Quantity, v: number | null) => (v === null ? null : formatValue(quantity, v, units));
  const pct = (v: number | null) => (v === null ? null : `${v} %`);
  const degassing =
    melt.degassing === null
      ? null
      : melt.degassing === "none"
        ? "none"
        : `${DEGASSING_LABELS[melt.degassing]}${melt.degasMinutes !== null ? `, ${melt.degasMinutes} min` : ""}`;
  const coating =
    melt.coatingApplied === null
      ? null
      : !melt.coatingApplied
        ? "none"
        : [
            melt.coatingCoats !== null ? `${melt.coatingCoats} coat${melt.coatingCoats === 1 ? "" : "s"}` : "applied",
            melt.coatingDried === null ? null : melt.coatingDried ? "dried" : "not dried",
          ]
            .filter(Boolean)
            .join(", ");
  const rows: FactRow[] = [
    { label: "Alloy", value: melt.alloy },
    { label: "Process", value: PROCESS_LABELS[melt.process] },
    { label: "Charge", value: melt.charge && CHARGE_LABELS[melt.charge] },
    { label: "Furnace", value: melt.furnace },
    { label: "Hottest the melt got", value: q("temperature", melt.meltTempC) },
    { label: "Pour temperature", value: q("temperature", melt.pourTempC) },
    { label: "Degassing", value: degassing },
    { label: "Flux used", value: yesNo(melt.fluxed) },
    { label: "Skimmed", value: yesNo(melt.skimmed) },
    { label: "Air temperature", value: q("temperature", melt.ambientTempC) },
    { label: "Humidity", value: pct(melt.humidityPct) },
    ...(melt.process === "permanent-mould" ? [] : [{ label: "Mould moisture", value: pct(melt.sandMoisturePct) }]),
    { label: "Coating", value: coating },
    ...(melt.process === "lost-foam" ? [{ label: "Foam density", value: q("density", melt.foamDensityKgM3) }] : []),
    ...loggedConditions(MELT_CONDITIONS, melt, units),
  ];
  return <FactGrid rows={rows} />;
}
