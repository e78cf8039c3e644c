import { StyleSheet, Text, View } from "react-native";
import { FollowupAdd } from "@/components/followups/followup-add";
import { FollowupChain } from "@/components/followups/followup-chain";
import { FollowupFix } from "@/components/followups/followup-fix";
import { Heading } from "@/components/ui/heading";
import { Notice } from "@/components/ui/notice";
import { Loading } from "@/components/ui/query-state";
import { colors, fontSize, space } from "@/constants/theme";
import { useFollowups } from "@/hooks/use-followups";
import { useCaseReview, useCastingCauses } from "@/hooks/use-review";
import { useMay } from "@/hooks/use-rulebook";
import { useUnits } from "@/hooks/use-units";
import { fixSuggestions, fixWords } from "@/lib/fix-suggestions";
import { textInUnits } from "@/lib/quantity-words";
import type { CauseWithRecord } from "@/lib/review-schemas";

/**
 * The casting page's follow-up panel: the fixes tried after this casting, the next casting of the
 * same part each was tried on, whether it worked, and the whole chain. The confirmed cause's fixes are
 * offered first, then the ticked and the other likely causes' (`causes`: the latest diagnosis's).
 */
export function FollowupPanel({ castingId, causes }: { castingId: number; causes: CauseWithRecord[] }) {
  const data = useFollowups(castingId);
  const review = useCaseReview(castingId);
  const rulebook = useCastingCauses(castingId);
  const mayWrite = useMay({ casebook: ["write"] });
  const units = useUnits();
  if (data.isPending) return <Loading />;
  if (data.error) return <Notice tone="error">{data.error.message}</Notice>;
  const { fixes, chain, candidates, ticked } = data.data;
  const suggestions = fixSuggestions({
    confirmedCauseId: review.data?.current?.causeId,
    rulebook: rulebook.data,
    ranked: causes,
    ticked,
  });
  const say = fixWords([...causes, ...(rulebook.data ?? [])], (t) => textInUnits(t, units));
  return (
    <View style={styles.wrap} testID="followup-panel">
      <Heading level={2}>Fixes tried</Heading>
      {chain.length > 1 ? <FollowupChain chain={chain} /> : null}
      {fixes.length === 0 ? <Text style={styles.meta}>No fix recorded after this casting yet.</Text> : null}
      {fixes.map((f) => (
        <FollowupFix key={f.id} fix={f} candidates={candidates} mayWrite={mayWrite} />
      ))}
      {mayWrite ? (
        <FollowupAdd
          castingId={castingId}
          candidates={candidates}
          suggestions={suggestions}
          ticked={ticked}
          say={say}
        />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  meta: { fontSize: fontSize.detail, color: colors.muted },
});
