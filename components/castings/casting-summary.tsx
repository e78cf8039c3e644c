import { useEffect, useState } from "react";
import { StyleSheet, Text, View } from "react-native";
import { Button } from "@/components/ui/button";
import { CastingFacts } from "@/components/castings/casting-facts";
import { CastingForm } from "@/components/castings/casting-form";
import { Heading } from "@/components/ui/heading";
import { Notice } from "@/components/ui/notice";
import { OutcomeChips } from "@/components/castings/outcome-chips";
import { colors, fontSize, space } from "@/constants/theme";
import { useUpdateCasting } from "@/hooks/use-castings";
import { useFocusField } from "@/hooks/use-focus-field";
import { fieldOfFact } from "@/lib/fact-fields";
import { PROCESS_LABELS } from "@/lib/labels";
import type { CastingDetail } from "@/lib/notebook-schemas";
import { formatValue, type Units } from "@/lib/units";

/** The casting's own record: how it came out (one tap to change), its melt in a line, its sizes. */
export function CastingSummary({
  casting,
  units,
  mayEdit,
  editField,
}: {
  casting: CastingDetail;
  units: Units;
  mayEdit: boolean;
  /** A diagnosis input to fill in: the form opens with that field in view. */
  editField?: string;
}) {
  const update = useUpdateCasting(casting.id);
  const field = editField ? fieldOfFact(editField) : undefined;
  const opens = mayEdit && field?.form === "casting";
  const [editing, setEditing] = useState(opens);
  // The link is followed on this same page: open the form when it names a field.
  useEffect(() => {
    if (opens) setEditing(true);
  }, [opens, editField]);
  useFocusField(editing ? field?.labels : undefined, editing);
  const m = casting.melt;
  return (
    <View style={styles.wrap}>
      <Heading>{casting.partName}</Heading>
      <Text style={styles.melt}>
        {m.alloy} · {PROCESS_LABELS[m.process]} · poured at {formatValue("temperature", m.pourTempC, units)}
      </Text>
      <OutcomeChips
        value={casting.outcome}
        onChange={(outcome) => update.mutate({ outcome })}
        disabled={!mayEdit || update.isPending}
      />
      {update.error ? <Notice tone="error">{update.error.message}</Notice> : null}
      {editing ? (
        <CastingForm
          initial={casting}
          units={units}
          startExpanded
          submitLabel="Save changes"
          draftName={`casting:${casting.id}`}
          onSubmit={async (input) => {
            await update.mutateAsync(input);
            setEditing(false);
          }}
        />
      ) : (
        <>
          <CastingFacts casting={casting} units={units} />
          {casting.notes ? <Notice>{casting.notes}</Notice> : null}
          {mayEdit ? (
            <View style={styles.start}>
              <Button kind="plain" label="Change sizes and details" onPress={() => setEditing(true)} />
            </View>
          ) : null}
        </>
      )}
      {editing ? (
        <View style={styles.start}>
          <Button kind="plain" label="Cancel" onPress={() => setEditing(false)} />
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  melt: { fontSize: fontSize.body, color: colors.muted },
  start: { alignSelf: "flex-start" },
});
