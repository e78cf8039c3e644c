import { Link } from "expo-router";
import { Pressable, StyleSheet, Text, View } from "react-native";
import { RuleRecordLine } from "@/components/rule-record";
import { colors, radius, space } from "@/constants/theme";
import { DEFECTS } from "@/lib/defects";
import type { RuleRow } from "@/lib/rulebook-schemas";

export const STATUS_WORDS: Record<RuleRow["status"], string> = {
  "built-in": "built in", draft: "draft", published: "in use", retired: "retired",
};

/** One rule in the list: what it points to, for which defects, where it comes from and how it did here. */
export function RuleListItem({ rule }: { rule: RuleRow }) {
  const defects = rule.explains.map((t) => DEFECTS[t].label.toLowerCase()).join(", ");
  const state = rule.switchedOff ? "switched off here" : STATUS_WORDS[rule.status];
  return (
    <Link href={`/rulebook/${rule.id}`} asChild>
      <Pressable role="link" style={({ pressed }) => [styles.row, pressed && styles.pressed]} testID={`rule-${rule.id}`}>
        <View style={styles.top}>
          <Text style={styles.title} numberOfLines={2}>{rule.effect === "weakens" ? "Against: " : ""}{rule.cause.title}</Text>
          <Text style={[styles.state, !rule.inUse && styles.off]}>{state}</Text>
        </View>
        <Text style={styles.meta} numberOfLines={1}>{defects} · {rule.source === "shop" ? "written here" : rule.family.toLowerCase()}</Text>
        <RuleRecordLine record={rule.record} />
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  row: { gap: 2, padding: space.md, borderRadius: radius.md, borderWidth: 1, borderColor: colors.line, backgroundColor: colors.surface },
  pressed: { opacity: 0.8 },
  top: { flexDirection: "row", gap: space.sm, alignItems: "flex-start" },
  title: { flex: 1, fontSize: 15, fontWeight: "700", color: colors.ink },
  state: { fontSize: 12, fontWeight: "700", color: colors.steel, textTransform: "uppercase" },
  off: { color: colors.muted },
  meta: { fontSize: 13, color: colors.muted },
});
