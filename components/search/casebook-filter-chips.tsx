import { groupThousands } from "@/rules/quantity-text";
import { useState } from "react";
import { Pressable, StyleSheet, Text, View } from "react-native";
import { TextField } from "@/components/ui/text-field";
import { card, colors, fontSize, space } from "@/constants/theme";
import { DEFECTS } from "@/lib/defects";
import { OUTCOME_LABELS, PROCESS_LABELS } from "@/lib/labels";
import type { SearchFacets } from "@/lib/search-schemas";
import { isDay, type CasebookFilters, type ListKey } from "@/lib/casebook-filters";
import type { DefectType, Process } from "@/rules/case";

type Option = { value: string; label: string; count?: number };
type Props = {
  filters: CasebookFilters;
  onChange: (f: CasebookFilters) => void;
  facets?: SearchFacets;
  people: { userId: string; name: string }[];
  /** A side panel is narrow: the two dates go one under the other. */
  narrow?: boolean;
  /** Set when the counts are among the newest this many matches, not all of them. */
  sampled?: number;
};

/** Chips for each filter, busiest values first, each with how many cases it would leave. */
export function CasebookFilterChips({ filters, onChange, facets, people, narrow, sampled }: Props) {
  const toggle = (key: ListKey, value: string) => {
    const on = filters[key].includes(value);
    onChange({ ...filters, [key]: on ? filters[key].filter((v) => v !== value) : [...filters[key], value] });
  };
  const counted = (
    counts: Record<string, number | undefined> | undefined,
    label: (v: string) => string,
    selected: string[],
  ): Option[] => {
    const values = new Set([...Object.keys(counts ?? {}), ...selected]);
    return [...values]
      .map((value) => ({ value, label: label(value), count: counts?.[value] ?? 0 }))
      .sort((a, b) => b.count - a.count);
  };
  const causeCounts = Object.fromEntries(Object.entries(facets?.cause ?? {}).map(([id, c]) => [id, c.count]));
  const causeTitle = (id: string) => facets?.cause[id]?.title ?? id;
  const group = (key: ListKey, label: string, options: Option[]) => (
    <ChipGroup label={label} options={options} selected={filters[key]} onToggle={(v) => toggle(key, v)} />
  );
  return (
    <View style={styles.wrap}>
      {sampled ? (
        <Text style={styles.note} testID="casebook-counts-sampled">
          Counts among the newest {groupThousands(sampled)} matching cases
        </Text>
      ) : null}
      {group(
        "defect",
        "Defect",
        counted(facets?.defect, (v) => DEFECTS[v as DefectType]?.label ?? v, filters.defect),
      )}
      {group(
        "alloy",
        "Alloy",
        counted(facets?.alloy, (v) => v, filters.alloy),
      )}
      {group(
        "process",
        "Process",
        counted(facets?.process, (v) => PROCESS_LABELS[v as Process] ?? v, filters.process),
      )}
      {group(
        "outcome",
        "Outcome",
        counted(facets?.outcome, (v) => OUTCOME_LABELS[v as keyof typeof OUTCOME_LABELS] ?? v, filters.outcome),
      )}
      {group("cause", "Cause (confirmed or likely)", counted(causeCounts, causeTitle, filters.cause))}
      {group(
        "by",
        "Logged by",
        people.map((p) => ({ value: p.userId, label: p.name })),
      )}
      <View style={[styles.dates, narrow && styles.stacked]}>
        {(["from", "to"] as const).map((k) => (
          <View key={k} style={styles.date}>
            <TextField
              label={k === "from" ? "Poured from" : "Poured until"}
              placeholder="YYYY-MM-DD"
              value={filters[k]}
              maxLength={10}
              onChangeText={(t) => onChange({ ...filters, [k]: t.trim() })}
              error={filters[k] && !isDay(filters[k]) && filters[k].length >= 10 ? "a day as YYYY-MM-DD" : undefined}
            />
          </View>
        ))}
      </View>
    </View>
  );
}

const SHOWN = 8;
function ChipGroup({
  label,
  options,
  selected,
  onToggle,
}: {
  label: string;
  options: Option[];
  selected: string[];
  onToggle: (v: string) => void;
}) {
  const [all, setAll] = useState(false);
  if (!options.length) return null;
  const shown = all ? options : options.slice(0, SHOWN);
  return (
    <View style={styles.group} role="group" aria-label={label}>
      <Text style={styles.label}>{label}</Text>
      <View style={styles.row}>
        {shown.map((o) => {
          const on = selected.includes(o.value);
          return (
            <Pressable
              key={o.value}
              role="checkbox"
              aria-checked={on}
              onPress={() => onToggle(o.value)}
              style={[styles.chip, on && styles.on]}
            >
              <Text style={[styles.text, on && styles.textOn]}>
                {o.label}
                {o.count !== undefined ? <Text style={[styles.count, on && styles.textOn]}> {o.count}</Text> : null}
              </Text>
            </Pressable>
          );
        })}
        {options.length > SHOWN ? (
          <Pressable role="button" onPress={() => setAll(!all)} style={styles.more}>
            <Text style={styles.moreText}>{all ? "fewer" : `${options.length - SHOWN} more`}</Text>
          </Pressable>
        ) : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  note: { fontSize: fontSize.detail, color: colors.muted },
  group: { gap: space.xs },
  label: { fontSize: fontSize.small, fontWeight: "700", color: colors.muted },
  row: { flexDirection: "row", flexWrap: "wrap", gap: space.sm },
  chip: {
    ...card,
    paddingHorizontal: space.md,
    paddingVertical: 6,
    minHeight: 36,
    justifyContent: "center",
    maxWidth: "100%",
  },
  on: { backgroundColor: colors.steel, borderColor: colors.steel },
  text: { color: colors.ink, fontSize: fontSize.detail, flexShrink: 1 },
  count: { color: colors.muted, fontSize: fontSize.small },
  textOn: { color: "#FFFFFF", fontWeight: "600" },
  more: { paddingHorizontal: space.sm, paddingVertical: 6, justifyContent: "center", minHeight: 36 },
  moreText: { color: colors.steel, fontSize: fontSize.detail, textDecorationLine: "underline" },
  dates: { flexDirection: "row", gap: space.md },
  stacked: { flexDirection: "column" },
  date: { flex: 1 },
});
