import { Link } from "expo-router";
import { Pressable, StyleSheet, Text, View } from "react-native";
import { OutcomeTag } from "@/components/search/casebook-result-card";
import { castingHref, causeLine } from "@/lib/case-words";
import { Heading } from "@/components/ui/heading";
import { Notice } from "@/components/ui/notice";
import { Loading } from "@/components/ui/query-state";
import { card, colors, fontSize, space } from "@/constants/theme";
import { useSimilarCases } from "@/hooks/use-search";
import { useUnits } from "@/hooks/use-units";
import { formatDay } from "@/lib/dates";
import { reasonText } from "@/lib/search-schemas";

/**
 * "Cases like this one", for a casting's page: up to five past cases with the same defects under
 * similar conditions, confirmed causes with a fix that worked first, each saying why it is alike.
 */
export function SimilarCases({ castingId }: { castingId: number }) {
  const similar = useSimilarCases(castingId);
  const units = useUnits();
  return (
    <View style={styles.wrap} testID="similar-cases">
      <Heading level={2}>Cases like this one</Heading>
      {similar.isPending ? <Loading /> : null}
      {similar.error ? <Notice tone="error">{similar.error.message}</Notice> : null}
      {similar.data && !similar.data.items.length ? (
        <Text style={styles.muted}>
          No other case shares these defects yet. Mark the defects to compare this casting with past ones.
        </Text>
      ) : null}
      {similar.data?.items.map((c) => (
        <Link key={c.id} href={castingHref(c)} asChild>
          <Pressable role="link" style={styles.item}>
            <View style={styles.top}>
              <Text style={styles.part} numberOfLines={1}>
                {c.partName}
              </Text>
              <OutcomeTag outcome={c.outcome} />
            </View>
            <Text style={styles.muted}>
              {formatDay(c.pouredOn)} · {c.alloy}
            </Text>
            <Text style={styles.reason}>{reasonText(c.parts, units)}</Text>
            {c.cause ? <Text style={styles.cause}>{causeLine(c)}</Text> : null}
          </Pressable>
        </Link>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  item: { ...card, padding: space.md, gap: 2 },
  top: { flexDirection: "row", justifyContent: "space-between", alignItems: "center", gap: space.sm },
  part: { flex: 1, fontSize: fontSize.field, fontWeight: "600", color: colors.ink },
  reason: { fontSize: fontSize.body, color: colors.ink },
  cause: { fontSize: fontSize.detail, color: colors.steel },
  muted: { fontSize: fontSize.detail, color: colors.muted },
});
