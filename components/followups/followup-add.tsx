import { useState } from "react";
import { Pressable, StyleSheet, Text, View } from "react-native";
import { Button } from "@/components/ui/button";
import { ChoiceChips } from "@/components/ui/choice-chips";
import { castingWords } from "@/lib/case-words";
import { Heading } from "@/components/ui/heading";
import { TextField } from "@/components/ui/text-field";
import { card, colors, fontSize, radius, space } from "@/constants/theme";
import { useAddFix } from "@/hooks/use-followups";
import { ApiError } from "@/lib/api";
import { fixInput, type CastingRef } from "@/lib/review-schemas";

type Props = { castingId: number; candidates: CastingRef[]; suggestions: string[] };

/** Record what was changed for the next pour: typed, or one tap on a fix the rulebook suggests. */
export function FollowupAdd({ castingId, candidates, suggestions }: Props) {
  const add = useAddFix(castingId);
  const [fix, setFix] = useState("");
  const [next, setNext] = useState<string | null>(null);
  const [error, setError] = useState<string>();
  const submit = () => {
    const parsed = fixInput.safeParse({ fix, nextCastingId: next ? Number(next) : null });
    if (!parsed.success) return setError(parsed.error.issues[0].message);
    setError(undefined);
    add.mutate(parsed.data, {
      onSuccess: () => {
        setFix("");
        setNext(null);
      },
      onError: (e) => setError(e instanceof ApiError ? (Object.values(e.fields)[0] ?? e.message) : e.message),
    });
  };
  return (
    <View style={styles.card}>
      <Heading level={3}>Record a fix</Heading>
      {suggestions.length ? (
        <View style={styles.suggestions}>
          <Text style={styles.label}>Suggested by the rulebook (tap to use)</Text>
          {suggestions.slice(0, 4).map((s) => (
            <Pressable
              key={s}
              role="button"
              aria-label={`Use: ${s}`}
              onPress={() => setFix(s)}
              style={[styles.suggestion, fix === s && styles.on]}
            >
              <Text style={styles.suggestionText}>{s}</Text>
            </Pressable>
          ))}
        </View>
      ) : null}
      <TextField
        label="What was changed for the next pour"
        value={fix}
        onChangeText={setFix}
        error={error}
        placeholder="e.g. Poured 40 °C hotter"
      />
      {candidates.length ? (
        <ChoiceChips
          label="Next casting of this part (optional)"
          value={next}
          onChange={(v) => setNext(v === next ? null : v)}
          options={candidates.map((c) => ({ value: String(c.id), label: castingWords(c) }))}
        />
      ) : null}
      <Button label="Record the fix" onPress={submit} busy={add.isPending} testID="record-fix" />
    </View>
  );
}

const styles = StyleSheet.create({
  card: { ...card, gap: space.sm, padding: space.md },
  suggestions: { gap: space.xs },
  label: { fontSize: fontSize.detail, fontWeight: "600", color: colors.ink },
  suggestion: {
    padding: space.sm,
    borderRadius: radius.sm,
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.background,
  },
  on: { borderColor: colors.steel, backgroundColor: "#E7EFEF" },
  suggestionText: { fontSize: fontSize.detail, lineHeight: 20, color: colors.ink },
});
