import { StyleSheet, Text, View } from "react-native";
import { Button } from "@/components/ui/button";
import { colors, fontSize, space } from "@/constants/theme";

type Props = { shown: number; more: boolean; loading: boolean; onMore: () => void; what: string; testID?: string };

/**
 * The end of a list paged by keyset: how many rows are on screen and a button for the next page.
 * No "of N": counting a whole shop on every page is what keyset paging saves.
 */
export function ShowMore({ shown, more, loading, onMore, what, testID }: Props) {
  return (
    <View style={styles.row}>
      <Text style={styles.where}>{more ? `${shown} ${what} shown` : `All ${shown} ${what} shown`}</Text>
      {more ? <Button kind="plain" label="Show more" busy={loading} onPress={onMore} testID={testID} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { alignItems: "center", gap: space.sm },
  where: { fontSize: fontSize.detail, color: colors.muted, textAlign: "center" },
});
