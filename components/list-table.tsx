import type { ReactNode } from "react";
import { Pressable, StyleSheet, Text, View } from "react-native";
import { colors, radius, space } from "@/constants/theme";

export type Column<Row> = {
  key: string;
  label: string;
  /** Relative width. */
  flex: number;
  render: (row: Row) => ReactNode;
  /** The server's sort for this column, when it can sort by it; a second tap flips date order. */
  sorts?: readonly string[];
  align?: "left" | "right";
};

type Props<Row> = {
  columns: Column<Row>[];
  rows: Row[];
  rowKey: (row: Row) => string | number;
  sort: string;
  onSort: (sort: string) => void;
  onOpen: (row: Row) => void;
};

/** A wide-screen table: tap a heading to sort by it, tap a row to open it. */
export function ListTable<Row>({ columns, rows, rowKey, sort, onSort, onOpen }: Props<Row>) {
  return (
    <View style={styles.table} role="table">
      <View style={[styles.row, styles.head]} role="row">
        {columns.map((c) => {
          const active = c.sorts?.includes(sort);
          const next = c.sorts ? (active ? c.sorts[(c.sorts.indexOf(sort) + 1) % c.sorts.length] : c.sorts[0]) : undefined;
          const arrow = active ? (sort.endsWith("-asc") ? " ↑" : " ↓") : "";
          return (
            <Pressable key={c.key} role="columnheader" disabled={!next} onPress={() => next && onSort(next)}
              aria-sort={active ? (sort.endsWith("-asc") ? "ascending" : "descending") : undefined}
              style={[styles.cell, { flex: c.flex }]}>
              <Text style={[styles.headText, c.sorts && styles.sortable, c.align === "right" && styles.right]}>{c.label}{arrow}</Text>
            </Pressable>
          );
        })}
      </View>
      {rows.map((r) => (
        <Pressable key={rowKey(r)} role="row" onPress={() => onOpen(r)}
          style={({ pressed }) => [styles.row, pressed && styles.hover]}>
          {columns.map((c) => {
            const content = c.render(r);
            return (
              <View key={c.key} role="cell" style={[styles.cell, { flex: c.flex }]}>
                {typeof content === "string" || typeof content === "number" ? (
                  <Text style={[styles.text, c.align === "right" && styles.right]} numberOfLines={1}>{content}</Text>
                ) : content}
              </View>
            );
          })}
        </Pressable>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  table: { borderWidth: 1, borderColor: colors.line, borderRadius: radius.md, backgroundColor: colors.surface, overflow: "hidden" },
  row: { flexDirection: "row", borderBottomWidth: 1, borderBottomColor: colors.line, minHeight: 44, alignItems: "center" },
  head: { backgroundColor: colors.background },
  hover: { backgroundColor: "#FBF8F3" },
  cell: { paddingHorizontal: space.md, paddingVertical: space.sm, justifyContent: "center" },
  headText: { fontSize: 13, fontWeight: "700", color: colors.muted },
  sortable: { color: colors.steel, textDecorationLine: "underline" },
  text: { fontSize: 15, color: colors.ink },
  right: { textAlign: "right" },
});
