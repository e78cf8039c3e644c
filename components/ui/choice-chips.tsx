import { Pressable, StyleSheet, Text, View } from "react-native";
import { card, colors, fontSize, space } from "@/constants/theme";

export type Choice = { value: string; label: string };
type Props = {
  label: string;
  options: readonly Choice[];
  value: string | null;
  onChange: (v: string) => void;
  disabled?: boolean;
};

/** Pick one of a short list by tapping: quicker than a drop-down on a phone. */
export function ChoiceChips({ label, options, value, onChange, disabled }: Props) {
  return (
    <View style={chipStyles.wrap} role="radiogroup" aria-label={label}>
      <Text style={chipStyles.label}>{label}</Text>
      <View style={chipStyles.row}>
        {options.map((o) => (
          <Pressable
            key={o.value}
            role="radio"
            aria-checked={o.value === value}
            disabled={disabled}
            onPress={() => onChange(o.value)}
            style={[chipStyles.chip, o.value === value && chipStyles.on]}
          >
            <Text style={[chipStyles.text, o.value === value && chipStyles.textOn]}>{o.label}</Text>
          </Pressable>
        ))}
      </View>
    </View>
  );
}

/** The chip look, shared with the many-choice chips (rule-multi-chips.tsx). */
export const chipStyles = StyleSheet.create({
  wrap: { gap: space.xs },
  label: { fontSize: fontSize.detail, fontWeight: "600", color: colors.ink },
  row: { flexDirection: "row", flexWrap: "wrap", gap: space.sm },
  chip: { ...card, paddingHorizontal: space.md, paddingVertical: space.sm },
  on: { backgroundColor: colors.steel, borderColor: colors.steel },
  text: { color: colors.ink, fontSize: fontSize.detail },
  textOn: { color: "#FFFFFF", fontWeight: "600" },
});
