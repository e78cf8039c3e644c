import { Pressable, StyleSheet, Text, View } from "react-native";
import { colors, fontSize } from "@/constants/theme";
import { chipStyles, type Choice } from "@/components/ui/choice-chips";

type Props = {
  label: string;
  hint?: string;
  options: readonly Choice[];
  values: readonly string[];
  onChange: (v: string[]) => void;
  disabled?: boolean;
};

/** Pick any number of a short list by tapping; tapping again takes one off. */
export function MultiChips({ label, hint, options, values, onChange, disabled }: Props) {
  const toggle = (v: string) => onChange(values.includes(v) ? values.filter((x) => x !== v) : [...values, v]);
  return (
    <View style={styles.wrap} role="group" aria-label={label}>
      <Text style={styles.label}>{label}</Text>
      {hint ? <Text style={styles.hint}>{hint}</Text> : null}
      <View style={styles.row}>
        {options.map((o) => {
          const on = values.includes(o.value);
          return (
            <Pressable
              key={o.value}
              role="checkbox"
              aria-checked={on}
              aria-label={o.label}
              disabled={disabled}
              onPress={() => toggle(o.value)}
              style={[styles.chip, on && styles.on]}
            >
              <Text style={[styles.text, on && styles.textOn]}>
                {on ? "✓ " : ""}
                {o.label}
              </Text>
            </Pressable>
          );
        })}
      </View>
    </View>
  );
}

const styles = { ...chipStyles, ...StyleSheet.create({ hint: { fontSize: fontSize.small, color: colors.muted } }) };
