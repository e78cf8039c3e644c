import { StyleSheet, Text, View } from "react-native";
import { Heading } from "@/components/ui/heading";
import { colors, fontSize } from "@/constants/theme";
import type { FixPoint } from "@/lib/trends-schemas";
import { BarRow, styles as bar } from "./rate-bars";

/** How each outcome of a fix is drawn: shade and a word, so the bar reads without colour too. */
const PARTS = [
  { key: "worked", word: "worked", color: colors.steel },
  { key: "partly", word: "partly", color: "#7FA3A6" },
  { key: "failed", word: "did not work", color: colors.accent },
  { key: "notJudged", word: "not judged yet", color: colors.line },
] as const;

/** The fixes tried, most tried first: one bar each, split by how the next casting came out. */
export function FixBars({ points }: { points: FixPoint[] }) {
  return (
    <View style={bar.wrap}>
      <Heading level={3}>Fixes tried and how they worked</Heading>
      {points.length === 0 ? <Text style={bar.none}>No fixes recorded on castings in these filters.</Text> : null}
      {points.length > 0 ? (
        <Text style={styles.legend}>{PARTS.map((p) => `${p.word}`).join(" · ")} (dark to light)</Text>
      ) : null}
      {points.map((f) => {
        const words = `${f.fix}: tried ${f.tried} times; ${PARTS.map((p) => `${f[p.key]} ${p.word}`).join(", ")}`;
        return (
          <BarRow key={f.fix} words={words} stacked>
            <Text style={bar.label}>{f.fix}</Text>
            <View style={bar.row}>
              <View style={bar.track}>
                {PARTS.map((p) =>
                  f[p.key] ? (
                    <View key={p.key} style={{ flex: f[p.key], backgroundColor: p.color, height: "100%" }} />
                  ) : null,
                )}
              </View>
              <Text style={bar.count}>
                {f.worked}/{f.tried} worked
              </Text>
            </View>
          </BarRow>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  legend: { fontSize: fontSize.small, color: colors.muted },
});
