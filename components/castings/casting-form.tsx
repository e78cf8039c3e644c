import { useState } from "react";
import { StyleSheet, Text, View } from "react-native";
import { Button } from "@/components/ui/button";
import { CastingMore } from "@/components/castings/casting-form-more";
import { Pair } from "@/components/ui/field-pair";
import { Notice } from "@/components/ui/notice";
import { NumberField } from "@/components/ui/number-field";
import { OutcomeChips } from "@/components/castings/outcome-chips";
import { TextField } from "@/components/ui/text-field";
import { colors, fontSize, space } from "@/constants/theme";
import { DraftRestored } from "@/components/ui/draft-restored";
import { useCastingDraft, type CastingInitial } from "@/hooks/use-casting-draft";
import { newSaveId } from "@/lib/save-id";

/** What onSubmit answers for a save that waits for the connection. */
export const WAITING = { waiting: true } as const;
const isWaiting = (a: unknown) => typeof a === "object" && a !== null && "waiting" in a;
import { ApiError } from "@/lib/api";
import { OUTCOME_LABELS } from "@/lib/labels";
import type { CastingInput } from "@/lib/notebook-schemas";
import { takesInchFractions, unitLabel, type Units } from "@/lib/units";

type Props = {
  initial?: CastingInitial;
  units: Units;
  submitLabel: string;
  onSubmit: (input: CastingInput) => Promise<unknown>;
  /** Quick logging: after a save the form stays, keeping the part and sizes for the next casting. */
  keepOpen?: boolean;
  /** Where the draft is kept on the device ("casting:new:12"). */
  draftName?: string;
  /** A new casting's save carries an idempotency key, so sending it twice makes one casting. */
  isNew?: boolean;
  startExpanded?: boolean;
};

/** A casting: the part and how it came out first (quick on a phone), the gating and sizes when wanted. */
export function CastingForm({
  initial = {},
  units,
  submitLabel,
  onSubmit,
  keepOpen,
  startExpanded,
  draftName,
  isNew,
}: Props) {
  const { draft, set, errors, setErrors, check, next, restored, discard, startOver } = useCastingDraft(
    initial,
    units,
    draftName,
  );
  const [more, setMore] = useState(!!startExpanded);
  const [busy, setBusy] = useState(false);
  const [failure, setFailure] = useState<string>();
  const [saved, setSaved] = useState<string>();
  const mm = unitLabel("length", units);
  const inches = takesInchFractions("length", units);

  async function submit() {
    const saveId = isNew ? (draft.saveId ?? newSaveId()) : undefined;
    if (saveId !== draft.saveId) set("saveId", saveId);
    const input = check(saveId);
    setSaved(undefined);
    setFailure(input ? undefined : "Some values need fixing: see the messages by the fields.");
    if (!input) return;
    setBusy(true);
    try {
      const answer = await onSubmit(input);
      await discard();
      if (keepOpen) {
        const what = `${input.partName}${input.outcome ? ` (${OUTCOME_LABELS[input.outcome]})` : ""}`;
        setSaved(
          isWaiting(answer)
            ? `Kept ${what} on this device: waiting to send. Ready for the next one.`
            : `Saved ${what}. Ready for the next one.`,
        );
        next();
      }
    } catch (e) {
      if (e instanceof ApiError && Object.keys(e.fields).length) setErrors(e.fieldsIn(units));
      setFailure(e instanceof Error ? e.message : String(e));
    } finally {
      setBusy(false);
    }
  }

  return (
    <View style={styles.form}>
      {restored ? <DraftRestored onStartOver={startOver} /> : null}
      <TextField
        label="Part"
        value={draft.partName}
        onChangeText={(v) => set("partName", v)}
        error={errors.partName}
        placeholder="e.g. bracket, pulley, plaque"
        onSubmitEditing={submit}
      />
      <OutcomeChips value={draft.outcome} onChange={(o) => set("outcome", o)} />
      <Pair>
        <NumberField
          label="Thinnest section"
          unit={mm}
          fractions={inches}
          value={draft.minSectionMm}
          onChangeText={(v) => set("minSectionMm", v)}
          error={errors.minSectionMm}
        />
        <NumberField
          label="Thickest section"
          unit={mm}
          fractions={inches}
          value={draft.maxSectionMm}
          onChangeText={(v) => set("maxSectionMm", v)}
          error={errors.maxSectionMm}
        />
      </Pair>
      {more ? (
        <CastingMore draft={draft} set={set} errors={errors} units={units} />
      ) : (
        <View style={styles.start}>
          <Button kind="plain" label="More details: weights, sprue, riser…" onPress={() => setMore(true)} />
        </View>
      )}
      {failure ? <Notice tone="error">{failure}</Notice> : null}
      {saved ? (
        <Text style={styles.saved} role="status">
          {saved}
        </Text>
      ) : null}
      <Button label={submitLabel} onPress={submit} busy={busy} testID="save-casting" />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.md },
  start: { alignSelf: "flex-start" },
  saved: { color: colors.steel, fontSize: fontSize.body, fontWeight: "600" },
});
