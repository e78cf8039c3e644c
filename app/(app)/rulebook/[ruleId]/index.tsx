import { useLocalSearchParams } from "expo-router";
import type { ReactNode } from "react";
import { StyleSheet, Text, View } from "react-native";
import { BackLink } from "@/components/ui/back-link";
import { Heading } from "@/components/ui/heading";
import { Notice } from "@/components/ui/notice";
import { LoadFailed, Loading } from "@/components/ui/query-state";
import { RuleActions } from "@/components/rulebook/rule-actions";
import { RuleConditions } from "@/components/rulebook/rule-conditions";
import { stateWords } from "@/lib/rule-state";
import { RuleRecordLine } from "@/components/rulebook/rule-record";
import { RuleVersions } from "@/components/rulebook/rule-versions";
import { Screen } from "@/components/ui/screen";
import { card, colors, fontSize, space } from "@/constants/theme";
import { useRule, useRulebook } from "@/hooks/use-rulebook";
import { useUnits } from "@/hooks/use-units";
import { formatMoment } from "@/lib/dates";
import { textInUnits } from "@/lib/quantity-words";
import { reasonTemplateInUnits } from "@/lib/reason-text";
import { DEFECTS, LOCATION_LABELS } from "@/lib/defects";

/** One rule in plain words: what it explains, when, what it points to, its record here, and its history. */
export default function RuleScreen() {
  const ruleId = String(useLocalSearchParams<{ ruleId: string }>().ruleId);
  const rule = useRule(ruleId);
  const book = useRulebook();
  const units = useUnits();
  if (rule.isPending) return <Loading />;
  if (rule.error) return <LoadFailed error={rule.error} />;
  const r = rule.data;
  const places = r.locations.length ? r.locations.map((l) => LOCATION_LABELS[l]).join(", ") : "anywhere on the part";
  return (
    <Screen>
      <BackLink href="/rulebook" label="Rulebook" />
      <Heading>
        {r.effect === "weakens" ? "Against: " : ""}
        {r.cause.title}
      </Heading>
      <Text style={styles.meta} testID="rule-state">
        {r.source === "shop" ? "Written here" : `Built in · ${r.family}`} · {stateWords(r)}
      </Text>
      {r.contradictions.map((c) => (
        <Notice
          key={c.message}
          tone="caution"
        >{`These conditions can never all be true, so it would never fire: ${c.message}.`}</Notice>
      ))}
      <RuleActions rule={r} />
      <Block title="Explains">
        <Text style={styles.text}>
          {r.explains.map((t) => DEFECTS[t].label).join(", ")} · {places}
        </Text>
      </Block>
      <Block title="When all of these hold">
        <RuleConditions conditions={r.rule.conditions} units={units} />
      </Block>
      <Block title={r.effect === "weakens" ? "It speaks against" : "It points to"}>
        <Text style={styles.strong}>{r.cause.title}</Text>
        {r.causeFixes.map((f) => (
          <Text key={f} style={styles.text}>
            • {textInUnits(f, units)}
          </Text>
        ))}
        {/* Its figures in the reader's units; the {fact} placeholders stay, filled from each case. */}
        <Text style={styles.text}>Reason shown: “{reasonTemplateInUnits(r.rule.because, units)}”</Text>
      </Block>
      <Block title="How much it counts here">
        <Text style={styles.text}>
          Weight {r.weight}
          {r.factor !== 1
            ? `, × ${r.factor.toFixed(2)} from its record here (counts as ${Math.min(1, r.weight * r.factor).toFixed(2)})`
            : ""}
          .
        </Text>
        <RuleRecordLine record={r.record} />
        {r.record ? null : (
          <Text style={styles.muted}>
            Until it fires on a case whose cause a mentor confirmed, it counts at its written weight.
          </Text>
        )}
      </Block>
      <Block title="Sources">
        {r.sources.map((s) => (
          <Text key={s} style={styles.text}>
            • {s}
          </Text>
        ))}
      </Block>
      {r.source === "shop" ? (
        <Block title="Versions">
          <RuleVersions versions={r.versions} causes={book.data?.causes ?? []} units={units} />
        </Block>
      ) : r.switches.length ? (
        <Block title="Switched here">
          {r.switches.map((s) => (
            <Text key={s.createdAt} style={styles.text}>
              • {s.off ? "Off" : "Back on"}: {s.createdBy?.name ?? "someone"}, {formatMoment(s.createdAt)}
            </Text>
          ))}
        </Block>
      ) : null}
    </Screen>
  );
}

function Block({ title, children }: { title: string; children: ReactNode }) {
  return (
    <View style={styles.block}>
      <Heading level={3}>{title}</Heading>
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  meta: { fontSize: fontSize.detail, color: colors.muted, fontWeight: "600" },
  block: { ...card, gap: space.xs, padding: space.md },
  text: { fontSize: fontSize.body, lineHeight: 22, color: colors.ink },
  strong: { fontSize: fontSize.body, lineHeight: 22, fontWeight: "700", color: colors.ink },
  muted: { fontSize: fontSize.detail, lineHeight: 20, color: colors.muted },
});
