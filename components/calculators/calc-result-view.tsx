import { StyleSheet, Text, View } from "react-native";
import { colors, fontSize, radius, space } from "@/constants/theme";
import { calcFormat } from "@/lib/calculator-fields";
import type { Units } from "@/lib/units";
import type { CalcResult } from "@/rules/calculators";

/** A result with each figure's formula and source, and the inputs it came from, in the person's units. */
export function CalcResultView({ result, units }: { result: CalcResult; units: Units }) {
  return (
    <View style={styles.wrap} aria-label="Result">
      {result.warnings.map((w) => (
        <Text key={w} role="alert" style={styles.warning}>
          ⚠ {w}
        </Text>
      ))}
      {result.lines.map((l) => (
        <View key={l.label} style={styles.line}>
          <View style={styles.head}>
            <Text style={styles.label}>{l.label}</Text>
            <Text style={styles.value}>{calcFormat(l.quantity, l.si, units)}</Text>
          </View>
          <Text style={styles.formula}>{l.formula}</Text>
          <Text style={styles.source}>Source: {l.source}</Text>
        </View>
      ))}
      {result.notes.map((n) => (
        <Text key={n} style={styles.note}>
          {n}
        </Text>
      ))}
      <Text style={styles.inputsHead}>From</Text>
      {result.inputs.map((i) => (
        <Text key={i.label} style={styles.input}>
          {i.label}: {calcFormat(i.quantity, i.si, units)}
        </Text>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: {
    gap: space.sm,
    backgroundColor: colors.surface,
    borderWidth: 1,
    borderColor: colors.line,
    borderRadius: radius.sm,
    padding: space.md,
  },
  line: { gap: 2, paddingBottom: space.sm, borderBottomWidth: 1, borderBottomColor: colors.line },
  head: { flexDirection: "row", justifyContent: "space-between", gap: space.sm, flexWrap: "wrap" },
  label: { fontSize: fontSize.body, fontWeight: "600", color: colors.ink, flexShrink: 1 },
  value: { fontSize: fontSize.lead, fontWeight: "700", color: colors.ink },
  formula: { fontSize: fontSize.detail, color: colors.ink, fontFamily: "monospace" },
  source: { fontSize: fontSize.small, color: colors.muted },
  note: { fontSize: fontSize.detail, color: colors.ink },
  warning: { fontSize: fontSize.body, color: colors.danger, fontWeight: "600" },
  inputsHead: { fontSize: fontSize.detail, fontWeight: "600", color: colors.muted, marginTop: space.xs },
  input: { fontSize: fontSize.detail, color: colors.muted },
});
