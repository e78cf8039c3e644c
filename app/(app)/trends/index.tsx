import { PROCESS_LABELS } from "@/lib/labels";
import { useState } from "react";
import { StyleSheet, Text, View } from "react-native";
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
import { superheatBandInUnits, type TrendsQuery } from "@/lib/trends-schemas";
import { useUnits } from "@/hooks/use-units";
import { PROCESSES, type Process } from "@/rules/case";

/** What the shop's castings say: defect, scrap and rework rates, filtered by date and process. */
export default function TrendsScreen() {
  const [from, setFrom] = useState("");
  const [to, setTo] = useState("");
  const [process, setProcess] = useState("");
  const q: TrendsQuery = {
    from: isDay(from) ? from : undefined,
    to: isDay(to) ? to : undefined,
    process: (process || undefined) as Process | undefined,
  };
  const trends = useTrends(q);
  const units = useUnits();
  const t = trends.data;
  return (
    <Screen>
      <Heading>Trends</Heading>
      <View style={styles.filters}>
        <TextField label="From (YYYY-MM-DD)" value={from} onChangeText={setFrom} />
        <TextField label="To (YYYY-MM-DD)" value={to} onChangeText={setTo} />
      </View>
      <ChoiceChips
        label="Process"
        options={[{ value: "", label: "all" }, ...PROCESSES.map((p) => ({ value: p, label: p.replace(/-/g, " ") }))]}
        value={process}
        onChange={setProcess}
      />
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
            {t.castings} castings. A bar is the share with at least one defect marked (or scrapped, reworked).
          </Text>
          <RateBars
            title="Defects by superheat"
            what="had defects"
            points={t.defectBySuperheat.map((p) => ({ ...p, key: superheatBandInUnits(p.key, units) }))}
          />
          <RateBars
            title="Defects by process"
            what="had defects"
            points={t.defectByProcess.map((p) => ({ ...p, key: PROCESS_LABELS[p.key as Process] ?? p.key }))}
          />
          <RateBars title="Defects by alloy" what="had defects" points={t.defectByAlloy} />
          <RateBars title="Scrap by month" what="scrapped" points={t.scrapByMonth} />
          <RateBars title="Rework by month" what="reworked" points={t.reworkByMonth} />
        </>
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  filters: { flexDirection: "row", flexWrap: "wrap", gap: space.md },
  meta: { fontSize: fontSize.detail, color: colors.muted },
});
