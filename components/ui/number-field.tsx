import { StyleSheet, Text, TextInput, View } from "react-native";
import { colors, fontSize, radius, space } from "@/constants/theme";

type Props = {
  label: string;
  unit?: string;
  value: string;
  onChangeText: (t: string) => void;
  error?: string;
  hint?: string;
  /** Whole numbers only (coats, minutes): a number pad without a decimal point. */
  whole?: boolean;
};

/** A number typed in the person's units, with the unit beside it and the error line under it. */
export function NumberField({ label, unit, value, onChangeText, error, hint, whole }: Props) {
  // The unit sits beside the box; screen readers get it in the name.
  const name = unit ? `${label} (${unit})` : label;
  return (
    <View style={styles.wrap}>
      <Text style={styles.label}>{label}</Text>
      <View style={styles.row}>
        <TextInput
          aria-label={name}
          aria-invalid={!!error}
          value={value}
          onChangeText={onChangeText}
          inputMode={whole ? "numeric" : "decimal"}
          keyboardType={whole ? "number-pad" : "decimal-pad"}
          placeholder={hint}
          placeholderTextColor={colors.muted}
          style={[styles.input, error ? styles.inputError : null]}
        />
        {unit ? <Text style={styles.unit}>{unit}</Text> : null}
      </View>
      {error ? (
        <Text role="alert" style={styles.error}>
          {error}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  label: { fontSize: fontSize.detail, fontWeight: "600", color: colors.ink },
  // A number is short: the box stays narrow on a wide screen.
  row: { flexDirection: "row", alignItems: "center", gap: space.sm, maxWidth: 280 },
  input: {
    flex: 1,
    minWidth: 0,
    minHeight: 44,
    borderWidth: 1,
    borderColor: colors.line,
    borderRadius: radius.sm,
    paddingHorizontal: space.md,
    fontSize: fontSize.field,
    backgroundColor: colors.surface,
    color: colors.ink,
  },
  inputError: { borderColor: colors.danger },
  unit: { fontSize: fontSize.body, color: colors.muted, minWidth: 36 },
  error: { color: colors.danger, fontSize: fontSize.detail },
});
