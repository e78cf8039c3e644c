import { groupThousands } from "@/rules/quantity-text";
import { StyleSheet, Text, View } from "react-native";
import { Button } from "@/components/ui/button";
import { colors, fontSize, space } from "@/constants/theme";

type Props = {
  page: number;
  pageSize: number;
  total: number;
  onPage: (page: number) => void;
  /** The total is a lower bound ("1,000+"): whether a later page exists comes from `hasNext`. */
  atLeast?: boolean;
  hasNext?: boolean;
};

/** Earlier / later pages of a list, with where you are in it. */
export function Pager({ page, pageSize, total, onPage, atLeast, hasNext }: Props) {
  const pages = atLeast ? page + (hasNext ? 1 : 0) : Math.max(1, Math.ceil(total / pageSize));
  if (pages <= 1 && page <= 1) return <Text style={styles.where}>{total} in all</Text>;
  const first = (page - 1) * pageSize + 1;
  const last = Math.min(total, page * pageSize);
  return (
    <View style={styles.row}>
      {page > 1 ? (
        <Button kind="plain" label="Previous page" onPress={() => onPage(page - 1)} />
      ) : (
        <View style={styles.gap} />
      )}
      <Text style={styles.where}>
        {first}–{atLeast ? page * pageSize : last} of {atLeast ? `${groupThousands(total)}+` : total}
      </Text>
      {page < pages ? (
        <Button kind="plain" label="Next page" onPress={() => onPage(page + 1)} />
      ) : (
        <View style={styles.gap} />
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: "row", alignItems: "center", justifyContent: "space-between", gap: space.sm },
  where: { fontSize: fontSize.detail, color: colors.muted, textAlign: "center" },
  gap: { width: 100 },
});
