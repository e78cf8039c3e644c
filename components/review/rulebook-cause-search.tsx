import { useMemo, useState } from "react";
import { StyleSheet, Text, View } from "react-native";
import { CauseOption } from "@/components/review/cause-option";
import { TextField } from "@/components/ui/text-field";
import { colors, fontSize, space } from "@/constants/theme";
import { causeFinder } from "@/lib/cause-search";
import type { CauseOption as Cause } from "@/lib/rulebook-schemas";

type Props = {
  causes: Cause[];
  listed: ReadonlySet<string>;
  choice: string | null;
  /** The rulebook cause chosen here or from the look-alikes of typed words: shown whatever the search says. */
  picked: Cause | null;
  onChoose: (c: Cause) => void;
};

/**
 * The rest of the rulebook (built-in and the shop's causes) beside the ranked ones: type a few words,
 * pick from what matches. The picked cause stays shown while the words change.
 */
export function RulebookCauseSearch({ causes, listed, choice, picked, onChoose }: Props) {
  const [query, setQuery] = useState("");
  const find = useMemo(() => causeFinder(causes.filter((c) => !listed.has(c.id))), [causes, listed]);
  const found = find(query);
  const keep = picked && choice === picked.id && !listed.has(picked.id) && !found.some((c) => c.id === picked.id);
  const shown = keep ? [picked, ...found] : found;
  return (
    <View style={styles.wrap}>
      <TextField
        label="Another cause from the rulebook"
        value={query}
        onChangeText={setQuery}
        placeholder="Type a few words, e.g. wet sand, hydrogen"
      />
      {query.trim().length >= 2 && !found.length ? (
        <Text style={styles.meta}>No cause in the rulebook matches those words: name it under “Something else”.</Text>
      ) : null}
      {shown.map((c) => (
        <CauseOption key={c.id} title={c.title} on={choice === c.id} onPress={() => onChoose(c)}>
          <Text style={styles.meta}>{c.shop ? "The shop's own cause" : "From the built-in rulebook"}</Text>
        </CauseOption>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  meta: { fontSize: fontSize.small, color: colors.muted },
});
