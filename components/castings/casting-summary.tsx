import { useEffect, useState } from "react";
import { Pressable, StyleSheet, Text, View } from "react-native";
import { Button } from "@/components/ui/button";
import { CastingFacts } from "@/components/castings/casting-facts";
import { CastingForm } from "@/components/castings/casting-form";
import { Heading } from "@/components/ui/heading";
import { Notice } from "@/components/ui/notice";
import { StaleEditNotice } from "@/components/ui/stale-edit-notice";
import { OutcomeChips } from "@/components/castings/outcome-chips";
import { colors, fontSize, space } from "@/constants/theme";
import { useUpdateCasting } from "@/hooks/use-castings";
import { useFocusField } from "@/hooks/use-focus-field";
import { usePrinting } from "@/hooks/use-printing";
import { useStaleEdit } from "@/hooks/use-stale-edit";
import { castingConditionRows, changedRows } from "@/lib/condition-rows";
import { fieldOfFact } from "@/lib/fact-fields";
import { sectionId } from "@/lib/page-sections";
import { PROCESS_LABELS } from "@/lib/labels";
import type { Casting, CastingDetail, CastingInput } from "@/lib/notebook-schemas";
import { formatValue, type Units } from "@/lib/units";

/** The casting's own record: how it came out (one tap to change), its melt in a line, its sizes. */
export function CastingSummary({
  casting,
  units,
  mayEdit,
  editField,
  folds,
}: {
  casting: CastingDetail;
  units: Units;
  mayEdit: boolean;
  /** On a phone the sizes, gating and weights fold under one line, so the causes come sooner. */
  folds?: boolean;
  /** A diagnosis input to fill in: the form opens with that field in view. */
  editField?: string;
}) {
  const update = useUpdateCasting(casting.id);
  const field = editField ? fieldOfFact(editField) : undefined;
  const opens = mayEdit && field?.form === "casting";
  const [editing, setEditing] = useState(opens);
  // The version the form opened at (If-Match); taking theirs opens the form again at their version.
  const stale = useStaleEdit<Casting, Partial<CastingInput>>(update.mutateAsync, casting);
  const { conflict, formKey } = stale;
  const opened = stale.opened ?? casting;
  const startEditing = () => {
    stale.setOpened(casting);
    setEditing(true);
  };
  const done = (saved: boolean) => {
    if (saved) setEditing(false);
  };
  // The link is followed on this same page: open the form when it names a field.
  useEffect(() => {
    if (opens) startEditing();
  }, [opens, editField]);
  useFocusField(editing ? field?.labels : undefined, editing);
  const [showDetails, setShowDetails] = useState(false);
  const printing = usePrinting();
  const detailsOpen = !folds || showDetails || printing;
  const recorded = castingConditionRows(casting, units).filter((r) => r.value !== null).length;
  const m = casting.melt;
  return (
    <View style={styles.wrap} nativeID={sectionId("details")}>
      <Heading>{casting.partName}</Heading>
      <Text style={styles.melt}>
        {m.alloy} · {PROCESS_LABELS[m.process]} · poured at {formatValue("temperature", m.pourTempC, units)}
      </Text>
      <OutcomeChips
        value={casting.outcome}
        onChange={(outcome) => update.mutate({ input: { outcome } })}
        disabled={!mayEdit || update.isPending}
      />
      {update.error && !conflict ? <Notice tone="error">{update.error.message}</Notice> : null}
      {editing && conflict ? (
        <StaleEditNotice
          rows={changedRows(
            withNotes({ ...conflict.theirs, ...conflict.mine } as Casting, units),
            withNotes(conflict.theirs, units),
          )}
          busy={update.isPending}
          onKeepMine={() => void stale.keepMine().then(done)}
          onTakeTheirs={stale.takeTheirs}
        />
      ) : null}
      {editing ? (
        <CastingForm
          key={formKey}
          initial={opened}
          units={units}
          startExpanded
          submitLabel="Save changes"
          draftName={`casting:${casting.id}`}
          onSubmit={(input) => stale.save(input, opened.version).then(done)}
        />
      ) : (
        <>
          {folds ? (
            <Pressable role="button" aria-expanded={detailsOpen} onPress={() => setShowDetails((v) => !v)}>
              <Text style={styles.toggle}>
                {detailsOpen
                  ? "▾ Hide sizes, gating and weights"
                  : `▸ Sizes, gating and weights (${recorded} recorded)`}
              </Text>
            </Pressable>
          ) : null}
          {detailsOpen ? <CastingFacts casting={casting} units={units} /> : null}
          {casting.notes ? <Notice>{casting.notes}</Notice> : null}
          {mayEdit ? (
            <View style={styles.start}>
              <Button kind="plain" label="Change sizes and details" onPress={startEditing} />
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

/** The casting's details in the person's units, and its name and notes, for comparing two versions. */
function withNotes(c: Casting, units: Units) {
  return [{ label: "Part", value: c.partName }, ...castingConditionRows(c, units), { label: "Notes", value: c.notes }];
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  melt: { fontSize: fontSize.body, color: colors.muted },
  start: { alignSelf: "flex-start" },
  toggle: { fontSize: fontSize.body, color: colors.steel, fontWeight: "600", paddingVertical: space.xs },
});
