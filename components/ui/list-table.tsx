import type { ReactNode } from "react";
import { Pressable, StyleSheet, Text, View } from "react-native";
import { card, colors, fontSize, space } from "@/constants/theme";

export type Column<Row> = {
  key: string;
  label: string;
  /** Relative width. */
  flex: number;
  render: (row: Row) => ReactNode;
  /** The server's sorts for this column, when it can sort by it; another tap moves to the next one. */
  sorts?: readonly { value: string; dir: "ascending" | "descending" }[];
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
          const at = c.sorts?.findIndex((s) => s.value === sort) ?? -1;
          const active = at >= 0 ? c.sorts![at] : undefined;
          const next = c.sorts?.[(at + 1) % c.sorts.length]?.value;
          const arrow = active ? (active.dir === "ascending" ? " ↑" : " ↓") : "";
          return (
            <Pressable
              key={c.key}
              role="columnheader"
              disabled={!next || (active && c.sorts!.length === 1)}
              onPress={() => next && onSort(next)}
              aria-sort={active?.dir}
              style={[styles.cell, { flex: c.flex }]}
            >
              <Text style={[styles.headText, c.sorts && styles.sortable, c.align === "right" && styles.right]}>
                {c.label}
                {arrow}
              </Text>
            </Pressable>
          );
        })}
      </View>
      {rows.map((r) => (
        <Pressable
          key={rowKey(r)}
          role="row"
          onPress={() => onOpen(r)}
          style={({ pressed }) => [styles.row, pressed && styles.hover]}
        >
          {columns.map((c) => {
            const content = c.render(r);
            return (
              <View key={c.key} role="cell" style={[styles.cell, { flex: c.flex }]}>
                {typeof content === "string" || typeof content === "number" ? (
                  // Wrapped, not cut: a cell's words are what the row is told apart by.
                  <Text style={[styles.text, c.align === "right" && styles.right]}>{content}</Text>
                ) : (
                  content
                )}
              </View>
            );
          })}
        </Pressable>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  table: { ...card, overflow: "hidden" },
  row: {
    flexDirection: "row",
    borderBottomWidth: 1,
    borderBottomColor: colors.line,
    minHeight: 44,
    alignItems: "center",
  },
  head: { backgroundColor: colors.background },
  hover: { backgroundColor: "#FBF8F3" },
  cell: { paddingHorizontal: space.md, paddingVertical: space.sm, justifyContent: "center" },
  headText: { fontSize: fontSize.small, fontWeight: "700", color: colors.muted },
  sortable: { color: colors.steel, textDecorationLine: "underline" },
  text: { fontSize: fontSize.body, color: colors.ink },
  right: { textAlign: "right" },
});
