import { StyleSheet, Text, View } from "react-native";
import { colors, fontSize, radius, space } from "@/constants/theme";

/** How strongly the evidence points at a cause, 0 to 1, as a bar a person takes in at a glance. */
export function ScoreBar({ score }: { score: number }) {
  const pct = Math.round(Math.min(1, Math.max(0, score)) * 100);
  return (
    <View style={styles.row}>
      <View
        style={styles.track}
        role="meter"
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={pct}
        aria-label="Strength of the evidence"
      >
        <View style={[styles.fill, { width: `${pct}%` }]} />
      </View>
      <Text style={styles.text}>{score.toFixed(2)}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: "row", alignItems: "center", gap: space.sm },
  track: { flex: 1, height: 10, borderRadius: radius.sm, backgroundColor: colors.line, overflow: "hidden" },
  fill: { height: "100%", backgroundColor: colors.accent },
  text: { width: 40, textAlign: "right", fontSize: fontSize.detail, fontWeight: "700", color: colors.ink },
});
