import { useState } from "react";
import { Pressable, StyleSheet, Text, View } from "react-native";
import { chipStyles } from "@/components/ui/choice-chips";
import { TextField } from "@/components/ui/text-field";
import { colors, fontSize, radius, space } from "@/constants/theme";
import { exampleReason } from "@/lib/fact-examples";
import { reasonInUnits } from "@/lib/reason-text";
import type { Units } from "@/lib/units";
import { FACTS, factSpec } from "@/rules/fact-catalog";
import { SI_UNIT } from "@/rules/rule-words";

type Props = {
  value: string;
  onChange: (text: string) => void;
  error?: string;
  /** The facts the rule's conditions read: offered first, as the ones a reason most often quotes. */
  ruleFacts: string[];
  against: boolean;
  units: Units;
};

/**
 * The reason a diagnosis shows for the rule. Tapping a fact puts its `{factName}` placeholder where the
 * cursor is; the line under the field shows the sentence as a caster will read it, with example values.
 */
export function RuleReasonField({ value, onChange, error, ruleFacts, against, units }: Props) {
  const [cursor, setCursor] = useState<number | null>(null);
  const [allFacts, setAllFacts] = useState(false);
  const offered = [...new Set(ruleFacts.filter((f) => factSpec(f)))];
  const facts = allFacts ? FACTS.map((f) => f.name) : offered;
  const insert = (name: string) => {
    const at = cursor ?? value.length;
    const before = value.slice(0, at);
    const gap = before && !/\s$/.test(before) ? " " : "";
    // A figure goes in with its SI unit, which the diagnosis swaps for the reader's ("{pourTempC} °C").
    const spec = factSpec(name);
    const unit = spec?.kind === "number" && SI_UNIT[spec.quantity] ? ` ${SI_UNIT[spec.quantity]}` : "";
    const piece = `${gap}{${name}}${unit}`;
    onChange(before + piece + value.slice(at));
    setCursor(at + piece.length);
  };
  return (
    <View style={styles.wrap}>
      <TextField
        label="Reason, shown with the diagnosis"
        value={value}
        onChangeText={onChange}
        onSelectionChange={(e) => setCursor(e.nativeEvent.selection.end)}
        error={error}
        multiline
        numberOfLines={3}
        style={styles.multi}
        placeholder="e.g. The pour was at {pourTempC} °C, {superheatC} °C over the liquidus"
      />
      <View style={chipStyles.wrap} role="group" aria-label="Put a fact into the reason">
        <Text style={styles.hint}>
          Tap a fact to put its value into the sentence
          {offered.length && !allFacts ? " (the facts this rule reads)" : ""}:
        </Text>
        <View style={chipStyles.row}>
          {facts.map((name) => (
            <Pressable
              key={name}
              role="button"
              aria-label={`Insert ${factSpec(name)?.label ?? name}`}
              onPress={() => insert(name)}
              style={chipStyles.chip}
            >
              <Text style={chipStyles.text}>{factSpec(name)?.label ?? name}</Text>
            </Pressable>
          ))}
          <Pressable role="button" onPress={() => setAllFacts(!allFacts)} style={styles.more}>
            <Text style={styles.moreText}>{allFacts ? "Only this rule’s facts" : "All facts"}</Text>
          </Pressable>
        </View>
      </View>
      {value.trim() ? (
        <View style={styles.preview} testID="reason-preview" aria-live="polite">
          <Text style={styles.previewHead}>A caster will read (example values):</Text>
          <Text style={styles.previewText}>{reasonInUnits(exampleReason(value, against), units)}</Text>
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  multi: { minHeight: 84, paddingVertical: space.sm, textAlignVertical: "top" },
  hint: { fontSize: fontSize.detail, color: colors.muted },
  more: { paddingHorizontal: space.md, paddingVertical: space.sm, justifyContent: "center" },
  moreText: { fontSize: fontSize.detail, color: colors.steel, fontWeight: "600", textDecorationLine: "underline" },
  preview: { backgroundColor: colors.background, borderRadius: radius.sm, padding: space.md, gap: space.xs },
  previewHead: { fontSize: fontSize.small, fontWeight: "700", color: colors.muted },
  previewText: { fontSize: fontSize.body, lineHeight: 22, color: colors.ink },
});
