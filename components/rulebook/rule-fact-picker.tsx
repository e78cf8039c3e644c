import { useState } from "react";
import { Pressable, StyleSheet, Text, TextInput, View } from "react-native";
import { FieldError } from "@/components/ui/field-error";
import { colors, fontSize, radius, space } from "@/constants/theme";
import { PICKABLE_FACTS } from "@/lib/rulebook-schemas";
import type { Units } from "@/lib/units";
import { factSpec } from "@/rules/fact-catalog";
import { factLabel } from "@/lib/rule-units";

const SHOWN = 8;

/** What a condition looks at: type a few letters, tap one of the matching facts. */
export function RuleFactPicker({
  fact,
  units,
  error,
  onPick,
}: {
  fact: string;
  units: Units;
  error?: string;
  onPick: (name: string) => void;
}) {
  const spec = factSpec(fact);
  const [open, setOpen] = useState(!spec);
  const [query, setQuery] = useState("");
  if (spec && !open) {
    return (
      <Pressable
        role="button"
        aria-label={`Looks at ${spec.label}: change`}
        onPress={() => setOpen(true)}
        style={styles.chosen}
      >
        <Text style={styles.chosenText}>{factLabel(spec, units)}</Text>
        <Text style={styles.change}>change</Text>
      </Pressable>
    );
  }
  const words = query.toLowerCase().split(/\s+/).filter(Boolean);
  const matches = PICKABLE_FACTS.filter((f) => words.every((w) => f.label.toLowerCase().includes(w)));
  return (
    <View style={styles.wrap}>
      <TextInput
        aria-label="Find what to look at"
        placeholder="Type to find: pour, sprue, humidity…"
        placeholderTextColor={colors.muted}
        value={query}
        onChangeText={setQuery}
        style={styles.search}
        autoCapitalize="none"
      />
      <View style={styles.list}>
        {matches.slice(0, SHOWN).map((f) => (
          <Pressable
            key={f.name}
            role="button"
            aria-label={`Look at ${f.label}`}
            style={styles.option}
            onPress={() => {
              onPick(f.name);
              setOpen(false);
              setQuery("");
            }}
          >
            <Text style={styles.optionText}>{factLabel(f, units)}</Text>
            <Text style={styles.kind}>{f.derived ? "worked out" : "logged"}</Text>
          </Pressable>
        ))}
        {matches.length > SHOWN ? (
          <Text style={styles.more}>{matches.length - SHOWN} more: type more of the name</Text>
        ) : null}
        {matches.length === 0 ? (
          <Text style={styles.more}>Nothing the rulebook knows about matches “{query}”.</Text>
        ) : null}
      </View>
      <FieldError message={error} />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  chosen: {
    flexDirection: "row",
    alignItems: "center",
    justifyContent: "space-between",
    gap: space.sm,
    minHeight: 44,
    paddingHorizontal: space.md,
    borderRadius: radius.sm,
    borderWidth: 1,
    borderColor: colors.steel,
    backgroundColor: colors.surface,
  },
  chosenText: { flex: 1, fontSize: fontSize.field, fontWeight: "600", color: colors.ink },
  change: { fontSize: fontSize.detail, color: colors.accent, fontWeight: "600" },
  search: {
    minHeight: 44,
    borderWidth: 1,
    borderColor: colors.line,
    borderRadius: radius.sm,
    paddingHorizontal: space.md,
    fontSize: fontSize.field,
    backgroundColor: colors.surface,
    color: colors.ink,
  },
  list: { borderWidth: 1, borderColor: colors.line, borderRadius: radius.sm, backgroundColor: colors.surface },
  option: {
    flexDirection: "row",
    justifyContent: "space-between",
    gap: space.sm,
    paddingHorizontal: space.md,
    paddingVertical: space.sm,
    minHeight: 40,
    alignItems: "center",
    borderBottomWidth: 1,
    borderBottomColor: colors.line,
  },
  optionText: { flex: 1, fontSize: fontSize.body, color: colors.ink },
  kind: { fontSize: fontSize.small, color: colors.muted },
  more: { padding: space.sm, fontSize: fontSize.small, color: colors.muted },
});
