import { StyleSheet, Text, View } from "react-native";
import { card, colors, fontSize, space } from "@/constants/theme";

export type FactRow = { label: string; value: string | null };

/**
 * Recorded values as label/value pairs; what was not recorded is named in one line underneath,
 * because a missing input matters to the diagnosis and is worth seeing.
 */
export function FactGrid({ rows }: { rows: FactRow[] }) {
  const known = rows.filter((r) => r.value !== null);
  const missing = rows.filter((r) => r.value === null).map((r) => r.label.toLowerCase());
  return (
    <View style={styles.box}>
      <View style={styles.grid}>
        {known.map((r) => (
          <View key={r.label} style={styles.cell}>
            <Text style={styles.label}>{r.label}</Text>
            <Text style={styles.value}>{r.value}</Text>
          </View>
        ))}
      </View>
      {missing.length ? <Text style={styles.missing}>Not recorded: {missing.join(", ")}.</Text> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { ...card, padding: space.md, gap: space.sm },
  grid: { flexDirection: "row", flexWrap: "wrap", rowGap: space.sm },
  cell: { flexBasis: 160, flexGrow: 1, paddingRight: space.sm },
  label: { fontSize: fontSize.small, color: colors.muted },
  value: { fontSize: fontSize.body, color: colors.ink, fontWeight: "600" },
  missing: { fontSize: fontSize.detail, color: colors.muted, fontStyle: "italic" },
});
