import { Link } from "expo-router";
import { useState } from "react";
import { Pressable, StyleSheet, Text, View } from "react-native";
import { Heading } from "@/components/ui/heading";
import { useIsWide } from "@/hooks/use-layout";
import { usePrinting } from "@/hooks/use-printing";
import { Notice } from "@/components/ui/notice";
import { colors, fontSize, space } from "@/constants/theme";
import { formatFact } from "@/lib/fact-display";
import { fieldOfFact } from "@/lib/fact-fields";
import { textInUnits } from "@/lib/quantity-words";
import type { Units } from "@/lib/units";
import type { DiagnosisResult } from "@/rules/rank";

/** Cautions shown on a phone before the rest fold under a count. */
const FIRST_CAUTIONS = 2;

type Props = { result: DiagnosisResult; units: Units; meltId: number; castingId: number };

/**
 * Under the causes: what was not logged (each opens the melt's or casting's form at its field), the
 * values worked out from the log, and the cautions.
 */
export function DiagnosisExtras({ result, units, meltId, castingId }: Props) {
  const [showFacts, setShowFacts] = useState(false);
  const [allCautions, setAllCautions] = useState(false);
  // On a phone the first cautions show and the rest fold under a count; on paper and wide screens all show.
  const everyCaution = useIsWide() || usePrinting() || allCautions;
  const cautions = result.cautionTemplates?.map((t) => textInUnits(t, units)) ?? result.cautions;
  const shownCautions = everyCaution ? cautions : cautions.slice(0, FIRST_CAUTIONS);
  const casting = `/melts/${meltId}/castings/${castingId}`;
  const hrefOf = (fact: string) => {
    const field = fieldOfFact(fact);
    if (!field) return null;
    return field.form === "melt"
      ? { pathname: "/melts/[id]/edit" as const, params: { id: meltId, field: fact, back: casting } }
      : { pathname: "/melts/[id]/castings/[castingId]" as const, params: { id: meltId, castingId, edit: fact } };
  };
  const facts = Object.entries(result.facts).map(([name, v]) => ({ name, ...formatFact(name, v, units) }));
  return (
    <View style={styles.wrap}>
      {result.missing.length ? (
        <View style={styles.block}>
          <Heading level={3}>Would sharpen the answer</Heading>
          {result.missing.map((m) => {
            const href = hrefOf(m.fact);
            // Inputs the notebook has no field for yet stay as words.
            return href ? (
              <Link key={m.fact} href={href} style={[styles.line, styles.link]} testID={`sharpen-${m.fact}`}>
                • {m.note} <Text style={styles.go}>(fill it in ›)</Text>
              </Link>
            ) : (
              <Text key={m.fact} style={styles.line}>
                • {m.note}
              </Text>
            );
          })}
        </View>
      ) : null}
      {facts.length ? (
        <View style={styles.block}>
          <Pressable role="button" aria-expanded={showFacts} onPress={() => setShowFacts((s) => !s)}>
            <Text style={styles.toggle}>
              {showFacts ? "▾ Hide the values worked out" : "▸ Values worked out from the log"}
            </Text>
          </Pressable>
          {showFacts
            ? facts.map((f) => (
                <Text key={f.name} style={styles.line}>
                  {f.label}: <Text style={styles.value}>{f.value}</Text>
                </Text>
              ))
            : null}
        </View>
      ) : null}
      {result.cautions.length ? (
        <Notice tone="caution">
          <Text style={styles.cautionHead}>Before you change the next pour</Text>
          {/* Older saved results carry only the SI sentences. */}
          {shownCautions.map((c) => (
            <Text key={c} style={styles.line}>
              • {c}
            </Text>
          ))}
          {cautions.length > shownCautions.length ? (
            <Pressable role="button" aria-expanded={false} onPress={() => setAllCautions(true)}>
              <Text style={styles.toggle}>▸ {cautions.length - shownCautions.length} more cautions</Text>
            </Pressable>
          ) : null}
        </Notice>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  block: { gap: space.xs },
  line: { fontSize: fontSize.detail, lineHeight: 21, color: colors.ink },
  value: { fontWeight: "700" },
  link: { color: colors.accent, paddingVertical: 2 },
  go: { fontWeight: "700", color: colors.accent },
  toggle: { fontSize: fontSize.body, fontWeight: "600", color: colors.accent, paddingVertical: space.xs },
  cautionHead: { fontSize: fontSize.body, fontWeight: "700", color: colors.ink },
});
