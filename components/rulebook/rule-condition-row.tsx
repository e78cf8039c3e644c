import { Pressable, StyleSheet, Text, View } from "react-native";
import { ChoiceChips } from "@/components/ui/choice-chips";
import { FieldError } from "@/components/ui/field-error";
import { NumberField } from "@/components/ui/number-field";
import { MultiChips } from "@/components/rulebook/rule-multi-chips";
import { RuleFactPicker } from "@/components/rulebook/rule-fact-picker";
import { colors, fontSize, radius, space } from "@/constants/theme";
import type { RowState } from "@/hooks/use-rule-draft";
import { COMPARISON_WORDS, comparisonsFor, type Comparison } from "@/lib/rulebook-schemas";
import { factUnit } from "@/lib/rule-units";
import type { Units } from "@/lib/units";
import { factSpec } from "@/rules/fact-catalog";
import { valueWord } from "@/rules/rule-words";

type Props = {
  index: number;
  row: RowState;
  units: Units;
  errors: Partial<Record<"fact" | "comparison" | "value", string>>;
  onChange: (patch: Partial<RowState>) => void;
  onRemove?: () => void;
};

/** One condition: what to look at, a comparison in words, and the value(s) in the person's units. */
export function RuleConditionRow({ index, row, units, errors, onChange, onRemove }: Props) {
  const spec = factSpec(row.fact);
  const unit = spec?.kind === "number" ? factUnit(spec, units) : undefined;
  const number = spec?.kind === "number" ? spec : undefined;
  // Inches take fractions (1 1/2); air temperatures and differences (superheat) can be below zero.
  const keys = {
    fractions: number?.quantity === "length" && units.length === "in",
    signed: number?.quantity === "temperature-difference" || row.fact === "ambientTempC",
  };
  const comparisons = spec ? comparisonsFor(spec).map((c) => ({ value: c, label: COMPARISON_WORDS[c] })) : [];
  return (
    <View style={styles.card} testID={`condition-${index}`}>
      <View style={styles.head}>
        <Text style={styles.title}>Condition {index + 1}</Text>
        {onRemove ? (
          <Pressable role="button" aria-label={`Remove condition ${index + 1}`} onPress={onRemove}>
            <Text style={styles.remove}>Remove</Text>
          </Pressable>
        ) : null}
      </View>
      <RuleFactPicker
        fact={row.fact}
        units={units}
        error={errors.fact}
        onPick={(fact) =>
          onChange({
            fact,
            comparison: fact === row.fact ? row.comparison : "",
            low: "",
            high: "",
            values: [],
            yes: null,
          })
        }
      />
      {spec ? (
        <>
          <ChoiceChips
            label="Comparison"
            options={comparisons}
            value={row.comparison || null}
            onChange={(c) => onChange({ comparison: c as Comparison })}
          />
          <FieldError message={errors.comparison} />
        </>
      ) : null}
      {spec && (row.comparison === "below" || row.comparison === "above") ? (
        <NumberField
          label="Value"
          unit={unit}
          {...keys}
          value={row.low}
          onChangeText={(low) => onChange({ low })}
          error={errors.value}
        />
      ) : null}
      {spec && row.comparison === "between" ? (
        <>
          <View style={styles.pair}>
            <NumberField label="From" unit={unit} {...keys} value={row.low} onChangeText={(low) => onChange({ low })} />
            <NumberField
              label="To"
              unit={unit}
              {...keys}
              value={row.high}
              onChangeText={(high) => onChange({ high })}
            />
          </View>
          <FieldError message={errors.value} />
        </>
      ) : null}
      {spec?.kind === "enum" && (row.comparison === "one-of" || row.comparison === "not-one-of") ? (
        <>
          <MultiChips
            label="Values"
            options={spec.values.map((v) => ({ value: v, label: valueWord(v) }))}
            values={row.values}
            onChange={(values) => onChange({ values })}
          />
          <FieldError message={errors.value} />
        </>
      ) : null}
      {spec?.kind === "boolean" && row.comparison === "is" ? (
        <>
          <ChoiceChips
            label="Value"
            options={[
              { value: "yes", label: "yes" },
              { value: "no", label: "no" },
            ]}
            value={row.yes === null ? null : row.yes ? "yes" : "no"}
            onChange={(v) => onChange({ yes: v === "yes" })}
          />
          <FieldError message={errors.value} />
        </>
      ) : null}
      {row.comparison === "missing" ? (
        <Text style={styles.note}>Holds when nobody logged this value for the casting.</Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  card: {
    gap: space.sm,
    padding: space.md,
    borderRadius: radius.md,
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.background,
  },
  head: { flexDirection: "row", justifyContent: "space-between", alignItems: "center" },
  title: { fontSize: fontSize.detail, fontWeight: "700", color: colors.muted },
  remove: { fontSize: fontSize.detail, fontWeight: "600", color: colors.danger, paddingVertical: space.xs },
  pair: { flexDirection: "row", flexWrap: "wrap", gap: space.md },
  note: { fontSize: fontSize.detail, color: colors.muted },
});
