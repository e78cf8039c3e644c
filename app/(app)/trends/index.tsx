import { router, useLocalSearchParams } from "expo-router";
import { StyleSheet, Text, View } from "react-native";
import { CauseBars } from "@/components/trends/cause-bars";
import { FixBars } from "@/components/trends/fix-bars";
import { RateBars, MIN_CASTINGS_FOR_RATE } from "@/components/trends/rate-bars";
import { ChoiceChips } from "@/components/ui/choice-chips";
import { Heading } from "@/components/ui/heading";
import { Notice } from "@/components/ui/notice";
import { Loading } from "@/components/ui/query-state";
import { Screen } from "@/components/ui/screen";
import { TextField } from "@/components/ui/text-field";
import { colors, fontSize, space } from "@/constants/theme";
import { useTrends } from "@/hooks/use-trends";
import { isDay } from "@/lib/casebook-filters";
import { PROCESS_LABELS } from "@/lib/labels";
import { casebookHrefFor } from "@/lib/trend-links";
import { superheatBandInUnits, type TrendsQuery } from "@/lib/trends-schemas";
import { useUnits } from "@/hooks/use-units";
import { PROCESSES, type Process } from "@/rules/case";

/**
 * What the shop's castings say: defect, scrap and rework rates, the fixes tried and the causes confirmed,
 * filtered by date, process and alloy. The filters live in the URL (`/trends?process=lost-foam`), and each
 * bar opens the castings behind it in the casebook.
 */
export default function TrendsScreen() {
  const p = useLocalSearchParams<{ from?: string; to?: string; process?: string; alloy?: string }>();
  const [from, to, process, alloy] = [p.from ?? "", p.to ?? "", p.process ?? "", p.alloy ?? ""];
  const set = (next: Partial<Record<"from" | "to" | "process" | "alloy", string>>) =>
    router.setParams(Object.fromEntries(Object.entries(next).map(([k, v]) => [k, v || undefined])));
  const q: TrendsQuery = {
    from: isDay(from) ? from : undefined,
    to: isDay(to) ? to : undefined,
    process: PROCESSES.includes(process as Process) ? (process as Process) : undefined,
    alloy: alloy || undefined,
  };
  const trends = useTrends(q);
  const units = useUnits();
  const t = trends.data;
  // The alloys the shop poured in these filters, so the chips never offer an empty chart.
  const alloys = [...new Set([...(t?.defectByAlloy.map((a) => a.key) ?? []), ...(alloy ? [alloy] : [])])];
  return (
    <Screen>
      <Heading>Trends</Heading>
      <View style={styles.filters}>
        <TextField label="From (YYYY-MM-DD)" value={from} onChangeText={(v) => set({ from: v })} />
        <TextField label="To (YYYY-MM-DD)" value={to} onChangeText={(v) => set({ to: v })} />
      </View>
      <ChoiceChips
        label="Process"
        options={[{ value: "", label: "all" }, ...PROCESSES.map((x) => ({ value: x, label: PROCESS_LABELS[x] }))]}
        value={process}
        onChange={(v) => set({ process: v })}
      />
      {alloys.length > 1 || alloy ? (
        <ChoiceChips
          label="Alloy"
          options={[{ value: "", label: "all" }, ...alloys.map((a) => ({ value: a, label: a }))]}
          value={alloy}
          onChange={(v) => set({ alloy: v })}
        />
      ) : null}
      {trends.isPending ? <Loading /> : null}
      {trends.error ? <Notice tone="error">{trends.error.message}</Notice> : null}
      {t && t.castings < MIN_CASTINGS_FOR_RATE ? (
        <Notice>
          {t.castings} castings in these filters. Rates need at least {MIN_CASTINGS_FOR_RATE} castings in a group to
          mean much: log more castings and their defects.
        </Notice>
      ) : null}
      {t && t.castings > 0 ? (
        <>
          <Text style={styles.meta}>
            {t.castings} castings. A bar is the share with at least one defect marked (or scrapped, reworked); tap a bar
            to open its castings in the casebook.
          </Text>
          <RateBars
            title="Defects by superheat"
            what="had defects"
            points={t.defectBySuperheat.map((p) => ({ ...p, key: superheatBandInUnits(p.key, units) }))}
          />
          <RateBars
            title="Defects by process"
            what="had defects"
            points={t.defectByProcess}
            labelOf={(k) => PROCESS_LABELS[k as Process] ?? k}
            hrefOf={(k) => casebookHrefFor("process", k, q)}
          />
          <RateBars
            title="Defects by alloy"
            what="had defects"
            points={t.defectByAlloy}
            hrefOf={(k) => casebookHrefFor("alloy", k, q)}
          />
          <RateBars
            title="Scrap by month"
            what="scrapped"
            points={t.scrapByMonth}
            hrefOf={(k) => casebookHrefFor("scrap-month", k, q)}
          />
          <RateBars
            title="Rework by month"
            what="reworked"
            points={t.reworkByMonth}
            hrefOf={(k) => casebookHrefFor("rework-month", k, q)}
          />
          <FixBars points={t.fixes} />
          <CauseBars points={t.confirmedCauses} hrefOf={(id) => casebookHrefFor("cause", id, q)} />
        </>
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  filters: { flexDirection: "row", flexWrap: "wrap", gap: space.md },
  meta: { fontSize: fontSize.detail, color: colors.muted },
});
