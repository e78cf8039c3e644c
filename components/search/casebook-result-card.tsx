import { Link } from "expo-router";
import { Pressable, StyleSheet, Text, View } from "react-native";
import { MarkedText } from "@/components/search/casebook-marked-text";
import { card, colors, fontSize, outcomeColours, radius, space } from "@/constants/theme";
import { formatDay } from "@/lib/dates";
import { OUTCOME_LABELS, PROCESS_LABELS } from "@/lib/labels";
import type { CaseHit, CaseSummary } from "@/lib/search-schemas";
import { castingHref, causeLine, defectsLine } from "@/lib/case-words";

export function OutcomeTag({ outcome }: { outcome: CaseSummary["outcome"] }) {
  if (!outcome) return <Text style={styles.muted}>not judged</Text>;
  return (
    <Text style={[styles.tag, { color: outcomeColours[outcome], borderColor: outcomeColours[outcome] }]}>
      {OUTCOME_LABELS[outcome]}
    </Text>
  );
}

/** One case on a phone: what it was, when and how it was poured, what went wrong and why. */
export function CasebookResultCard({ hit }: { hit: CaseHit }) {
  const words = hit.marked.notes ?? hit.marked.comments;
  return (
    <Link href={castingHref(hit)} asChild>
      <Pressable role="link" style={styles.card} testID="case-card">
        <View style={styles.top}>
          <MarkedText style={styles.part} runs={hit.marked.part} plain={hit.partName} numberOfLines={1} />
          <OutcomeTag outcome={hit.outcome} />
        </View>
        <Text style={styles.muted}>
          {formatDay(hit.pouredOn)} · {hit.alloy} · {PROCESS_LABELS[hit.process]}
        </Text>
        <MarkedText style={styles.line} runs={hit.marked.defects} plain={defectsLine(hit)} />
        {hit.marked.causes ? (
          <Text style={styles.cause} numberOfLines={2}>
            {hit.cause?.confirmed ? "Confirmed" : "Cause, fixes"}: <MarkedText runs={hit.marked.causes} plain="" />
          </Text>
        ) : hit.cause ? (
          <Text style={styles.cause} numberOfLines={2}>
            {causeLine(hit)}
          </Text>
        ) : null}
        {words ? <MarkedText style={styles.words} runs={words} plain="" numberOfLines={3} /> : null}
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  card: { ...card, padding: space.md, gap: 4 },
  top: { flexDirection: "row", justifyContent: "space-between", alignItems: "center", gap: space.sm },
  part: { flex: 1, fontSize: fontSize.lead, fontWeight: "600", color: colors.ink },
  line: { fontSize: fontSize.body, color: colors.ink },
  cause: { fontSize: fontSize.detail, color: colors.steel },
  words: { fontSize: fontSize.detail, color: colors.muted, fontStyle: "italic" },
  muted: { fontSize: fontSize.detail, color: colors.muted },
  tag: {
    fontSize: fontSize.small,
    fontWeight: "700",
    borderWidth: 1,
    borderRadius: radius.sm,
    paddingHorizontal: 6,
    paddingVertical: 1,
  },
});
