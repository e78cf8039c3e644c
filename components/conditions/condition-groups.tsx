import { useState } from "react";
import { StyleSheet, Text, View } from "react-native";
import { Button } from "@/components/ui/button";
import { ChoiceChips } from "@/components/ui/choice-chips";
import { FieldError } from "@/components/ui/field-error";
import { Heading } from "@/components/ui/heading";
import { NumberField } from "@/components/ui/number-field";
import { TextField } from "@/components/ui/text-field";
import { YesNoChips } from "@/components/ui/yes-no-chips";
import { colors, fontSize, space } from "@/constants/theme";
import type { ConditionContext, ConditionField, ConditionGroup } from "@/lib/condition-fields";
import type { ConditionDraft } from "@/lib/condition-drafts";
import { unitLabel, type Units } from "@/lib/units";

type Props = {
  groups: ConditionGroup[];
  draft: ConditionDraft;
  onChange: (next: ConditionDraft) => void;
  errors: Record<string, string>;
  context: ConditionContext;
  units: Units;
  /** What the closed section says it holds ("treatment, sand, mould"); without it the groups show open. */
  summary?: string;
  /** Open from the start (the form was opened to fill one of these in). */
  startOpen?: boolean;
};

const isSet = (v: string | boolean | undefined) => v !== undefined && v !== "";

/**
 * The conditions beyond the everyday ones, folded away until wanted: a caster fills in what was measured,
 * and each one logged sharpens the diagnosis. It opens by itself when a value is there or one is wrong.
 */
export function ConditionGroups({ groups, draft, onChange, errors, context, units, summary, startOpen }: Props) {
  const shown = groups
    .map((g) => ({ ...g, fields: g.fields.filter((f) => f.shows(context)) }))
    .filter((g) => g.fields.length > 0);
  const keys = shown.flatMap((g) => g.fields.map((f) => f.key));
  const filled = keys.filter((k) => isSet(draft[k])).length;
  const [open, setOpen] = useState(filled > 0 || summary === undefined || !!startOpen);
  const wrong = keys.some((k) => errors[k]);
  if (shown.length === 0) return null;
  if (!open && !wrong)
    return (
      <View style={styles.closed}>
        <Button
          kind="plain"
          label={`More conditions: ${summary}${filled ? ` (${filled} logged)` : ""}`}
          onPress={() => setOpen(true)}
        />
        <Text style={styles.hint}>Each one you log sharpens the diagnosis; leave empty what you did not measure.</Text>
      </View>
    );
  const set = (key: string, v: string | boolean | undefined) => onChange({ ...draft, [key]: v });
  return (
    <>
      {shown.map((g) => (
        <View key={g.heading} style={styles.group}>
          <Heading level={3}>{g.heading}</Heading>
          {g.fields.map((f) => (
            <ConditionInput key={f.key} field={f} value={draft[f.key]} set={set} error={errors[f.key]} units={units} />
          ))}
        </View>
      ))}
    </>
  );
}

function ConditionInput({
  field: f,
  value,
  set,
  error,
  units,
}: {
  field: ConditionField;
  value: string | boolean | undefined;
  set: (key: string, v: string | boolean | undefined) => void;
  error?: string;
  units: Units;
}) {
  if (f.kind === "number")
    return (
      <NumberField
        label={f.label}
        unit={f.quantity ? unitLabel(f.quantity, units) : f.unit}
        value={typeof value === "string" ? value : ""}
        onChangeText={(v) => set(f.key, v)}
        error={error}
        whole={f.whole}
      />
    );
  if (f.kind === "text")
    return (
      <TextField
        label={f.label}
        value={typeof value === "string" ? value : ""}
        onChangeText={(v) => set(f.key, v)}
        error={error}
        placeholder={f.placeholder}
      />
    );
  if (f.kind === "yes-no")
    return (
      <>
        <YesNoChips
          label={f.label}
          value={typeof value === "boolean" ? value : undefined}
          onChange={(v) => set(f.key, v)}
        />
        <FieldError message={error} />
      </>
    );
  return (
    <>
      <ChoiceChips
        label={f.label}
        options={[...f.options, { value: "", label: "not noted" }]}
        value={typeof value === "string" ? value : ""}
        onChange={(v) => set(f.key, v)}
      />
      <FieldError message={error} />
    </>
  );
}

const styles = StyleSheet.create({
  closed: { gap: space.xs },
  hint: { fontSize: fontSize.detail, color: colors.muted },
  group: { gap: space.lg },
});
