import { useEffect, useState } from "react";
import { Pressable, StyleSheet, Text, View } from "react-native";
import { Button } from "@/components/ui/button";
import { ChoiceChips } from "@/components/ui/choice-chips";
import { castingWords } from "@/lib/case-words";
import { Heading } from "@/components/ui/heading";
import { TextField } from "@/components/ui/text-field";
import { card, colors, fontSize, radius, space } from "@/constants/theme";
import { useAddFix } from "@/hooks/use-followups";
import { useUnits } from "@/hooks/use-units";
import { ApiError } from "@/lib/api";
import type { FixSuggestions } from "@/lib/fix-suggestions";
import { textInUnits } from "@/lib/quantity-words";
import { fixInput, type CastingRef } from "@/lib/review-schemas";

type Props = {
  castingId: number;
  candidates: CastingRef[];
  suggestions: FixSuggestions;
  ticked: string[];
  /** A suggested fix (kept by its SI text) as the person reads it, in their units. */
  say: (fix: string) => string;
};
const OTHERS_SHOWN = 4;

/**
 * Record what was changed for the next pour: typed, or built from the fixes the rulebook suggests (the
 * confirmed cause's first), tapped in or out. The fixes ticked on the likely causes start chosen.
 */
export function FollowupAdd({ castingId, candidates, suggestions, ticked, say }: Props) {
  const add = useAddFix(castingId);
  const units = useUnits();
  const [chosen, setChosen] = useState<string[]>(ticked);
  // What was changed is recorded in the person's own words and units.
  const [fix, setFix] = useState(ticked.map(say).join("; "));
  const [typed, setTyped] = useState(false);
  const [next, setNext] = useState<string | null>(null);
  const [error, setError] = useState<string>();
  const tickedKey = ticked.join("\n");
  // Ticks made on the causes above while this form is open join it, until the person types their own words.
  useEffect(() => {
    if (typed) return;
    const now = tickedKey ? tickedKey.split("\n") : [];
    setChosen(now);
    setFix(now.map(say).join("; "));
    // `say` follows the units, which do not change while the form is open.
  }, [tickedKey, typed]);
  const toggle = (s: string) => {
    const list = chosen.includes(s) ? chosen.filter((x) => x !== s) : [...chosen, s];
    setChosen(list);
    setFix(list.map(say).join("; "));
    setTyped(false);
  };
  const submit = () => {
    const parsed = fixInput.safeParse({ fix, nextCastingId: next ? Number(next) : null });
    if (!parsed.success) return setError(parsed.error.issues[0].message);
    setError(undefined);
    add.mutate(parsed.data, {
      onSuccess: () => {
        setChosen([]);
        setFix("");
        setTyped(true);
        setNext(null);
      },
      onError: (e) => setError(e instanceof ApiError ? (Object.values(e.fields)[0] ?? e.message) : e.message),
    });
  };
  const { confirmed, others } = suggestions;
  const chip = (s: string) => (
    <Pressable
      key={s}
      role="checkbox"
      aria-checked={chosen.includes(s)}
      aria-label={`Use: ${say(s)}`}
      onPress={() => toggle(s)}
      style={[styles.suggestion, chosen.includes(s) && styles.on]}
    >
      <Text style={styles.suggestionText}>
        {chosen.includes(s) ? "✓ " : ""}
        {say(s)}
      </Text>
    </Pressable>
  );
  // Ticked fixes stay in view however far down the list they are.
  const shownOthers = [
    ...others.slice(0, OTHERS_SHOWN),
    ...others.slice(OTHERS_SHOWN).filter((s) => chosen.includes(s)),
  ];
  return (
    <View style={styles.card}>
      <Heading level={3}>Record a fix</Heading>
      {confirmed?.fixes.length ? (
        <View style={styles.suggestions} testID="fixes-for-confirmed">
          <Text style={styles.label}>
            For the confirmed cause{confirmed.title ? `, “${confirmed.title}”` : ""} (tap to use)
          </Text>
          {confirmed.fixes.map(chip)}
        </View>
      ) : null}
      {shownOthers.length ? (
        <View style={styles.suggestions} testID="fixes-others">
          <Text style={styles.label}>
            {confirmed ? "Other fixes the rulebook suggests" : "Suggested by the rulebook (tap to use)"}
          </Text>
          {shownOthers.map(chip)}
        </View>
      ) : null}
      <TextField
        label="What was changed for the next pour"
        value={fix}
        onChangeText={(v) => {
          setFix(v);
          setTyped(true);
        }}
        error={error}
        placeholder={`e.g. Poured ${textInUnits("{40 K}", units)} hotter`}
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
