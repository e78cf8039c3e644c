import { Platform, StyleSheet, Text, TextInput, View, type TextInputProps } from "react-native";
import { colors, fieldBox, fontSize, space } from "@/constants/theme";

type Props = {
  label: string;
  unit?: string;
  value: string;
  onChangeText: (t: string) => void;
  error?: string;
  hint?: string;
  /** Whole numbers only (coats, minutes): a number pad without a decimal point. */
  whole?: boolean;
  /** The value can be below zero (air temperature): a keyboard with a minus sign. */
  signed?: boolean;
  /** Inches typed as casters write them (1 1/2, 3/4"): a keyboard with /, " and a space. */
  fractions?: boolean;
};

/**
 * Which keyboard a box asks for. iOS's decimal and number pads have no minus, slash or inch mark
 * (inputMode "decimal" or "numeric" on the web, "decimal-pad" natively), so a signed or fractional
 * number asks for iOS's numbers-and-punctuation keyboard natively and for the text keyboard on the
 * web, where no inputmode gives digits with a minus on iOS (its "123" page has - / " and space).
 */
function keyboard({ whole, signed, fractions }: Pick<Props, "whole" | "signed" | "fractions">): TextInputProps {
  if (signed || fractions) {
    if (Platform.OS === "web") return { inputMode: "text", autoCapitalize: "none", autoCorrect: false };
    return { keyboardType: Platform.OS === "ios" ? "numbers-and-punctuation" : "default", autoCorrect: false };
  }
  return whole
    ? { inputMode: "numeric", keyboardType: "number-pad" }
    : { inputMode: "decimal", keyboardType: "decimal-pad" };
}

/** A number typed in the person's units, with the unit beside it and the error line under it. */
export function NumberField({ label, unit, value, onChangeText, error, hint, whole, signed, fractions }: Props) {
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
          {...keyboard({ whole, signed, fractions })}
          placeholder={hint ?? (fractions ? "e.g. 1 1/2" : undefined)}
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
  input: { ...fieldBox, flex: 1, minWidth: 0 },
  inputError: { borderColor: colors.danger },
  unit: { fontSize: fontSize.body, color: colors.muted, minWidth: 36 },
  error: { color: colors.danger, fontSize: fontSize.detail },
});
