import { useState } from "react";
import { Pressable, StyleSheet, Text, View } from "react-native";
import { Button } from "@/components/ui/button";
import { FieldError } from "@/components/ui/field-error";
import { Heading } from "@/components/ui/heading";
import { Notice } from "@/components/ui/notice";
import { CauseRecordLine } from "@/components/rulebook/rule-record";
import { TextField } from "@/components/ui/text-field";
import { card, colors, fontSize, radius, space } from "@/constants/theme";
import { useConfirmCause } from "@/hooks/use-review";
import { ApiError } from "@/lib/api";
import { fieldErrors } from "@/lib/field-errors";
import { confirmationInput, type CauseWithRecord } from "@/lib/review-schemas";

const OTHER = "__other";

/** A mentor confirms one of the ranked causes, or names another, with a note for whoever reads the case later. */
type Props = { castingId: number; causes: CauseWithRecord[]; title: string; onDone?: () => void };

export function ReviewConfirmForm({ castingId, causes, title, onDone }: Props) {
  const [choice, setChoice] = useState<string | null>(null);
  const [other, setOther] = useState("");
  const [note, setNote] = useState("");
  const [errors, setErrors] = useState<Record<string, string>>({});
  const confirm = useConfirmCause(castingId);
  const submit = () => {
    const input = {
      causeId: choice && choice !== OTHER ? choice : undefined,
      causeText: choice === OTHER ? other.trim() || undefined : undefined,
      note: note || undefined,
    };
    const parsed = confirmationInput.safeParse(input);
    if (!parsed.success) return setErrors(fieldErrors(parsed.error, { topLevel: true }));
    setErrors({});
    confirm.mutate(parsed.data, {
      onSuccess: () => {
        setChoice(null);
        setOther("");
        setNote("");
        onDone?.();
      },
      onError: (e) => setErrors(e instanceof ApiError ? e.fields : {}),
    });
  };
  const options = [
    ...causes.map((c) => ({ id: c.id, title: c.title, cause: c })),
    { id: OTHER, title: "Something else", cause: null },
  ];
  return (
    <View style={styles.wrap}>
      <Heading level={3}>{title}</Heading>
      <Text style={styles.label}>What caused it</Text>
      <View role="radiogroup" aria-label="What caused it" style={styles.list}>
        {options.map((o) => (
          <Pressable
            key={o.id}
            role="radio"
            aria-checked={choice === o.id}
            aria-label={o.title}
            onPress={() => setChoice(o.id)}
            style={[styles.option, choice === o.id && styles.on]}
          >
            <Text style={styles.title}>
              {choice === o.id ? "● " : "○ "}
              {o.title}
            </Text>
            {o.cause ? <CauseRecordLine cause={o.cause} /> : null}
          </Pressable>
        ))}
      </View>
      <FieldError message={errors.causeId} />
      {choice === OTHER ? (
        <TextField
          label="What it was"
          value={other}
          onChangeText={setOther}
          error={errors.causeText}
          placeholder="e.g. Ladle lip froze over"
        />
      ) : null}
      <TextField
        label="Note (optional)"
        value={note}
        onChangeText={setNote}
        error={errors.note}
        multiline
        style={styles.multi}
        placeholder="What you saw that settles it"
      />
      {confirm.error && !Object.keys(errors).length ? <Notice tone="error">{confirm.error.message}</Notice> : null}
      <Button label="Confirm the cause" onPress={submit} busy={confirm.isPending} testID="confirm-cause" />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { ...card, gap: space.sm, padding: space.md },
  label: { fontSize: fontSize.detail, fontWeight: "600", color: colors.ink },
  list: { gap: space.xs },
  option: {
    gap: 2,
    padding: space.sm,
    borderRadius: radius.sm,
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.background,
  },
  on: { borderColor: colors.steel, backgroundColor: "#E7EFEF" },
  title: { fontSize: fontSize.body, color: colors.ink },
  multi: { minHeight: 64, paddingVertical: space.sm, textAlignVertical: "top" },
});
