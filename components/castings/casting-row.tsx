import { Link } from "expo-router";
import { Image, Pressable, StyleSheet, Text, View } from "react-native";
import { card, colors, fontSize, outcomeColours, radius, space } from "@/constants/theme";
import { photoUri } from "@/hooks/use-photos";
import { DEFECTS } from "@/lib/defects";
import { OUTCOME_LABELS } from "@/lib/labels";
import type { CastingSummary } from "@/lib/notebook-schemas";
import { castingYieldPct } from "@/rules/compute/casting-yield";

/** One casting in a melt's list: its part, how it came out, and what was marked on it. */
export function CastingRow({ casting }: { casting: CastingSummary }) {
  const defects = [...new Set(casting.defectTypes)].map((t) => DEFECTS[t].label.toLowerCase());
  const yieldPct = castingYieldPct(casting.castingWeightKg, casting.pouredWeightKg);
  return (
    <Link href={`/melts/${casting.meltId}/castings/${casting.id}`} asChild>
      <Pressable role="link" style={styles.row}>
        {casting.thumbUrl ? (
          <Image source={{ uri: photoUri(casting.thumbUrl) }} style={styles.thumb} accessibilityIgnoresInvertColors />
        ) : (
          <View style={[styles.thumb, styles.noThumb]}>
            <Text style={styles.noThumbText}>no photo</Text>
          </View>
        )}
        <View style={styles.body}>
          <View style={styles.top}>
            <Text style={styles.part} numberOfLines={1}>
              {casting.partName}
            </Text>
            {casting.outcome ? (
              <Text style={[styles.outcome, { color: outcomeColours[casting.outcome] }]}>
                {OUTCOME_LABELS[casting.outcome]}
              </Text>
            ) : (
              <Text style={styles.muted}>not judged</Text>
            )}
          </View>
          {casting.newAnswer ? (
            <Text style={styles.newAnswer} testID="new-answer">
              ● A mentor answered since you last looked
            </Text>
          ) : null}
          <Text style={styles.muted} numberOfLines={2}>
            {casting.markCount
              ? `${casting.markCount} mark${casting.markCount === 1 ? "" : "s"}: ${defects.join(", ")}`
              : "nothing marked"}
            {casting.photoCount ? ` · ${casting.photoCount} photo${casting.photoCount === 1 ? "" : "s"}` : ""}
            {yieldPct === undefined ? "" : ` · yield ${Math.round(yieldPct)} %`}
          </Text>
        </View>
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  row: { ...card, flexDirection: "row", gap: space.md, alignItems: "center", padding: space.sm },
  thumb: { width: 56, height: 56, borderRadius: radius.sm, backgroundColor: colors.background },
  noThumb: { alignItems: "center", justifyContent: "center" },
  noThumbText: { fontSize: fontSize.small, color: colors.muted },
  body: { flex: 1, minWidth: 0, gap: 2 },
  top: { flexDirection: "row", justifyContent: "space-between", gap: space.sm },
  part: { flex: 1, fontSize: fontSize.field, fontWeight: "600", color: colors.ink },
  outcome: { fontSize: fontSize.detail, fontWeight: "700" },
  muted: { fontSize: fontSize.detail, color: colors.muted },
  newAnswer: { fontSize: fontSize.detail, fontWeight: "700", color: colors.accent },
});
