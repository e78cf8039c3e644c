import { useRouter } from "expo-router";
import { StyleSheet, View } from "react-native";
import { MarkedText } from "@/components/search/casebook-marked-text";
import { OutcomeTag } from "@/components/search/casebook-result-card";
import { castingHref, causeLine, defectsLine } from "@/lib/case-words";
import { ListTable, type Column } from "@/components/ui/list-table";
import { colors, fontSize } from "@/constants/theme";
import { formatDay } from "@/lib/dates";
import { PROCESS_LABELS } from "@/lib/labels";
import type { CaseHit, SearchSort } from "@/lib/search-schemas";

const DATE_SORTS = [
  { value: "date-desc", dir: "descending" },
  { value: "date-asc", dir: "ascending" },
] as const;

/** The results on a wide screen: a row per case, the matched words marked in each column. */
export function CasebookResultTable({
  hits,
  sort,
  onSort,
}: {
  hits: CaseHit[];
  sort: SearchSort;
  onSort: (s: SearchSort) => void;
}) {
  const router = useRouter();
  const columns: Column<CaseHit>[] = [
    {
      key: "part",
      label: "Part",
      flex: 2.2,
      // The part's whole name, wrapped: two pumps' impellers differ only at the end of it.
      render: (h) => <MarkedText style={styles.strong} runs={h.marked.part} plain={h.partName} />,
    },
    { key: "poured", label: "Poured", flex: 1.4, sorts: DATE_SORTS, render: (h) => formatDay(h.pouredOn) },
    {
      key: "how",
      label: "Alloy, process",
      flex: 1.5,
      render: (h) => (
        <MarkedText
          style={styles.text}
          runs={h.marked.conditions}
          plain={`${h.alloy} · ${PROCESS_LABELS[h.process]}`}
        />
      ),
    },
    {
      key: "defects",
      label: "Defects and notes",
      flex: 2.6,
      render: (h) => (
        <View>
          <MarkedText style={styles.text} runs={h.marked.defects} plain={defectsLine(h)} />
          {(h.marked.notes ?? h.marked.comments) ? (
            <MarkedText style={styles.words} runs={h.marked.notes ?? h.marked.comments} plain="" />
          ) : null}
        </View>
      ),
    },
    {
      key: "cause",
      label: "Cause",
      flex: 2.1,
      render: (h) => <MarkedText style={styles.cause} runs={h.marked.causes} plain={causeLine(h)} />,
    },
    { key: "outcome", label: "Outcome", flex: 1.3, render: (h) => <OutcomeTag outcome={h.outcome} /> },
  ];
  return (
    <ListTable
      columns={columns}
      rows={hits}
      rowKey={(h) => h.id}
      sort={sort}
      onSort={(s) => onSort(s as SearchSort)}
      onOpen={(h) => router.push(castingHref(h))}
    />
  );
}

const styles = StyleSheet.create({
  strong: { fontSize: fontSize.body, fontWeight: "600", color: colors.ink },
  text: { fontSize: fontSize.detail, color: colors.ink },
  cause: { fontSize: fontSize.detail, color: colors.steel },
  words: { fontSize: fontSize.small, color: colors.muted, fontStyle: "italic", marginTop: 2 },
});
