import { useMemo, useState } from "react";
import { Pressable, StyleSheet, Text, View } from "react-native";
import { CheckBox } from "@/components/ui/check-box";
import { Button } from "@/components/ui/button";
import { FieldError } from "@/components/ui/field-error";
import { Heading } from "@/components/ui/heading";
import { Notice } from "@/components/ui/notice";
import { CauseRecordLine } from "@/components/rulebook/rule-record";
import { CauseOption } from "@/components/review/cause-option";
import { RulebookCauseSearch } from "@/components/review/rulebook-cause-search";
import { TextField } from "@/components/ui/text-field";
import { card, colors, fontSize, radius, space } from "@/constants/theme";
import { useCastingCauses, useConfirmCause } from "@/hooks/use-review";
import { ApiError } from "@/lib/api";
import { causeFinder } from "@/lib/cause-search";
import { fieldErrors } from "@/lib/field-errors";
import { confirmationInput, type CauseWithRecord } from "@/lib/review-schemas";
import type { CauseOption as CauseOptionType } from "@/lib/rulebook-schemas";

const OTHER = "__other";

/**
 * A mentor confirms one of the ranked causes, any other cause of the rulebook (found by a few words),
 * or names one the rulebook lacks, which can join the shop's rulebook with a fix to try. A note says
 * what settles it for whoever reads the case later.
 */
type Props = { castingId: number; causes: CauseWithRecord[]; title: string; onDone?: () => void };

export function ReviewConfirmForm({ castingId, causes, title, onDone }: Props) {
  const [choice, setChoice] = useState<string | null>(null);
  const [picked, setPicked] = useState<CauseOptionType | null>(null);
  const [other, setOther] = useState("");
  const [makeShopCause, setMakeShopCause] = useState(false);
  const [fix, setFix] = useState("");
  const [note, setNote] = useState("");
  const [errors, setErrors] = useState<Record<string, string>>({});
  const rulebook = useCastingCauses(castingId);
  const confirm = useConfirmCause(castingId);
  const isOther = choice === OTHER;
  const listed = useMemo(() => new Set(causes.map((c) => c.id)), [causes]);
  const find = useMemo(() => causeFinder(rulebook.data ?? []), [rulebook.data]);
  // Words that sound like a rulebook cause: offer it, so the case counts for the rules that name it.
  const lookAlikes = isOther ? find(other, 3) : [];
  const submit = () => {
    const input = {
      causeId: choice && !isOther ? choice : undefined,
      causeText: isOther ? other.trim() || undefined : undefined,
      makeShopCause: isOther && makeShopCause ? true : undefined,
      newCauseFix: isOther && makeShopCause ? fix.trim() || undefined : undefined,
      note: note || undefined,
    };
    // "Something else" chosen but not named: say so at the name's field, not at the list just left.
    if (isOther && !input.causeText) return setErrors({ causeText: "say what it was, or choose a cause above" });
    const parsed = confirmationInput.safeParse(input);
    if (!parsed.success) return setErrors(fieldErrors(parsed.error, { topLevel: true }));
    setErrors({});
    confirm.mutate(parsed.data, {
      onSuccess: () => {
        setChoice(null);
        setOther("");
        setMakeShopCause(false);
        setFix("");
        setNote("");
        onDone?.();
      },
      onError: (e) => setErrors(e instanceof ApiError ? e.fields : {}),
    });
  };
  // A new choice starts afresh: no message about the last one, from the form or the server, stays behind.
  const choose = (id: string) => {
    setChoice(id);
    setErrors({});
    confirm.reset();
  };
  return (
    <View style={styles.wrap}>
      <Heading level={3}>{title}</Heading>
      <Text style={styles.label}>What caused it</Text>
      {causes.length ? (
        <View role="radiogroup" aria-label="Causes the diagnosis listed" style={styles.list}>
          {causes.map((c) => (
            <CauseOption key={c.id} title={c.title} on={choice === c.id} onPress={() => choose(c.id)}>
              <CauseRecordLine cause={c} />
            </CauseOption>
          ))}
        </View>
      ) : null}
      {rulebook.data ? (
        <View role="radiogroup" aria-label="Causes found in the rulebook">
          <RulebookCauseSearch
            causes={rulebook.data}
            listed={listed}
            choice={choice}
            picked={picked}
            onChoose={(c) => {
              setPicked(c);
              choose(c.id);
            }}
          />
        </View>
      ) : rulebook.error ? (
        <Notice tone="error">{rulebook.error.message}</Notice>
      ) : null}
      <View role="radiogroup" aria-label="A cause the rulebook lacks">
        <CauseOption title="Something else (not in the rulebook)" on={isOther} onPress={() => choose(OTHER)} />
      </View>
      <FieldError message={errors.causeId} />
      {isOther ? (
        <View style={styles.other}>
          <TextField
            label="What it was"
            value={other}
            onChangeText={(v) => {
              setOther(v);
              if (errors.causeText) setErrors(({ causeText: _, ...rest }) => rest);
            }}
            error={errors.causeText}
            placeholder="e.g. Ladle lip froze over"
          />
          {lookAlikes.length ? (
            <View style={styles.lookAlikes} testID="cause-look-alikes">
              <Text style={styles.note}>Is it one of these rulebook causes? Tap it to confirm that one instead.</Text>
              {lookAlikes.map((c) => (
                <Pressable
                  key={c.id}
                  role="button"
                  aria-label={`Use the rulebook cause: ${c.title}`}
                  onPress={() => {
                    setPicked(c);
                    choose(c.id);
                  }}
                  style={styles.lookAlike}
                >
                  <Text style={styles.lookAlikeText}>{c.title}</Text>
                </Pressable>
              ))}
            </View>
          ) : null}
          <CheckBox
            label="Add it to the shop’s rulebook as a cause, so rules can point at it and its record is kept"
            checked={makeShopCause}
            onChange={setMakeShopCause}
          />
          {makeShopCause ? (
            <TextField
              label="A fix to try for it"
              value={fix}
              onChangeText={setFix}
              error={errors.newCauseFix}
              placeholder="e.g. Preheat the ladle lip before tapping"
            />
          ) : null}
        </View>
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
  other: { gap: space.sm },
  note: { fontSize: fontSize.detail, lineHeight: 20, color: colors.ink },
  lookAlikes: { gap: space.xs },
  lookAlike: {
    padding: space.sm,
    borderRadius: radius.sm,
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.surface,
  },
  lookAlikeText: { fontSize: fontSize.detail, lineHeight: 20, color: colors.accent, fontWeight: "600" },
  multi: { minHeight: 64, paddingVertical: space.sm, textAlignVertical: "top" },
});
