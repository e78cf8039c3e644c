import { useState, type ReactNode } from "react";
import { StyleSheet, View } from "react-native";
import { Button } from "@/components/ui/button";
import { ChoiceChips } from "@/components/ui/choice-chips";
import { DateField } from "@/components/ui/date-field";
import { FieldError } from "@/components/ui/field-error";
import { CleaningSection, DaySection, MetalSection, MouldSection } from "@/components/melts/melt-form-sections";
import { Notice } from "@/components/ui/notice";
import { SafetyCautions } from "@/components/diagnosis/safety-cautions";
import { TextField } from "@/components/ui/text-field";
import { space } from "@/constants/theme";
import { ConditionGroups } from "@/components/conditions/condition-groups";
import { meltContext, useMeltDraft } from "@/hooks/use-melt-draft";
import { MELT_CONDITIONS } from "@/lib/condition-fields";
import { DraftRestored } from "@/components/ui/draft-restored";
import { newSaveId } from "@/lib/save-id";
import { useAlloys } from "@/hooks/use-melts";
import { ApiError } from "@/lib/api";
import { PROCESS_LABELS } from "@/lib/labels";
import type { MeltInput } from "@/lib/notebook-schemas";
import type { Units } from "@/lib/units";
import { PROCESSES, type Process } from "@/rules/case";

const PROCESS_CHOICES = PROCESSES.map((p) => ({ value: p, label: PROCESS_LABELS[p] }));

type Props = {
  initial: { [K in keyof MeltInput]?: MeltInput[K] | null };
  units: Units;
  submitLabel: string;
  onSubmit: (input: MeltInput) => Promise<unknown>;
  /** Where the draft is kept on the device ("melt:new", "melt:12"). */
  draftName: string;
  /** Open the folded conditions: the form was opened to fill one of them in. */
  openConditions?: boolean;
  /** A new melt's save carries an idempotency key, so sending it twice makes one melt. */
  isNew?: boolean;
  /** Shown just above the save button, where the person's eyes are after pressing it (a refused save's choices). */
  beforeSave?: ReactNode;
};

/** Every condition of a melt, checked here with the API's own schema before anything is sent. */
export function MeltForm({
  initial,
  units,
  submitLabel,
  onSubmit,
  draftName,
  isNew,
  openConditions,
  beforeSave,
}: Props) {
  const alloys = useAlloys();
  const { draft, set, errors, setErrors, check, restored, discard, startOver } = useMeltDraft(
    initial,
    units,
    draftName,
  );
  const [busy, setBusy] = useState(false);
  const [failure, setFailure] = useState<string>();
  const sectionProps = { draft, set, errors, units };

  async function submit() {
    const saveId = isNew ? (draft.saveId ?? newSaveId()) : undefined;
    if (saveId !== draft.saveId) set("saveId", saveId);
    const { input, errors: found } = check(alloys.data ?? [], saveId);
    // A message about the melt as a whole (nothing recorded) says itself; field messages sit by their fields.
    setFailure(input ? undefined : (found._ ?? "Some values need fixing: see the messages by the fields."));
    if (!input) return;
    setBusy(true);
    try {
      await onSubmit(input);
      await discard();
    } catch (e) {
      // The server checks again (the alloy table may have changed): its field messages land by the fields.
      if (e instanceof ApiError && Object.keys(e.fields).length) setErrors(e.fieldsIn(units));
      // (The server words a whole-melt refusal as its message, so the notice below says it.)
      setFailure(e instanceof Error ? e.message : String(e));
    } finally {
      setBusy(false);
    }
  }

  const alloyChoices = (alloys.data ?? []).map((a) => ({ value: a.designation, label: a.designation }));
  return (
    <View style={styles.form}>
      {restored ? <DraftRestored onStartOver={startOver} /> : null}
      <DateField
        label="Poured on"
        value={draft.pouredOn}
        onChange={(v) => set("pouredOn", v)}
        error={errors.pouredOn}
        testID="poured-on"
      />
      {alloys.error ? <Notice tone="error">{alloys.error.message}</Notice> : null}
      <ChoiceChips label="Alloy" options={alloyChoices} value={draft.alloy} onChange={(v) => set("alloy", v)} />
      <FieldError message={errors.alloy} />
      <ChoiceChips
        label="Process"
        options={PROCESS_CHOICES}
        value={draft.process}
        onChange={(v) => set("process", v as Process)}
      />
      <FieldError message={errors.process} />
      <MetalSection {...sectionProps} />
      <CleaningSection {...sectionProps} />
      <DaySection {...sectionProps} />
      <MouldSection {...sectionProps} />
      <ConditionGroups
        groups={MELT_CONDITIONS}
        draft={draft.conditions}
        onChange={(v) => set("conditions", v)}
        errors={errors}
        context={meltContext(draft, alloys.data ?? [])}
        units={units}
        summary="treatment, sand, mould"
        startOpen={openConditions}
      />
      <TextField
        label="Notes"
        value={draft.notes}
        onChangeText={(v) => set("notes", v)}
        error={errors.notes}
        multiline
        style={styles.notes}
        placeholder="Anything else about this melt"
      />
      <SafetyCautions />
      {failure ? <Notice tone="error">{failure}</Notice> : null}
      {beforeSave}
      <Button label={submitLabel} onPress={submit} busy={busy} testID="save-melt" />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  notes: { minHeight: 88, paddingTop: space.sm, textAlignVertical: "top" },
});
