import { Link } from "expo-router";
import { Pressable, StyleSheet, Text, View } from "react-native";
import { card, colors, fontSize, space } from "@/constants/theme";
import { formatDay } from "@/lib/dates";
import { PROCESS_LABELS } from "@/lib/labels";
import type { MeltSummary } from "@/lib/notebook-schemas";
import { formatValue, type Units } from "@/lib/units";
import { castingsLine } from "@/lib/case-words";

/** One melt on a phone: the day, the alloy and process, the pour temperature and how its castings came out. */
export function MeltCard({ melt, units }: { melt: MeltSummary; units: Units }) {
  return (
    // A plain style: Link asChild hands the style through a Slot that drops a style function.
    <Link href={`/melts/${melt.id}`} asChild>
      <Pressable role="link" style={styles.card}>
        <View style={styles.top}>
          <Text style={styles.day}>{formatDay(melt.pouredOn)}</Text>
          <Text style={styles.alloy}>{melt.alloy}</Text>
        </View>
        <Text style={styles.line}>
          {PROCESS_LABELS[melt.process]} · poured at {formatValue("temperature", melt.pourTempC, units)}
        </Text>
        {melt.furnace ? (
          <Text style={styles.muted} numberOfLines={1}>
            {melt.furnace}
          </Text>
        ) : null}
        <Text style={[styles.muted, melt.scrapCount ? styles.scrap : null]}>{castingsLine(melt)}</Text>
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  card: { ...card, padding: space.md, gap: 2 },
  top: { flexDirection: "row", justifyContent: "space-between", alignItems: "baseline" },
  day: { fontSize: fontSize.field, fontWeight: "600", color: colors.ink },
  alloy: { fontSize: fontSize.body, fontWeight: "700", color: colors.steel },
  line: { fontSize: fontSize.body, color: colors.ink },
  muted: { fontSize: fontSize.detail, color: colors.muted },
  scrap: { color: colors.danger },
});
