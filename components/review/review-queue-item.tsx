import { Link } from "expo-router";
import { Pressable, StyleSheet, Text } from "react-native";
import { card, colors, fontSize, space } from "@/constants/theme";
import { formatDay, formatMoment } from "@/lib/dates";
import { DEFECTS } from "@/lib/defects";
import { PROCESS_LABELS } from "@/lib/labels";
import type { QueueItem } from "@/lib/review-schemas";

/** One casting waiting for a mentor: what it is, what was marked, who asked and what the rules said last. */
export function ReviewQueueItem({ item }: { item: QueueItem }) {
  const defects = item.defectTypes.map((t) => DEFECTS[t].label.toLowerCase()).join(", ") || "nothing marked";
  // A plain style: Link asChild hands the style through a Slot that drops a style function.
  return (
    <Link href={`/melts/${item.meltId}/castings/${item.castingId}`} asChild>
      <Pressable role="link" style={styles.row} testID="review-item">
        <Text style={styles.part}>{item.partName}</Text>
        <Text style={styles.meta}>
          {item.alloy}, {PROCESS_LABELS[item.process]}, poured {formatDay(item.pouredOn)} · {defects}
        </Text>
        <Text style={styles.meta}>
          Asked by {item.askedBy?.name ?? "someone"}, {formatMoment(item.askedAt)}
        </Text>
        {item.note ? <Text style={styles.note}>“{item.note}”</Text> : null}
        <Text style={styles.top}>
          {item.topCause ? `Rules said: ${item.topCause.title}` : "No diagnosis worked out yet"}
        </Text>
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  row: { ...card, gap: 2, padding: space.md },
  part: { fontSize: fontSize.field, fontWeight: "700", color: colors.accent },
  meta: { fontSize: fontSize.detail, color: colors.muted },
  note: { fontSize: fontSize.body, lineHeight: 22, color: colors.ink, fontStyle: "italic" },
  top: { fontSize: fontSize.detail, color: colors.steel, fontWeight: "600" },
});
