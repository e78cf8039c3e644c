import { useLocalSearchParams } from "expo-router";
import { ArchiveControl } from "@/components/archive/archive-control";
import { CalcLinks } from "@/components/calculators/calc-links";
import { gatingPrefill } from "@/lib/calculator-fields";
import { BackLink } from "@/components/ui/back-link";
import { CaseSheetActions } from "@/components/castings/case-sheet-actions";
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
import { useCasting } from "@/hooks/use-castings";
import { useIsWide } from "@/hooks/use-layout";
import { useMe } from "@/hooks/use-me";
import { useUnits } from "@/hooks/use-units";
import { formatDay } from "@/lib/dates";
import { roleCan } from "@/lib/permissions";
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

  return (
    <Screen wide={wide}>
      <BackLink href={`/melts/${c.meltId}`} label={`${c.melt.alloy} melt of ${formatDay(c.melt.pouredOn)}`} />
      {c.melt.archivedAt ? <ArchiveControl kind="melt" row={c.melt} /> : null}
      <CastingSummary casting={c} units={units} mayEdit={mayWrite} editField={params.edit} />
      <ArchiveControl kind="casting" row={c} />
      <CaseSheetActions castingId={c.id} />
      <PrintOnly>
        <Heading level={2}>The melt</Heading>
        <MeltFacts melt={c.melt} units={units} />
      </PrintOnly>
      <Heading level={2}>Photos and marks</Heading>
      <Inspection casting={c} wide={wide} />
      <DiagnosisView
        casting={c}
        units={units}
        mayRun={mayWrite}
        showsRuleVersion={roleCan(role, { rule: ["write"] })}
      />
      <ReviewPanel castingId={c.id} causes={causes} />
      <FollowupPanel castingId={c.id} causes={causes} />
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
          }}
        />
        <SimilarCases castingId={c.id} />
        <CommentThread castingId={c.id} comments={c.comments} mayComment={roleCan(role, { casebook: ["comment"] })} />
      </PrintHidden>
    </Screen>
  );
}
