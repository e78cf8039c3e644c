import { useState } from "react";
import { StyleSheet, Text, View } from "react-native";
import { Button } from "@/components/ui/button";
import { Heading } from "@/components/ui/heading";
import { Notice } from "@/components/ui/notice";
import { TextField } from "@/components/ui/text-field";
import { card, colors, fontSize, space } from "@/constants/theme";
import { useAddComment } from "@/hooks/use-comments";
import { formatDay } from "@/lib/dates";
import { commentInput, type Comment } from "@/lib/notebook-schemas";

/** The casting's conversation: what people noticed, asked and answered, oldest first. */
export function CommentThread({
  castingId,
  comments,
  mayComment,
}: {
  castingId: number;
  comments: Comment[];
  mayComment: boolean;
}) {
  const [draft, setDraft] = useState("");
  const [error, setError] = useState<string>();
  const add = useAddComment(castingId);

  function submit() {
    const parsed = commentInput.safeParse({ body: draft });
    if (!parsed.success) return setError(parsed.error.issues[0]?.message);
    setError(undefined);
    add.mutate(parsed.data.body, { onSuccess: () => setDraft("") });
  }

  return (
    <View style={styles.wrap}>
      <Heading level={2}>Notes and questions</Heading>
      {comments.length === 0 ? <Text style={styles.empty}>Nobody has written here yet.</Text> : null}
      {comments.map((c) => (
        <View key={c.id} style={styles.comment} testID="comment">
          <Text style={styles.meta}>
            {c.createdBy.name} · {formatDay(c.createdAt)}
          </Text>
          <Text style={styles.body}>{c.body}</Text>
        </View>
      ))}
      {mayComment ? (
        <>
          <TextField
            label="Add a note or question"
            value={draft}
            onChangeText={setDraft}
            error={error}
            multiline
            style={styles.input}
          />
          {add.error ? <Notice tone="error">{add.error.message}</Notice> : null}
          <Button label="Post" kind="plain" onPress={submit} busy={add.isPending} />
        </>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  empty: { color: colors.muted, fontSize: fontSize.body },
  comment: { ...card, padding: space.md, gap: space.xs },
  meta: { fontSize: fontSize.small, color: colors.muted },
  body: { fontSize: fontSize.body, lineHeight: 22, color: colors.ink },
  input: { minHeight: 80, paddingVertical: space.sm, textAlignVertical: "top" },
});
