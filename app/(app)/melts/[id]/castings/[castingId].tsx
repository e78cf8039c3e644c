import { useLocalSearchParams } from "expo-router";
import { ArchiveControl } from "@/components/archive/archive-control";
import { CalcLinks } from "@/components/calculators/calc-links";
import { gatingPrefill } from "@/lib/calculator-fields";
import { BackLink } from "@/components/ui/back-link";
import { CaseSheetActions } from "@/components/castings/case-sheet-actions";
import { CastingGlance } from "@/components/castings/casting-glance";
import { CastingSummary } from "@/components/castings/casting-summary";
import { CommentThread } from "@/components/comments/comment-thread";
import { DiagnosisView } from "@/components/diagnosis/diagnosis-view";
import { FollowupPanel } from "@/components/followups/followup-panel";
import { Heading } from "@/components/ui/heading";
import { Inspection } from "@/components/marks/inspection";
import { MeltFacts } from "@/components/melts/melt-facts";
import { LoadFailed, Loading } from "@/components/ui/query-state";
import { ReviewPanel } from "@/components/review/review-panel";
import { PrintHidden, PrintOnly } from "@/components/ui/print";
import { Screen } from "@/components/ui/screen";
import { SimilarCases } from "@/components/search/similar-cases";
import { StyleSheet, View } from "react-native";
import { space } from "@/constants/theme";
import { useCasting } from "@/hooks/use-castings";
import { useIsWide } from "@/hooks/use-layout";
import { useMe } from "@/hooks/use-me";
import { useUnits } from "@/hooks/use-units";
import { formatDay } from "@/lib/dates";
import { roleCan } from "@/lib/permissions";
import { sectionId } from "@/lib/page-sections";
import { castingYieldPct } from "@/rules/compute/casting-yield";
import type { CauseWithRecord } from "@/lib/review-schemas";

/**
 * One casting: how it came out, its photos with the defects marked on them, the likely causes, the
 * mentor's review, the fix tried and the next casting, the most similar past cases, and the thread of notes.
 */
export default function CastingScreen() {
  const params = useLocalSearchParams<{ id: string; castingId: string; edit?: string }>();
  const casting = useCasting(Number(params.castingId));
  const units = useUnits();
  const wide = useIsWide();
  const role = useMe().data?.activeShop?.role ?? "";
  const mayWrite = roleCan(role, { casebook: ["write"] });
  if (casting.isPending) return <Loading />;
  if (casting.error) return <LoadFailed error={casting.error} />;
  const c = casting.data;
  const causes = (c.diagnosis?.result.causes ?? []) as CauseWithRecord[];
  const causesFirst = !wide && causes.length > 0;
  const diagnosis = (
    <View nativeID={sectionId("causes")}>
      <DiagnosisView
        casting={c}
        units={units}
        mayRun={mayWrite}
        showsRuleVersion={roleCan(role, { rule: ["write"] })}
      />
    </View>
  );

  // Paper is rarer than reading the case: on a phone its buttons wait at the foot of the page.
  const paper = <CaseSheetActions castingId={c.id} />;

  return (
    <Screen wide={wide}>
      <BackLink href={`/melts/${c.meltId}`} label={`${c.melt.alloy} melt of ${formatDay(c.melt.pouredOn)}`} />
      {c.melt.archivedAt ? <ArchiveControl kind="melt" row={c.melt} /> : null}
      <CastingSummary casting={c} units={units} mayEdit={mayWrite} editField={params.edit} folds={!wide} />
      <CastingGlance casting={c} />
      <ArchiveControl kind="casting" row={c} />
      {wide ? paper : null}
      <PrintOnly>
        <Heading level={2}>The melt</Heading>
        <MeltFacts melt={c.melt} units={units} />
      </PrintOnly>
      {/* On a phone, once there is an answer the causes come before the photos: they are what one opens the case for. */}
      {causesFirst ? diagnosis : null}
      <View nativeID={sectionId("photos")} style={styles.section}>
        <Heading level={2}>Photos and marks</Heading>
        <Inspection casting={c} wide={wide} />
      </View>
      {causesFirst ? null : diagnosis}
      <View nativeID={sectionId("review")} style={styles.section}>
        <ReviewPanel castingId={c.id} causes={causes} />
        <FollowupPanel castingId={c.id} causes={causes} />
      </View>
      {/* Links to elsewhere and the thread stay on screen; the printed sheet ends with the fix and its outcome. */}
      <PrintHidden>
        <CalcLinks
          target={{ meltId: c.meltId, castingId: c.id }}
          prefill={{
            alloy: c.melt.alloy,
            process: c.melt.process,
            minSectionMm: c.minSectionMm,
            thicknessMm: c.maxSectionMm,
            shape: "plate",
            ...gatingPrefill(c),
            // Metal to melt for the next one starts from this mould's own yield and casting weight.
            yieldPct: roundedYield(castingYieldPct(c.castingWeightKg, c.pouredWeightKg)),
            previousCastingKg: c.castingWeightKg,
          }}
        />
        <SimilarCases castingId={c.id} />
        <View nativeID={sectionId("notes")}>
          <CommentThread castingId={c.id} comments={c.comments} mayComment={roleCan(role, { casebook: ["comment"] })} />
        </View>
      </PrintHidden>
      {wide ? null : paper}
    </Screen>
  );
}

const roundedYield = (y: number | undefined) => (y === undefined ? undefined : Math.round(y));

const styles = StyleSheet.create({ section: { gap: space.lg } });
