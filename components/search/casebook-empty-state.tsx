import { useRouter } from "expo-router";
import { StyleSheet, Text, View } from "react-native";
import { Button } from "@/components/ui/button";
import { card, colors, fontSize, space } from "@/constants/theme";
import { emptyText, type SearchRequest } from "@/lib/search-schemas";

type Props = { query: SearchRequest; filtered: boolean; onClearFilters: () => void; onClearWords: () => void };

/** Nothing matched: say what was looked for, and offer the way out that fits. */
export function CasebookEmptyState({ query, filtered, onClearFilters, onClearWords }: Props) {
  const router = useRouter();
  const nothingLogged = !query.q && !filtered;
  return (
    <View style={styles.box} testID="casebook-empty">
      <Text style={styles.title}>{emptyText(query)}</Text>
      {nothingLogged ? (
        <>
          <Text style={styles.hint}>
            Each casting logged under Melts shows up here, with its defects, conditions and causes.
          </Text>
          <Button label="Log a melt" onPress={() => router.push("/melts/new")} />
        </>
      ) : (
        <>
          {query.q ? (
            <Text style={styles.hint}>
              Small slips in spelling are forgiven; try fewer words, or a different word for the same defect.
            </Text>
          ) : null}
          {filtered ? (
            <Text style={styles.hint}>
              Each filter narrows the search: removing one may find the case you remember.
            </Text>
          ) : null}
          <View style={styles.row}>
            {filtered ? <Button kind="plain" label="Clear the filters" onPress={onClearFilters} /> : null}
            {query.q ? <Button kind="plain" label="Clear the words" onPress={onClearWords} /> : null}
          </View>
        </>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { ...card, padding: space.lg, gap: space.sm },
  title: { fontSize: fontSize.lead, fontWeight: "600", color: colors.ink },
  hint: { fontSize: fontSize.body, lineHeight: 22, color: colors.muted },
  row: { flexDirection: "row", flexWrap: "wrap", gap: space.sm, marginTop: space.xs },
});
