import { StyleSheet, Text, View } from "react-native";
import { Heading } from "@/components/ui/heading";
import { colors, fontSize, radius, space } from "@/constants/theme";
import type { RatePoint } from "@/lib/trends-schemas";

/** Fewer castings than this in a group and its rate is shown as a count only: too few to compare. */
export const MIN_CASTINGS_FOR_RATE = 5;

/** A rate chart as horizontal bars, readable at 390 px; each bar says its counts in words for screen readers. */
export function RateBars({ title, what, points }: { title: string; what: string; points: RatePoint[] }) {
  return (
    <View style={styles.wrap}>
      <Heading level={3}>{title}</Heading>
      {points.length === 0 ? <Text style={styles.none}>No castings in these filters.</Text> : null}
      {points.map((p) => {
        const rate = p.castings ? p.count / p.castings : 0;
        const words = `${p.key}: ${p.count} of ${p.castings} castings ${what} (${Math.round(rate * 100)} %)`;
        return (
          <View key={p.key} style={styles.row} aria-label={words} role="img">
            <Text style={styles.key}>{p.key}</Text>
            <View style={styles.track}>
              <View style={[styles.bar, { width: `${Math.round(rate * 100)}%` }]} />
            </View>
            <Text style={styles.count}>
              {p.count}/{p.castings}
              {p.castings >= MIN_CASTINGS_FOR_RATE ? ` · ${Math.round(rate * 100)} %` : ""}
            </Text>
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  none: { color: colors.muted, fontSize: fontSize.detail },
  row: { flexDirection: "row", alignItems: "center", gap: space.sm },
  key: { width: 110, fontSize: fontSize.detail, color: colors.ink },
  track: {
    flex: 1,
    height: 16,
    backgroundColor: colors.surface,
    borderRadius: radius.sm,
    borderWidth: 1,
    borderColor: colors.line,
  },
  bar: { height: "100%", backgroundColor: colors.accent, borderRadius: radius.sm },
  count: { width: 82, fontSize: fontSize.detail, color: colors.ink, textAlign: "right" },
});
