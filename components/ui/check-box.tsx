import { Pressable, StyleSheet, Text, View } from "react-native";
import { colors, fontSize, space } from "@/constants/theme";

type Props = {
  label: string;
  checked: boolean;
  onChange: (checked: boolean) => void;
  disabled?: boolean;
  /** Body-size text for a list worth reading (fixes to try); detail size otherwise. */
  large?: boolean;
};

/** A box to tick beside its words; the whole row is the target, and it reads as a checkbox. */
export function CheckBox({ label, checked, onChange, disabled, large }: Props) {
  return (
    <Pressable
      role="checkbox"
      aria-checked={checked}
      aria-label={label}
      disabled={disabled}
      onPress={() => onChange(!checked)}
      style={styles.row}
    >
      <View style={[styles.box, checked && styles.boxOn]}>{checked ? <Text style={styles.tick}>✓</Text> : null}</View>
      <Text style={[styles.text, large && styles.large]}>{label}</Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: "row", gap: space.sm, alignItems: "flex-start", minHeight: 32 },
  box: {
    width: 22,
    height: 22,
    borderRadius: 4,
    borderWidth: 2,
    borderColor: colors.steel,
    alignItems: "center",
    justifyContent: "center",
    marginTop: 1,
  },
  boxOn: { backgroundColor: colors.steel },
  tick: { color: colors.accentInk, fontSize: fontSize.detail, fontWeight: "700", lineHeight: 16 },
  text: { flex: 1, fontSize: fontSize.detail, lineHeight: 20, color: colors.ink },
  large: { fontSize: fontSize.body, lineHeight: 22 },
});
