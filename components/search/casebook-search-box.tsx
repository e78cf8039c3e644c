import { ActivityIndicator, Pressable, StyleSheet, Text, TextInput, View } from "react-native";
import { colors, fontSize, radius, space } from "@/constants/theme";
import { SEARCH_QUERY_MAX } from "@/lib/search-schemas";

type Props = { value: string; onChange: (text: string) => void; busy: boolean };

/** The casebook's search words: it answers as you type, so there is no button to press. */
export function CasebookSearchBox({ value, onChange, busy }: Props) {
  return (
    <View style={styles.wrap}>
      <TextInput
        role="searchbox"
        aria-label="Search the casebook"
        placeholder="A defect, a part, an alloy, words from the notes…"
        placeholderTextColor={colors.muted}
        value={value}
        onChangeText={onChange}
        maxLength={SEARCH_QUERY_MAX}
        autoCapitalize="none"
        autoCorrect={false}
        returnKeyType="search"
        style={styles.input}
      />
      {/* Over the input's right end, so the border (and the browser's focus ring) is the input's own. */}
      <View style={styles.end} pointerEvents="box-none">
        {busy ? <ActivityIndicator color={colors.accent} /> : null}
        {value ? (
          <Pressable
            role="button"
            aria-label="Clear the search words"
            onPress={() => onChange("")}
            style={styles.clear}
          >
            <Text style={styles.clearText}>×</Text>
          </Pressable>
        ) : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { justifyContent: "center" },
  input: {
    minHeight: 48,
    fontSize: fontSize.lead,
    color: colors.ink,
    backgroundColor: colors.surface,
    borderWidth: 1,
    borderColor: colors.steel,
    borderRadius: radius.md,
    paddingLeft: space.md,
    paddingRight: 88,
  },
  end: { position: "absolute", right: space.xs, flexDirection: "row", alignItems: "center", gap: space.xs },
  clear: { width: 40, height: 40, alignItems: "center", justifyContent: "center" },
  clearText: { fontSize: fontSize.display, color: colors.muted, lineHeight: 26 },
});
