import { Link } from "expo-router";
import { StyleSheet, Text, View } from "react-native";
import { Heading } from "@/components/ui/heading";
import { colors, fontSize, radius, space } from "@/constants/theme";
import { useCalculations, type CalcTarget } from "@/hooks/use-calculations";
import { CALCULATOR_TITLES } from "@/lib/calculator-fields";
import { formatDay } from "@/lib/dates";
import { CALCULATORS } from "@/rules/calculators";

type Props = { target: CalcTarget & { meltId: number }; prefill: Record<string, string | number | null | undefined> };

/** The calculators opened for this melt or casting, prefilled with what it logged, and the results saved on it. */
export function CalcLinks({ target, prefill }: Props) {
  const saved = useCalculations(target.castingId ? { castingId: target.castingId } : { meltId: target.meltId });
  const params = new URLSearchParams();
  params.set("meltId", String(target.meltId));
  if (target.castingId) params.set("castingId", String(target.castingId));
  for (const [k, v] of Object.entries(prefill)) if (v !== null && v !== undefined && v !== "") params.set(k, String(v));
  return (
    <View style={styles.wrap}>
      <Heading level={2}>Work it out</Heading>
      <View style={styles.row}>
        {CALCULATORS.map((k) => (
          <Link key={k} href={`/melts/calculators/${k}?${params}` as never} style={styles.chip}>
            {CALCULATOR_TITLES[k].title}
          </Link>
        ))}
      </View>
      {saved.data?.length ? (
        <View style={styles.saved} aria-label="Saved results">
          {saved.data.map((s) => (
            <Text key={s.id} style={styles.item}>
              {CALCULATOR_TITLES[s.kind].title}: {s.result.summary} · {s.createdBy.name},{" "}
              {formatDay(s.createdAt.slice(0, 10))}
            </Text>
          ))}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  row: { flexDirection: "row", flexWrap: "wrap", gap: space.sm },
  chip: {
    borderWidth: 1,
    borderColor: colors.line,
    borderRadius: radius.sm,
    paddingHorizontal: space.md,
    paddingVertical: space.sm,
    color: colors.accent,
    fontSize: fontSize.body,
    backgroundColor: colors.surface,
  },
  saved: { gap: space.xs },
  item: { fontSize: fontSize.detail, color: colors.ink },
});
