import { useRouter } from "expo-router";
import { castingsLine } from "@/lib/case-words";
import { ListTable, type Column } from "@/components/ui/list-table";
import type { MeltSort } from "@/hooks/use-melts";
import { formatDay } from "@/lib/dates";
import { PROCESS_LABELS } from "@/lib/labels";
import type { MeltSummary } from "@/lib/notebook-schemas";
import { formatValue, type Units } from "@/lib/units";

type Props = { melts: MeltSummary[]; units: Units; sort: MeltSort; onSort: (s: MeltSort) => void };

/** The melt list on a wide screen: one row a melt, sortable by the columns the server can sort. */
export function MeltTable({ melts, units, sort, onSort }: Props) {
  const router = useRouter();
  const columns: Column<MeltSummary>[] = [
    {
      key: "day",
      label: "Poured on",
      flex: 2,
      sorts: [
        { value: "date-desc", dir: "descending" },
        { value: "date-asc", dir: "ascending" },
      ],
      render: (m) => formatDay(m.pouredOn),
    },
    { key: "alloy", label: "Alloy", flex: 1.3, sorts: [{ value: "alloy", dir: "ascending" }], render: (m) => m.alloy },
    { key: "process", label: "Process", flex: 2, render: (m) => PROCESS_LABELS[m.process] },
    {
      key: "pour",
      label: "Pour temp.",
      flex: 1.5,
      align: "right",
      render: (m) => formatValue("temperature", m.pourTempC, units),
    },
    { key: "furnace", label: "Furnace", flex: 2.5, render: (m) => m.furnace ?? "–" },
    {
      key: "castings",
      label: "Castings",
      flex: 2,
      sorts: [{ value: "castings", dir: "descending" }],
      render: (m) => castingsLine(m),
    },
  ];
  return (
    <ListTable
      columns={columns}
      rows={melts}
      rowKey={(m) => m.id}
      sort={sort}
      onSort={(s) => onSort(s as MeltSort)}
      onOpen={(m) => router.push(`/melts/${m.id}`)}
    />
  );
}
