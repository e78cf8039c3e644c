import { StyleSheet, Text } from "react-native";
import { Pair } from "@/components/ui/field-pair";
import { NumberField } from "@/components/ui/number-field";
import { colors, fontSize } from "@/constants/theme";
import type { CastingDraft } from "@/hooks/use-casting-draft";
import { fromField, unitLabel, type Units } from "@/lib/units";
import { castingYieldPct } from "@/rules/compute/casting-yield";

type Props = {
  draft: CastingDraft;
  set: <K extends keyof CastingDraft>(key: K, value: CastingDraft[K]) => void;
  errors: Record<string, string>;
  units: Units;
};

/** The casting as cleaned and the metal its mould took, with the yield worked out as they are typed. */
export function CastingWeights({ draft, set, errors, units }: Props) {
  const unit = unitLabel("mass", units);
  // A ratio: the same in kg or lb, so the typed numbers are compared as they stand in SI.
  const y = castingYieldPct(
    fromField("mass", draft.castingWeightKg, units),
    fromField("mass", draft.pouredWeightKg, units),
  );
  return (
    <>
      <Pair>
        <NumberField
          label="Casting weight (cleaned)"
          unit={unit}
          value={draft.castingWeightKg}
          onChangeText={(v) => set("castingWeightKg", v)}
          error={errors.castingWeightKg}
        />
        <NumberField
          label="Metal poured (with gating and risers)"
          unit={unit}
          value={draft.pouredWeightKg}
          onChangeText={(v) => set("pouredWeightKg", v)}
          error={errors.pouredWeightKg}
        />
      </Pair>
      {y !== undefined && Number.isFinite(y) && y <= 100 ? (
        <Text style={styles.yield} role="status" testID="casting-yield">
          Yield {Math.round(y)} %: the casting is {Math.round(y)} % of the metal poured into its mould.
        </Text>
      ) : null}
    </>
  );
}

const styles = StyleSheet.create({
  yield: { fontSize: fontSize.body, color: colors.steel },
});
