import { ChoiceChips } from "@/components/ui/choice-chips";
import { FieldError } from "@/components/ui/field-error";
import { Pair } from "@/components/ui/field-pair";
import { Heading } from "@/components/ui/heading";
import { NumberField } from "@/components/ui/number-field";
import { TextField } from "@/components/ui/text-field";
import { YesNoChips } from "@/components/ui/yes-no-chips";
import type { MeltDraft } from "@/hooks/use-melt-draft";
import { showsFoam, showsMoisture } from "@/hooks/use-melt-draft";
import { CHARGE_LABELS, DEGASSING_LABELS, moistureLabel } from "@/lib/labels";
import { unitLabel, type Units } from "@/lib/units";
import { CHARGES, DEGASSING_METHODS, type Charge, type DegassingMethod } from "@/rules/case";

export type SectionProps = {
  draft: MeltDraft;
  set: <K extends keyof MeltDraft>(key: K, value: MeltDraft[K]) => void;
  errors: Record<string, string>;
  units: Units;
};

const CHARGE_CHOICES = CHARGES.map((c) => ({ value: c, label: CHARGE_LABELS[c] }));
const DEGAS_CHOICES = DEGASSING_METHODS.map((d) => ({ value: d, label: DEGASSING_LABELS[d] }));

export function MetalSection({ draft, set, errors, units }: SectionProps) {
  const t = unitLabel("temperature", units);
  return (
    <>
      <Heading level={3}>Charge and temperatures</Heading>
      <ChoiceChips
        label="Charge"
        options={CHARGE_CHOICES}
        value={draft.charge}
        onChange={(v) => set("charge", v as Charge)}
      />
      <FieldError message={errors.charge} />
      <NumberField
        label="Charge weight, into the furnace"
        unit={unitLabel("mass", units)}
        value={draft.chargeWeightKg}
        onChangeText={(v) => set("chargeWeightKg", v)}
        error={errors.chargeWeightKg}
      />
      <TextField
        label="Furnace"
        value={draft.furnace}
        onChangeText={(v) => set("furnace", v)}
        error={errors.furnace}
        placeholder="e.g. propane pot furnace, no. 2 crucible"
      />
      <Pair>
        <NumberField
          label="Hottest the melt got"
          unit={t}
          value={draft.meltTempC}
          onChangeText={(v) => set("meltTempC", v)}
          error={errors.meltTempC}
        />
        <NumberField
          label="Pour temperature"
          unit={t}
          value={draft.pourTempC}
          onChangeText={(v) => set("pourTempC", v)}
          error={errors.pourTempC}
        />
      </Pair>
    </>
  );
}

export function CleaningSection({ draft, set, errors }: SectionProps) {
  return (
    <>
      <Heading level={3}>Degassing and cleaning</Heading>
      <ChoiceChips
        label="Degassing"
        options={DEGAS_CHOICES}
        value={draft.degassing}
        onChange={(v) => set("degassing", v as DegassingMethod)}
      />
      <FieldError message={errors.degassing} />
      {draft.degassing && draft.degassing !== "none" ? (
        <NumberField
          label="Degassing time"
          unit="min"
          value={draft.degasMinutes}
          onChangeText={(v) => set("degasMinutes", v)}
          error={errors.degasMinutes}
        />
      ) : null}
      <YesNoChips label="Flux used" value={draft.fluxed} onChange={(v) => set("fluxed", v)} />
      <FieldError message={errors.fluxed} />
      <YesNoChips label="Skimmed before pouring" value={draft.skimmed} onChange={(v) => set("skimmed", v)} />
    </>
  );
}

export function DaySection({ draft, set, errors, units }: SectionProps) {
  return (
    <>
      <Heading level={3}>The day</Heading>
      <Pair>
        <NumberField
          label="Air temperature"
          unit={unitLabel("temperature", units)}
          signed
          value={draft.ambientTempC}
          onChangeText={(v) => set("ambientTempC", v)}
          error={errors.ambientTempC}
        />
        <NumberField
          label="Humidity"
          unit="%"
          value={draft.humidityPct}
          onChangeText={(v) => set("humidityPct", v)}
          error={errors.humidityPct}
        />
      </Pair>
    </>
  );
}

export function MouldSection({ draft, set, errors, units }: SectionProps) {
  return (
    <>
      <Heading level={3}>The mould</Heading>
      {showsMoisture(draft.process) ? (
        <NumberField
          label={moistureLabel(draft.process)}
          unit="%"
          value={draft.sandMoisturePct}
          onChangeText={(v) => set("sandMoisturePct", v)}
          error={errors.sandMoisturePct}
        />
      ) : null}
      <YesNoChips label="Coating applied" value={draft.coatingApplied} onChange={(v) => set("coatingApplied", v)} />
      {draft.coatingApplied !== false ? (
        <>
          <YesNoChips
            label="Coating dried before pouring"
            value={draft.coatingDried}
            onChange={(v) => set("coatingDried", v)}
          />
          <FieldError message={errors.coatingDried} />
          <NumberField
            label="Coats"
            whole
            value={draft.coatingCoats}
            onChangeText={(v) => set("coatingCoats", v)}
            error={errors.coatingCoats}
          />
        </>
      ) : null}
      {showsFoam(draft.process) ? (
        <NumberField
          label="Foam density"
          unit={unitLabel("density", units)}
          value={draft.foamDensityKgM3}
          onChangeText={(v) => set("foamDensityKgM3", v)}
          error={errors.foamDensityKgM3}
        />
      ) : null}
    </>
  );
}
