import { StyleSheet, Text, View } from "react-native";
import { Button } from "@/components/ui/button";
import { CauseCard } from "@/components/diagnosis/cause-card";
import { DiagnosisExtras } from "@/components/diagnosis/diagnosis-extras";
import { Heading } from "@/components/ui/heading";
import { Notice } from "@/components/ui/notice";
import { colors, CONTENT_MAX_PX, fontSize, space } from "@/constants/theme";
import { useDiagnosisFreshness, useRunDiagnosis } from "@/hooks/use-diagnosis";
import { useFollowups, useTickFix } from "@/hooks/use-followups";
import { formatMoment } from "@/lib/dates";
import { caseFieldWords } from "@/lib/fact-fields";
import type { CastingDetail } from "@/lib/notebook-schemas";
import type { Units } from "@/lib/units";

/**
 * The likely causes of what was marked on this casting, from the shop's rules and the melt's and
 * casting's conditions. The last answer is kept and shown on opening; the button works it out again.
 */
export function DiagnosisView({
  casting,
  units,
  mayRun,
  showsRuleVersion,
}: {
  casting: CastingDetail;
  units: Units;
  mayRun: boolean;
  /** Mentors and owners, who write the rules, can match an answer to a rulebook version; a caster needs the date. */
  showsRuleVersion: boolean;
}) {
  const run = useRunDiagnosis(casting.id);
  const snapshot = casting.diagnosis;
  const noMarks = casting.marks.length === 0;
  const fresh = useDiagnosisFreshness(casting.id, !!snapshot);
  const stale = snapshot && fresh.data?.snapshotId === snapshot.id && fresh.data.stale ? fresh.data : null;
  const ticked = new Set(useFollowups(casting.id).data?.ticked ?? []);
  const tick = useTickFix(casting.id);
  const onTick = mayRun ? (fix: string, on: boolean) => tick.mutate({ fix, ticked: on }) : undefined;

  return (
    <View style={styles.wrap} testID="diagnosis">
      <Heading level={2}>Likely causes</Heading>
      {noMarks ? <Notice>Mark at least one defect first: the causes are worked out from the marks.</Notice> : null}
      {stale ? (
        <View testID="diagnosis-stale">
          <Notice tone="caution">
            <Text style={styles.staleHead}>Out of date</Text>
            <Text style={styles.staleText}>
              Changed since these causes were worked out: {caseFieldWords(stale.changed)}. The answer below is the old
              one, kept for reference
              {mayRun && !noMarks ? "; work it out again to see what the change makes of it." : "."}
            </Text>
          </Notice>
        </View>
      ) : null}
      {mayRun && !noMarks ? (
        <View style={styles.start}>
          <Button
            label={stale ? "Work it out again" : snapshot ? "Find likely causes again" : "Find likely causes"}
            onPress={() => run.mutate()}
            busy={run.isPending}
            testID="find-causes"
          />
        </View>
      ) : null}
      {run.error ? <Notice tone="error">{run.error.message}</Notice> : null}
      {tick.error ? <Notice tone="error">{tick.error.message}</Notice> : null}
      {snapshot ? (
        <>
          <Text style={styles.when}>
            Worked out {formatMoment(snapshot.createdAt)}
            {snapshot.createdBy?.name ? ` by ${snapshot.createdBy.name}` : ""}
            {showsRuleVersion ? ` · rules version ${snapshot.ruleSetVersion.slice(0, 8)}` : ""}.
          </Text>
          {snapshot.result.causes.length === 0 ? (
            <Notice>
              No rule fits these marks and conditions. Logging more of the melt and casting (below) may help; a mentor
              can also add what the shop has learned.
            </Notice>
          ) : (
            snapshot.result.causes.map((c, i) => (
              <CauseCard key={c.id} cause={c} rank={i + 1} units={units} ticked={ticked} onTick={onTick} />
            ))
          )}
          <DiagnosisExtras result={snapshot.result} units={units} meltId={casting.meltId} castingId={casting.id} />
        </>
      ) : !noMarks ? (
        <Text style={styles.when}>Not worked out yet for this casting.</Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  // Reading width: causes and fixes are sentences, not table rows.
  wrap: { gap: space.md, maxWidth: CONTENT_MAX_PX },
  start: { alignSelf: "flex-start" },
  when: { fontSize: fontSize.detail, lineHeight: 20, color: colors.muted },
  staleHead: { fontSize: fontSize.body, fontWeight: "700", color: colors.ink },
  staleText: { fontSize: fontSize.detail, lineHeight: 21, color: colors.ink },
});
