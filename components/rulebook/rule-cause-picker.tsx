import { useState } from "react";
import { Pressable, StyleSheet, Text, TextInput, View } from "react-native";
import { ChoiceChips } from "@/components/ui/choice-chips";
import { FieldError } from "@/components/ui/field-error";
import { TextField } from "@/components/ui/text-field";
import { colors, fieldBox, fontSize, radius, space } from "@/constants/theme";
import type { RuleFormState } from "@/hooks/use-rule-draft";
import type { CauseOption } from "@/lib/rulebook-schemas";

type Props = {
  state: Pick<RuleFormState, "causeKind" | "causeId" | "newTitle" | "newFixes">;
  causes: CauseOption[];
  errors: Record<string, string>;
  set: <K extends "causeKind" | "causeId" | "newTitle" | "newFixes">(key: K, value: RuleFormState[K]) => void;
};
const SHOWN = 6;

/** The cause a rule points to: one the rulebook has (found by typing), or a new one with its fixes. */
export function RuleCausePicker({ state, causes, errors, set }: Props) {
  const [query, setQuery] = useState("");
  const chosen = causes.find((c) => c.id === state.causeId);
  const words = query.toLowerCase().split(/\s+/).filter(Boolean);
  const matches = causes.filter((c) => words.every((w) => c.title.toLowerCase().includes(w)));
  return (
    <View style={styles.wrap}>
      <ChoiceChips
        label="Cause"
        value={state.causeKind}
        onChange={(v) => set("causeKind", v as "existing" | "new")}
        options={[
          { value: "existing", label: "one in the rulebook" },
          { value: "new", label: "a new one" },
        ]}
      />
      {state.causeKind === "existing" ? (
        <>
          {chosen ? (
            <Text style={styles.chosen} testID="chosen-cause">
              ✓ {chosen.title}
            </Text>
          ) : null}
          <TextInput
            aria-label="Find a cause"
            placeholder="Type to find a cause: cold, gas, sand…"
            placeholderTextColor={colors.muted}
            value={query}
            onChangeText={setQuery}
            style={styles.search}
          />
          <View style={styles.list}>
            {matches.slice(0, SHOWN).map((c) => (
              <Pressable
                key={c.id}
                role="radio"
                aria-checked={c.id === state.causeId}
                onPress={() => set("causeId", c.id)}
                style={[styles.option, c.id === state.causeId && styles.on]}
              >
                <Text style={styles.optionText}>{c.title}</Text>
                {c.shop ? <Text style={styles.tag}>written here</Text> : null}
              </Pressable>
            ))}
            {matches.length > SHOWN ? (
              <Text style={styles.more}>{matches.length - SHOWN} more: type more of the name</Text>
            ) : null}
          </View>
          <FieldError message={errors["cause.id"] ?? errors.cause} />
        </>
      ) : (
        <>
          <TextField
            label="Name of the cause"
            value={state.newTitle}
            onChangeText={(t) => set("newTitle", t)}
            error={errors["cause.title"] ?? errors.cause}
            placeholder="e.g. Ladle lip froze over"
          />
          <TextField
            label="Fixes to try, one per line"
            value={state.newFixes}
            onChangeText={(t) => set("newFixes", t)}
            multiline
            numberOfLines={3}
            style={styles.multi}
            error={errors["cause.fixes"] ?? errors["cause.fixes.0"]}
          />
        </>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  chosen: { fontSize: fontSize.body, fontWeight: "600", color: colors.steel },
  search: { ...fieldBox },
  list: { borderWidth: 1, borderColor: colors.line, borderRadius: radius.sm, backgroundColor: colors.surface },
  option: {
    flexDirection: "row",
    gap: space.sm,
    alignItems: "center",
    paddingHorizontal: space.md,
    paddingVertical: space.sm,
    minHeight: 40,
    borderBottomWidth: 1,
    borderBottomColor: colors.line,
  },
  on: { backgroundColor: "#E7EFEF" },
  optionText: { flex: 1, fontSize: fontSize.body, color: colors.ink },
  tag: { fontSize: fontSize.small, color: colors.steel, fontWeight: "700" },
  more: { padding: space.sm, fontSize: fontSize.small, color: colors.muted },
  multi: { minHeight: 88, paddingVertical: space.sm, textAlignVertical: "top" },
});
