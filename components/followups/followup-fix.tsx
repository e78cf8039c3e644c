import { StyleSheet, Text, View } from "react-native";
import { ChoiceChips } from "@/components/ui/choice-chips";
import { Notice } from "@/components/ui/notice";
import { castingWords } from "@/lib/case-words";
import { card, colors, fontSize, space } from "@/constants/theme";
import { usePatchFix } from "@/hooks/use-followups";
import { ApiError } from "@/lib/api";
import { formatMoment } from "@/lib/dates";
import { WORKED, WORKED_LABELS, type CastingRef, type FixTried, type Worked } from "@/lib/review-schemas";

const WORKED_CHOICES = WORKED.map((w) => ({ value: w, label: WORKED_LABELS[w] }));

/** One fix tried: link the next casting it was tried on, then say whether it worked. */
export function FollowupFix({
  fix,
  candidates,
  mayWrite,
}: {
  fix: FixTried;
  candidates: CastingRef[];
  mayWrite: boolean;
}) {
  const patch = usePatchFix();
  const linkOptions = candidates.map((c) => ({ value: String(c.id), label: castingWords(c) }));
  return (
    <View style={styles.card} testID={`fix-${fix.id}`}>
      <Text style={styles.fix}>{fix.fix}</Text>
      <Text style={styles.meta}>
        {fix.createdBy?.name ?? "someone"}, {formatMoment(fix.createdAt)}
      </Text>
      {fix.next ? <Text style={styles.meta}>Tried on: {castingWords(fix.next)}</Text> : null}
      {mayWrite && !fix.next ? (
        linkOptions.length ? (
          <ChoiceChips
            label="Tried on the next casting"
            options={linkOptions}
            value={null}
            onChange={(v) => patch.mutate({ id: fix.id, nextCastingId: Number(v) })}
          />
        ) : (
          <Text style={styles.meta}>Once the part is poured again in a later melt, link that casting here.</Text>
        )
      ) : null}
      {fix.next ? (
        <ChoiceChips
          label="Did it work?"
          options={WORKED_CHOICES}
          value={fix.worked}
          disabled={!mayWrite}
          onChange={(v) => patch.mutate({ id: fix.id, worked: v as Worked })}
        />
      ) : null}
      {patch.error ? (
        <Notice tone="error">
          {patch.error instanceof ApiError
            ? (Object.values(patch.error.fields)[0] ?? patch.error.message)
            : patch.error.message}
        </Notice>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  card: { ...card, gap: space.xs, padding: space.md },
  fix: { fontSize: fontSize.field, fontWeight: "600", color: colors.ink },
  meta: { fontSize: fontSize.detail, color: colors.muted },
});
