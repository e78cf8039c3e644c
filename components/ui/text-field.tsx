import { StyleSheet, Text, TextInput, View, type TextInputProps } from "react-native";
import { colors, fieldBox, fontSize, space } from "@/constants/theme";

type Props = TextInputProps & { label: string; error?: string };

/** A labelled input with its own error line under it. */
export function TextField({ label, error, style, ...input }: Props) {
  return (
    <View style={styles.wrap}>
      <Text style={styles.label}>{label}</Text>
      <TextInput
        aria-label={label}
        aria-invalid={!!error}
        placeholderTextColor={colors.muted}
        style={[styles.input, error ? styles.inputError : null, style]}
        {...input}
      />
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
  input: { ...fieldBox },
  inputError: { borderColor: colors.danger },
  error: { color: colors.danger, fontSize: fontSize.detail },
});
