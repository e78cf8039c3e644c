import { Link } from "expo-router";
import { Pressable, StyleSheet, Text, View } from "react-native";
import { RuleRecordLine } from "@/components/rulebook/rule-record";
import { card, colors, fontSize, space } from "@/constants/theme";
import { DEFECTS } from "@/lib/defects";
import type { RuleRow } from "@/lib/rulebook-schemas";
import { unitsFormat } from "@/lib/rule-units";
import type { Units } from "@/lib/units";
import { conditionLines } from "@/rules/rule-words";
import { stateWords } from "@/lib/rule-state";

/** One rule in the list: what it points to, when, for which defects, where it comes from and how it did here. */
export function RuleListItem({ rule, units }: { rule: RuleRow; units: Units }) {
  const defects = rule.explains.map((t) => DEFECTS[t].label.toLowerCase()).join(", ");
  // A plain style: Link asChild hands the style through a Slot that drops a style function.
  return (
    <Link href={`/rulebook/${rule.id}`} asChild>
      <Pressable role="link" style={styles.row} testID={`rule-${rule.id}`}>
        <View style={styles.top}>
          <Text style={styles.title} numberOfLines={2}>
            {rule.effect === "weakens" ? "Against: " : ""}
            {rule.cause.title}
          </Text>
          <Text style={[styles.state, !rule.inUse && styles.off]}>{stateWords(rule)}</Text>
        </View>
        <Text style={styles.when} numberOfLines={2}>
          When {conditionLines(rule.conditions, unitsFormat(units)).join("; ")}
        </Text>
        <Text style={styles.meta} numberOfLines={1}>
          {defects} · {rule.source === "shop" ? "written here" : rule.family.toLowerCase()}
        </Text>
        <RuleRecordLine record={rule.record} />
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  row: { ...card, gap: 2, padding: space.md },
  top: { flexDirection: "row", gap: space.sm, alignItems: "flex-start" },
  title: { flex: 1, fontSize: fontSize.body, fontWeight: "700", color: colors.ink },
  state: { fontSize: fontSize.small, fontWeight: "700", color: colors.steel, textTransform: "uppercase" },
  off: { color: colors.muted },
  when: { fontSize: fontSize.detail, lineHeight: 20, color: colors.ink },
  meta: { fontSize: fontSize.small, color: colors.muted },
});
