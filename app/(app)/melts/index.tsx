import { useRouter } from "expo-router";
import { useState } from "react";
import { StyleSheet, View } from "react-native";
import { Button } from "@/components/ui/button";
import { ChoiceChips } from "@/components/ui/choice-chips";
import { Heading } from "@/components/ui/heading";
import { MeltCard } from "@/components/melts/melt-card";
import { MeltTable } from "@/components/melts/melt-table";
import { WaitingMelts } from "@/components/notebook/waiting-to-send";
import { Notice } from "@/components/ui/notice";
import { Loading } from "@/components/ui/query-state";
import { Screen } from "@/components/ui/screen";
import { ShowMore } from "@/components/ui/show-more";
import { space } from "@/constants/theme";
import { useIsWide } from "@/hooks/use-layout";
import { FIRST_MELTS_PAGE, useMelts, type MeltSort } from "@/hooks/use-melts";
import { useUnits } from "@/hooks/use-units";

const ORDER = [
  { value: "date-desc", label: "newest" },
  { value: "date-asc", label: "oldest" },
  { value: "alloy", label: "alloy" },
  { value: "castings", label: "most castings" },
];

/** The pour log: cards on a phone, a sortable table on a wide screen. */
export default function MeltsScreen() {
  const wide = useIsWide();
  const units = useUnits();
  const router = useRouter();
  const [sort, setSort] = useState<MeltSort>(FIRST_MELTS_PAGE.sort);
  const melts = useMelts({ pageSize: FIRST_MELTS_PAGE.pageSize, sort });
  const rows = melts.data?.pages.flatMap((p) => p.items) ?? [];

  return (
    <Screen wide={wide}>
      <View style={styles.head}>
        <Heading>Melts</Heading>
        <Button kind="plain" label="Calculators" onPress={() => router.push("/melts/calculators")} />
        <Button label="Log a melt" onPress={() => router.push("/melts/new")} testID="new-melt" />
      </View>
      {!wide ? (
        <ChoiceChips label="Order" options={ORDER} value={sort} onChange={(s) => setSort(s as MeltSort)} />
      ) : null}
      <WaitingMelts />
      {melts.isPending ? <Loading /> : null}
      {melts.error ? <Notice tone="error">{melts.error.message}</Notice> : null}
      {melts.data && rows.length === 0 ? (
        <Notice>No melts logged yet. Log the first one after your next pour.</Notice>
      ) : null}
      {rows.length ? (
        wide ? (
          <MeltTable melts={rows} units={units} sort={sort} onSort={setSort} />
        ) : (
          rows.map((m) => <MeltCard key={m.id} melt={m} units={units} />)
        )
      ) : null}
      {rows.length ? (
        <ShowMore
          shown={rows.length}
          what="melts"
          more={melts.hasNextPage}
          loading={melts.isFetchingNextPage}
          onMore={() => void melts.fetchNextPage()}
          testID="more-melts"
        />
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  head: { flexDirection: "row", justifyContent: "space-between", alignItems: "center", gap: space.md },
});
