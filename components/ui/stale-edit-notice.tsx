import { StyleSheet, Text, View } from "react-native";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { colors, fontSize, space } from "@/constants/theme";
import type { ChangedRow } from "@/lib/condition-rows";

type Props = { rows: ChangedRow[]; onKeepMine: () => void; onTakeTheirs: () => void; busy?: boolean };

/** Someone saved the same row after this person opened it: both versions of what differs, and a choice. */
export function StaleEditNotice({ rows, onKeepMine, onTakeTheirs, busy }: Props) {
  return (
    <Notice tone="caution">
      <View role="alert" style={styles.body} testID="stale-edit">
        <Text style={styles.title}>Changed by someone else since you opened it</Text>
        {rows.length ? (
          <View style={styles.table}>
            <View style={styles.row}>
              <Text style={[styles.label, styles.head]}>Field</Text>
              <Text style={[styles.cell, styles.head]}>Yours</Text>
              <Text style={[styles.cell, styles.head]}>Saved since</Text>
            </View>
            {rows.map((r) => (
              <View key={r.label} style={styles.row}>
                <Text style={styles.label}>{r.label}</Text>
                <Text style={styles.cell}>{r.mine ?? "—"}</Text>
                <Text style={styles.cell}>{r.theirs ?? "—"}</Text>
              </View>
            ))}
          </View>
        ) : (
          <Text style={styles.cell}>The fields you changed hold the same values in both versions.</Text>
        )}
        <View style={styles.actions}>
          <Button label="Keep mine" onPress={onKeepMine} busy={busy} testID="keep-mine" />
          <Button label="Take theirs" kind="plain" onPress={onTakeTheirs} testID="take-theirs" />
        </View>
      </View>
    </Notice>
  );
}

const styles = StyleSheet.create({
  body: { gap: space.sm },
  title: { fontSize: fontSize.body, fontWeight: "600", color: colors.ink },
  table: { gap: space.xs },
  row: { flexDirection: "row", gap: space.sm, flexWrap: "wrap" },
  head: { fontWeight: "600", color: colors.muted },
  label: { flexBasis: 100, flexGrow: 1, fontSize: fontSize.body, color: colors.ink },
  cell: { flexBasis: 80, flexGrow: 1, fontSize: fontSize.body, color: colors.ink },
  actions: { flexDirection: "row", gap: space.sm, flexWrap: "wrap" },
});
