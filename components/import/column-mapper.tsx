import { useState } from "react";
import { Pressable, StyleSheet, Text, View } from "react-native";
import { ChoiceChips } from "@/components/ui/choice-chips";
import { card, colors, fontSize, space } from "@/constants/theme";
import { IMPORT_FIELDS, importFieldOf, UNITS_OF, type ImportMapping } from "@/lib/import-fields";
import { unitLabel, type Quantity } from "@/lib/units";

type Props = {
  headers: string[];
  sample: string[] | undefined;
  mapping: ImportMapping;
  onChange: (m: ImportMapping) => void;
};
type Unit = ImportMapping[number]["unit"];

const LEAVE_OUT = "";
const fieldChoices = [
  { value: LEAVE_OUT, label: "leave out" },
  ...IMPORT_FIELDS.map((f) => ({ value: f.key, label: `${f.label}${f.required ? " *" : ""}` })),
];
/** "°F" for a temperature column set to F, "lb/ft³" for a density column set to lb. */
const unitWords = (q: Quantity, u: string) =>
  unitLabel(q, {
    temperature: u === "F" ? "F" : "C",
    length: u === "in" ? "in" : "mm",
    mass: u === "lb" ? "lb" : "kg",
  });

/** One row per column of the file: its header and first value, the field it feeds, and its unit. */
export function ColumnMapper({ headers, sample, mapping, onChange }: Props) {
  const [open, setOpen] = useState<number | null>(null);
  const of = (column: number) => mapping.find((m) => m.column === column);
  const set = (column: number, field: string, unit?: Unit) => {
    const rest = mapping.filter((m) => m.column !== column && m.field !== field);
    if (field === LEAVE_OUT) return onChange(rest);
    const q = importFieldOf(field)?.quantity;
    const units = q ? UNITS_OF[q] : undefined;
    const chosen = units ? ((unit ?? units[0]) as Unit) : undefined;
    onChange(
      [...rest, chosen ? { column, field, unit: chosen } : { column, field }].sort((a, b) => a.column - b.column),
    );
  };
  return (
    <View style={styles.list}>
      {headers.map((h, column) => {
        const m = of(column);
        const f = m && importFieldOf(m.field);
        const units = f?.quantity ? UNITS_OF[f.quantity] : undefined;
        return (
          <View key={column} style={styles.row} testID={`column-${column}`}>
            <View style={styles.head}>
              <Text style={styles.header}>{h || `Column ${column + 1}`}</Text>
              {sample?.[column] ? <Text style={styles.sample}>e.g. {sample[column]}</Text> : null}
            </View>
            <Pressable
              role="button"
              aria-expanded={open === column}
              aria-label={`Field for column ${h}`}
              onPress={() => setOpen(open === column ? null : column)}
            >
              <Text style={[styles.field, !f && styles.left]}>
                {f ? f.label : "left out"} {open === column ? "▴" : "▾"}
              </Text>
            </Pressable>
            {open === column ? (
              <ChoiceChips
                label={`Field for ${h}`}
                options={fieldChoices}
                value={m?.field ?? LEAVE_OUT}
                onChange={(v) => {
                  set(column, v);
                  setOpen(null);
                }}
              />
            ) : null}
            {f?.quantity && units ? (
              <ChoiceChips
                label={`Unit of ${h}`}
                options={units.map((u) => ({ value: u, label: unitWords(f.quantity!, u) }))}
                value={m?.unit ?? null}
                onChange={(u) => set(column, f.key, u as Unit)}
              />
            ) : null}
          </View>
        );
      })}
      <Text style={styles.note}>* needed for every row. A column left out is not imported.</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  row: { ...card, padding: space.md, gap: space.sm },
  head: { flexDirection: "row", flexWrap: "wrap", gap: space.sm, alignItems: "baseline" },
  header: { fontSize: fontSize.body, fontWeight: "700", color: colors.ink },
  sample: { fontSize: fontSize.detail, color: colors.muted, flexShrink: 1 },
  field: { fontSize: fontSize.body, color: colors.accent, fontWeight: "600" },
  left: { color: colors.muted },
  note: { fontSize: fontSize.small, color: colors.muted },
});
