import { loggedConditions } from "./condition-drafts";
import { CASTING_CONDITIONS, MELT_CONDITIONS } from "./condition-fields";
import { CHARGE_LABELS, DEGASSING_LABELS, moistureLabel, PROCESS_LABELS } from "./labels";
import type { Casting, Melt } from "./notebook-schemas";
import { formatValue, type Quantity, type Units } from "./units";
import { castingWeightRows } from "./yield-rows";

/** A recorded value as a label and its text; null where nothing was recorded (worth showing as missing). */
export type ConditionRow = { label: string; value: string | null };

const yesNo = (v: boolean | null) => (v === null ? null : v ? "yes" : "no");
const pct = (v: number | null) => (v === null ? null : `${v} %`);

function degassingText(melt: Melt) {
  if (melt.degassing === null) return null;
  if (melt.degassing === "none") return "none";
  return `${DEGASSING_LABELS[melt.degassing]}${melt.degasMinutes !== null ? `, ${melt.degasMinutes} min` : ""}`;
}

function coatingText(melt: Melt) {
  if (melt.coatingApplied === null) return null;
  if (!melt.coatingApplied) return "none";
  return [
    melt.coatingCoats !== null ? `${melt.coatingCoats} coat${melt.coatingCoats === 1 ? "" : "s"}` : "applied",
    melt.coatingDried === null ? null : melt.coatingDried ? "dried" : "not dried",
  ]
    .filter(Boolean)
    .join(", ");
}

/** A melt's conditions in the person's units: the screen's grid and the printed case sheet read the same rows. */
export function meltConditionRows(melt: Melt, units: Units): ConditionRow[] {
  const q = (quantity: Quantity, v: number | null) => (v === null ? null : formatValue(quantity, v, units));
  return [
    { label: "Alloy", value: melt.alloy },
    { label: "Process", value: PROCESS_LABELS[melt.process] },
    { label: "Charge", value: melt.charge && CHARGE_LABELS[melt.charge] },
    // Weighed or not shown: a weight is no input of the diagnosis, so not worth listing as missing.
    ...(melt.chargeWeightKg === null ? [] : [{ label: "Charge weight", value: q("mass", melt.chargeWeightKg) }]),
    { label: "Furnace", value: melt.furnace },
    { label: "Hottest the melt got", value: q("temperature", melt.meltTempC) },
    { label: "Pour temperature", value: q("temperature", melt.pourTempC) },
    { label: "Degassing", value: degassingText(melt) },
    { label: "Flux used", value: yesNo(melt.fluxed) },
    { label: "Skimmed", value: yesNo(melt.skimmed) },
    { label: "Air temperature", value: q("temperature", melt.ambientTempC) },
    { label: "Humidity", value: pct(melt.humidityPct) },
    ...(melt.process === "permanent-mould"
      ? []
      : [{ label: moistureLabel(melt.process), value: pct(melt.sandMoisturePct) }]),
    { label: "Coating", value: coatingText(melt) },
    ...(melt.process === "lost-foam" ? [{ label: "Foam density", value: q("density", melt.foamDensityKgM3) }] : []),
    // Conditions beyond the everyday ones, where they were logged (lib/condition-fields.ts).
    ...loggedConditions(MELT_CONDITIONS, melt, units),
  ];
}

/** A casting's sizes and gating in the person's units. */
export function castingConditionRows(c: Casting, units: Units): ConditionRow[] {
  const len = (v: number | null) => (v === null ? null : formatValue("length", v, units));
  return [
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
    ...castingWeightRows(c, units),
  ];
}

export type ChangedRow = { label: string; mine: string | null; theirs: string | null };

/** The rows whose value differs between the person's version and the one saved since: the two side by side. */
export function changedRows(mine: ConditionRow[], theirs: ConditionRow[]): ChangedRow[] {
  const labels = [...new Set([...mine, ...theirs].map((r) => r.label))];
  const valueOf = (rows: ConditionRow[], label: string) => rows.find((r) => r.label === label)?.value ?? null;
  return labels
    .map((label) => ({ label, mine: valueOf(mine, label), theirs: valueOf(theirs, label) }))
    .filter((r) => r.mine !== r.theirs);
}
