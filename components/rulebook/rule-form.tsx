import type { ReactNode } from "react";
import { StyleSheet, View } from "react-native";
import { Button } from "@/components/ui/button";
import { ChoiceChips } from "@/components/ui/choice-chips";
import { FieldError } from "@/components/ui/field-error";
import { Heading } from "@/components/ui/heading";
import { Notice } from "@/components/ui/notice";
import { RuleCausePicker } from "@/components/rulebook/rule-cause-picker";
import { RuleConditionRow } from "@/components/rulebook/rule-condition-row";
import { MultiChips } from "@/components/rulebook/rule-multi-chips";
import { RuleReasonField } from "@/components/rulebook/rule-reason-field";
import { RuleTrial } from "@/components/rulebook/rule-trial";
import { TextField } from "@/components/ui/text-field";
import { card, space } from "@/constants/theme";
import { useSaveRule, useTryRule } from "@/hooks/use-rulebook";
import { useRuleDraft, type RuleFormState } from "@/hooks/use-rule-draft";
import { ApiError } from "@/lib/api";
import { DEFECTS, LOCATION_LABELS } from "@/lib/defects";
import type { CauseOption, SavedRule } from "@/lib/rulebook-schemas";
import type { Units } from "@/lib/units";
import { DEFECT_LOCATIONS, DEFECT_TYPES } from "@/rules/case";

const DEFECT_CHOICES = DEFECT_TYPES.map((t) => ({ value: t, label: DEFECTS[t].label }));
const LOCATION_CHOICES = DEFECT_LOCATIONS.filter((l) => l !== "throughout").map((l) => ({
  value: l,
  label: LOCATION_LABELS[l],
}));
/** How strongly the conditions point at the cause, in words; the number is what the ranking multiplies. */
const WEIGHTS = [
  { value: "0.2", label: "a hint (0.2)" },
  { value: "0.4", label: "some evidence (0.4)" },
  { value: "0.6", label: "good evidence (0.6)" },
  { value: "0.8", label: "strong evidence (0.8)" },
  { value: "0.95", label: "nearly certain (0.95)" },
];
const EFFECTS = [
  { value: "supports", label: "points to the cause" },
  { value: "weakens", label: "speaks against it" },
];

type Props = {
  initial: RuleFormState;
  ruleId?: string;
  causes: CauseOption[];
  units: Units;
  onSaved: (rule: SavedRule) => void;
};

/** The rule form: no JSON anywhere; checked as it is filled in, tried on past cases, saved as a draft. */
export function RuleForm({ initial, ruleId, causes, units, onSaved }: Props) {
  const f = useRuleDraft(initial, units);
  const save = useSaveRule(ruleId);
  const trial = useTryRule();
  const s = f.state;
  const e = f.errors;
  const weights =
    s.weight !== null && !WEIGHTS.some((w) => Number(w.value) === s.weight)
      ? [...WEIGHTS, { value: String(s.weight), label: String(s.weight) }]
      : WEIGHTS;
  const rowErrors = (i: number) => ({
    fact: e[`conditions.${i}.fact`],
    comparison: e[`conditions.${i}.comparison`],
    value: e[`conditions.${i}.value`] ?? e[`conditions.${i}.value.0`],
  });
  const fromServer = (err: unknown) => f.reveal(err instanceof ApiError ? err.fields : {});

  const onSave = () => {
    f.reveal();
    if (f.valid) save.mutate(f.draft, { onSuccess: onSaved, onError: fromServer });
  };
  const onTry = () => {
    f.reveal();
    if (f.valid) trial.mutate({ draft: f.draft, ruleId }, { onError: fromServer });
  };

  return (
    <View style={styles.form}>
      <Section title="What it explains">
        <MultiChips
          label="Defects"
          options={DEFECT_CHOICES}
          values={s.defectTypes}
          onChange={(v) => f.set("defectTypes", v as never)}
        />
        <FieldError message={e.defectTypes} />
        <MultiChips
          label="Where on the part"
          hint="Leave all off for anywhere."
          options={LOCATION_CHOICES}
          values={s.locations}
          onChange={(v) => f.set("locations", v as never)}
        />
      </Section>
      <Section title="When all of these hold">
        {s.rows.map((r, i) => (
          <RuleConditionRow
            key={r.key}
            index={i}
            row={r}
            units={units}
            errors={rowErrors(i)}
            onChange={(patch) => f.setRow(r.key, patch)}
            onRemove={s.rows.length > 1 ? () => f.removeRow(r.key) : undefined}
          />
        ))}
        <FieldError message={e.conditions} />
        {f.impossible.map((c) => (
          <Notice
            key={c.message}
            tone="caution"
          >{`These can never all be true, so the rule would never fire: ${c.message}.`}</Notice>
        ))}
        <Button kind="plain" label="Add a condition" onPress={f.addRow} />
      </Section>
      <Section title="What it points to">
        <ChoiceChips
          label="The conditions"
          options={EFFECTS}
          value={s.effect}
          onChange={(v) => f.set("effect", v as "supports" | "weakens")}
        />
        <RuleCausePicker state={s} causes={causes} errors={e} set={f.set} />
        <ChoiceChips
          label="How strong the evidence is"
          options={weights}
          value={s.weight === null ? null : String(s.weight)}
          onChange={(v) => f.set("weight", Number(v))}
        />
        <FieldError message={e.weight} />
      </Section>
      <Section title="Why, and where it comes from">
        <RuleReasonField
          value={s.because}
          onChange={(t) => f.set("because", t)}
          error={e.because}
          ruleFacts={s.rows.map((r) => r.fact)}
          against={s.effect === "weakens"}
          units={units}
        />
        <MultiChips
          label="Source"
          options={[{ value: "shop", label: "shop experience" }]}
          values={s.shopExperience ? ["shop"] : []}
          onChange={(v) => f.set("shopExperience", v.length > 0)}
        />
        <TextField
          label="Books, papers or standards, one per line"
          value={s.otherSources}
          onChangeText={(t) => f.set("otherSources", t)}
          multiline
          numberOfLines={2}
          style={styles.multi}
          error={e.sources ?? e["sources.0"]}
        />
      </Section>
      {save.error && !(save.error instanceof ApiError && Object.keys(save.error.fields).length) ? (
        <Notice tone="error">{save.error.message}</Notice>
      ) : null}
      {Object.keys(e).length && (save.isError || trial.isError) ? (
        <Notice tone="error">Some values need fixing: see the messages above.</Notice>
      ) : null}
      <View style={styles.buttons}>
        <Button kind="plain" label="Try on past cases" onPress={onTry} busy={trial.isPending} testID="try-rule" />
        <Button label="Save as draft" onPress={onSave} busy={save.isPending} testID="save-rule" />
      </View>
      {trial.error && !(trial.error instanceof ApiError && trial.error.status === 400) ? (
        <Notice tone="error">{trial.error.message}</Notice>
      ) : null}
      {trial.data ? <RuleTrial trial={trial.data} /> : null}
    </View>
  );
}

function Section({ title, children }: { title: string; children: ReactNode }) {
  return (
    <View style={styles.section}>
      <Heading level={3}>{title}</Heading>
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  section: { ...card, gap: space.md, padding: space.md },
  multi: { minHeight: 64, paddingVertical: space.sm, textAlignVertical: "top" },
  buttons: { flexDirection: "row", flexWrap: "wrap", gap: space.md, justifyContent: "flex-end" },
});
