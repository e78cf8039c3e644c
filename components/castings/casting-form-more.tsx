import { CastingWeights } from "@/components/castings/casting-weights";
import { ConditionGroups } from "@/components/conditions/condition-groups";
import { Pair } from "@/components/ui/field-pair";
import { NumberField } from "@/components/ui/number-field";
import { TextField } from "@/components/ui/text-field";
import { YesNoChips } from "@/components/ui/yes-no-chips";
import type { CastingDraft } from "@/hooks/use-casting-draft";
import { CASTING_CONDITIONS } from "@/lib/condition-fields";
import { takesInchFractions, unitLabel, type Units } from "@/lib/units";

type Props = {
  draft: CastingDraft;
  set: <K extends keyof CastingDraft>(key: K, value: CastingDraft[K]) => void;
  errors: Record<string, string>;
  units: Units;
};

/** The casting's gating and mould details: worth logging, but not needed to save the casting. */
export function CastingMore({ draft, set, errors, units }: Props) {
  return (
    <>
      <Pair>
        <NumberField
          label="Sprue height"
          unit={unitLabel("length", units)}
          fractions={takesInchFractions("length", units)}
          value={draft.sprueHeightMm}
          onChangeText={(v) => set("sprueHeightMm", v)}
          error={errors.sprueHeightMm}
        />
        <NumberField
          label="Pour time"
          unit="s"
          value={draft.pourTimeS}
          onChangeText={(v) => set("pourTimeS", v)}
          error={errors.pourTimeS}
        />
      </Pair>
      <CastingWeights draft={draft} set={set} errors={errors} units={units} />
      <ConditionGroups
        groups={CASTING_CONDITIONS}
        draft={draft.conditions}
        onChange={(v) => set("conditions", v)}
        errors={errors}
        context={{ process: null }}
        units={units}
      />
      <TextField
        label="Pattern"
        value={draft.pattern}
        onChangeText={(v) => set("pattern", v)}
        error={errors.pattern}
        placeholder="which pattern or foam block"
      />
      <YesNoChips label="Riser" value={draft.hasRiser} onChange={(v) => set("hasRiser", v)} />
      <YesNoChips label="Overflow" value={draft.hasOverflow} onChange={(v) => set("hasOverflow", v)} />
      <YesNoChips label="Vents" value={draft.hasVents} onChange={(v) => set("hasVents", v)} />
      <TextField
        label="Orientation in the mould"
        value={draft.orientation}
        onChangeText={(v) => set("orientation", v)}
        error={errors.orientation}
        placeholder="e.g. flat face down, gate at the thick end"
      />
      <TextField
        label="Notes"
        value={draft.notes}
        onChangeText={(v) => set("notes", v)}
        error={errors.notes}
        multiline
        placeholder="Anything else about this casting"
        style={{ minHeight: 72, paddingTop: 8 }}
      />
    </>
  );
}
