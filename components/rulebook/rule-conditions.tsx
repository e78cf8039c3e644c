import { StyleSheet, Text, View } from "react-native";
import { colors, fontSize, space } from "@/constants/theme";
import { unitsFormat } from "@/lib/rule-units";
import type { Units } from "@/lib/units";
import type { Condition } from "@/rules/kb-schema";
import { describeCondition, JOIN_WORDS, type ConditionWords } from "@/rules/rule-words";

/** A rule's conditions as sentences in the person's units, groups indented under their joining words. */
export function RuleConditions({ conditions, units }: { conditions: Condition; units: Units }) {
  const words = describeCondition(conditions, unitsFormat(units));
  // The top level is nearly always "all of these": the heading above already says so.
  const parts = typeof words !== "string" && words.join === "all" ? words.parts : [words];
  return (
    <View style={styles.list}>
      {parts.map((p, i) => (
        <Part key={i} words={p} />
      ))}
    </View>
  );
}

function Part({ words }: { words: ConditionWords }) {
  if (typeof words === "string") return <Text style={styles.leaf}>• {words}</Text>;
  return (
    <View style={styles.group}>
      <Text style={styles.join}>{JOIN_WORDS[words.join]}:</Text>
      {words.parts.map((p, i) => (
        <Part key={i} words={p} />
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.xs },
  leaf: { fontSize: fontSize.body, lineHeight: 22, color: colors.ink },
  group: { gap: space.xs, paddingLeft: space.md, borderLeftWidth: 2, borderLeftColor: colors.line },
  join: { fontSize: fontSize.detail, fontWeight: "700", color: colors.muted },
});
