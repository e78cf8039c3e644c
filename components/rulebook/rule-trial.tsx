import { Link } from "expo-router";
import { Pressable, StyleSheet, Text, View } from "react-native";
import { Heading } from "@/components/ui/heading";
import { Notice } from "@/components/ui/notice";
import { colors, fontSize, radius, space } from "@/constants/theme";
import { formatDay } from "@/lib/dates";
import type { Trial } from "@/lib/rulebook-schemas";
import type { Verdict } from "@/rules/backtest";

const VERDICT: Record<Verdict, { text: string; colour: string }> = {
  "now-right": { text: "now matches the confirmed cause", colour: colors.steel },
  "now-wrong": { text: "no longer matches the confirmed cause", colour: colors.danger },
  "still-wrong": { text: "confirmed cause was another", colour: colors.muted },
  unconfirmed: { text: "no cause confirmed yet", colour: colors.muted },
};
const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;

/** What a draft rule would have done on the shop's past cases, with each changed case one tap away. */
export function RuleTrial({ trial }: { trial: Trial }) {
  const t = trial;
  return (
    <View style={styles.wrap} testID="trial-results">
      <Heading level={3}>On past cases</Heading>
      <Text style={styles.line} testID="trial-fired">
        Tried on {plural(t.cases, "marked casting")}: it fires on {t.fired}.
      </Text>
      <Text style={styles.line} testID="trial-agreed">
        {t.firedConfirmed === 0
          ? "None of those has a confirmed cause yet, so there is nothing to agree with."
          : `Of those, ${plural(t.firedConfirmed, "has", "have")} a confirmed cause; the rule agrees with ${t.agreed} of ${t.firedConfirmed}.`}
      </Text>
      {t.confirmedCases > 0 ? (
        <Text style={styles.line}>
          Top cause matches the confirmed one in {t.topRightBefore} of {t.confirmedCases} confirmed cases now,{" "}
          {t.topRightAfter} with this rule.
        </Text>
      ) : null}
      {t.contradictions.map((c) => (
        <Notice key={c.message} tone="caution">{`Never true: ${c.message}.`}</Notice>
      ))}
      <Text style={styles.sub}>
        {t.changed.length
          ? `Top cause would change for ${plural(t.changed.length, "case")}`
          : "No case would get a different top cause."}
      </Text>
      {t.changed.map((c) => (
        <Link key={c.castingId} href={`/melts/${c.meltId}/castings/${c.castingId}`} asChild>
          <Pressable role="link" style={styles.case} testID="trial-case">
            <Text style={styles.part}>
              {c.partName} · {formatDay(c.pouredOn)}
            </Text>
            <Text style={styles.change}>
              {c.before?.title ?? "no cause"} → {c.after?.title ?? "no cause"}
            </Text>
            {c.confirmed ? (
              <Text style={styles.confirmed}>
                Confirmed:{" "}
                {c.confirmed.id ? (t.causeTitles[c.confirmed.id] ?? c.confirmed.id) : "a cause not in the rulebook"}
              </Text>
            ) : null}
            <Text style={[styles.verdict, { color: VERDICT[c.verdict].colour }]}>{VERDICT[c.verdict].text}</Text>
          </Pressable>
        </Link>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: {
    gap: space.sm,
    padding: space.md,
    borderRadius: radius.md,
    borderWidth: 1,
    borderColor: colors.steel,
    backgroundColor: colors.surface,
  },
  line: { fontSize: fontSize.body, lineHeight: 22, color: colors.ink },
  sub: { fontSize: fontSize.detail, fontWeight: "700", color: colors.muted, marginTop: space.xs },
  case: {
    gap: 2,
    padding: space.sm,
    borderRadius: radius.sm,
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.background,
  },
  part: { fontSize: fontSize.body, fontWeight: "700", color: colors.accent },
  change: { fontSize: fontSize.detail, lineHeight: 20, color: colors.ink },
  confirmed: { fontSize: fontSize.small, color: colors.muted },
  verdict: { fontSize: fontSize.small, fontWeight: "700" },
});
