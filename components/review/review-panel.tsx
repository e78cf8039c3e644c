import { useEffect, useState } from "react";
import { StyleSheet, Text, View } from "react-native";
import { Button } from "@/components/ui/button";
import { Heading } from "@/components/ui/heading";
import { Notice } from "@/components/ui/notice";
import { Loading } from "@/components/ui/query-state";
import { ReviewConfirmForm } from "@/components/review/review-confirm-form";
import { TextField } from "@/components/ui/text-field";
import { colors, fontSize, radius, space } from "@/constants/theme";
import { useAnswerSeen, useAskReview, useCaseReview } from "@/hooks/use-review";
import { useMay } from "@/hooks/use-rulebook";
import { formatMoment } from "@/lib/dates";
import type { CauseWithRecord } from "@/lib/review-schemas";

/**
 * The casting page's review panel: ask a mentor to look, see who confirmed what, and (mentors and
 * owners) confirm a ranked cause, any other of the rulebook, or name another. `causes` are the latest
 * diagnosis's.
 */
export function ReviewPanel({ castingId, causes }: { castingId: number; causes: CauseWithRecord[] }) {
  const review = useCaseReview(castingId);
  const ask = useAskReview(castingId);
  const mayAsk = useMay({ casebook: ["request-review"] });
  const mayConfirm = useMay({ review: ["confirm"] });
  const [note, setNote] = useState("");
  const [correcting, setCorrecting] = useState(false);
  // The answer is on screen: its "new answer" mark leaves the author's lists (a no-op for anyone else).
  const seen = useAnswerSeen(castingId);
  const answerId = review.data?.current?.id;
  useEffect(() => {
    if (answerId !== undefined) seen.mutate();
    // Once per answer shown; `seen` is a new object each render.
  }, [answerId]);
  if (review.isPending) return <Loading />;
  if (review.error) return <Notice tone="error">{review.error.message}</Notice>;
  const { waiting, current, confirmations } = review.data;
  return (
    <View style={styles.wrap} testID="review-panel">
      <Heading level={2}>Review</Heading>
      {current ? (
        <View style={styles.box} testID="confirmed-cause">
          <Text style={styles.strong}>Confirmed: {current.causeTitle}</Text>
          <Text style={styles.meta}>
            {current.createdBy?.name ?? "A mentor"}, {formatMoment(current.createdAt)}
          </Text>
          {current.note ? <Text style={styles.text}>{current.note}</Text> : null}
        </View>
      ) : null}
      {waiting ? (
        <Notice>{`Waiting for a mentor since ${formatMoment(waiting.createdAt)}, asked by ${waiting.createdBy?.name ?? "someone"}.${waiting.note ? ` “${waiting.note}”` : ""}`}</Notice>
      ) : !current ? (
        <Text style={styles.meta}>No mentor has looked at this casting yet.</Text>
      ) : null}
      {/* Mentors confirm directly; asking is for those who may not. */}
      {mayAsk && !mayConfirm && !waiting ? (
        <View style={styles.ask}>
          <TextField
            label="Note for the mentor (optional)"
            value={note}
            onChangeText={setNote}
            placeholder="What puzzles you about it"
          />
          <Button
            label={current ? "Ask for another look" : "Ask a mentor to review"}
            busy={ask.isPending}
            onPress={() => ask.mutate(note, { onSuccess: () => setNote("") })}
            testID="ask-review"
          />
          {ask.error ? <Notice tone="error">{ask.error.message}</Notice> : null}
        </View>
      ) : null}
      {mayConfirm && (!current || correcting) ? (
        <ReviewConfirmForm
          castingId={castingId}
          causes={causes}
          title={current ? "Correct the cause" : "Confirm the cause"}
          onDone={() => setCorrecting(false)}
        />
      ) : mayConfirm ? (
        <Button kind="plain" label="Correct the cause" onPress={() => setCorrecting(true)} />
      ) : null}
      {confirmations.length > 1 ? (
        <View style={styles.earlier}>
          <Text style={styles.meta}>Earlier:</Text>
          {confirmations.slice(1).map((c) => (
            <Text key={c.id} style={styles.meta}>
              • {c.causeTitle} ({c.createdBy?.name ?? "a mentor"}, {formatMoment(c.createdAt)})
            </Text>
          ))}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  box: {
    gap: 2,
    padding: space.md,
    borderRadius: radius.md,
    borderWidth: 1,
    borderColor: colors.steel,
    backgroundColor: colors.surface,
  },
  strong: { fontSize: fontSize.field, fontWeight: "700", color: colors.ink },
  text: { fontSize: fontSize.body, lineHeight: 22, color: colors.ink },
  meta: { fontSize: fontSize.detail, color: colors.muted },
  ask: { gap: space.sm },
  earlier: { gap: 2 },
});
