import { useEffect, useRef, useState } from "react";
import { Platform, StyleSheet, Text, View } from "react-native";
import { Button } from "@/components/ui/button";
import { ChoiceChips } from "@/components/ui/choice-chips";
import { DefectPicker } from "@/components/marks/defect-picker";
import { FieldError } from "@/components/ui/field-error";
import { Heading } from "@/components/ui/heading";
import { TextField } from "@/components/ui/text-field";
import { colors, fontSize, radius, space } from "@/constants/theme";
import { fieldErrors } from "@/lib/field-errors";
import { LOCATION_LABELS, SEVERITY_LABELS } from "@/lib/defects";
import { markFields, type Mark, type MarkDescription } from "@/lib/notebook-schemas";
import { DEFECT_LOCATIONS, type DefectLocation, type DefectType } from "@/rules/case";

const LOCATIONS = DEFECT_LOCATIONS.map((l) => ({ value: l, label: LOCATION_LABELS[l] }));
const SEVERITIES = ([1, 2, 3] as const).map((s) => ({ value: String(s), label: SEVERITY_LABELS[s] }));
const describe = markFields.pick({ type: true, location: true, severity: true, note: true });

type Props = {
  title: string;
  mark?: Mark;
  busy: boolean;
  failure?: string;
  onSave: (d: MarkDescription) => void;
  onCancel: () => void;
  /** Only for a saved mark on a photo. */
  onMove?: () => void;
  onRemove?: () => void;
};

/** What a mark is: the defect, where on the part, how bad, and a note. */
export function MarkEditor({ title, mark, busy, failure, onSave, onCancel, onMove, onRemove }: Props) {
  const [type, setType] = useState<DefectType | null>(mark?.type ?? null);
  const [location, setLocation] = useState<DefectLocation | null>(mark?.location ?? null);
  const [severity, setSeverity] = useState(mark?.severity ?? 2);
  const [note, setNote] = useState(mark?.note ?? "");
  const [errors, setErrors] = useState<Record<string, string>>({});
  // Removing takes a second tap: there is no undo.
  const [confirmRemove, setConfirmRemove] = useState(false);

  // Opened by a tap on the photo, the form starts below it, on a phone often past the screen's bottom
  // edge: bring its top into view (a form already in sight, as beside the photos on a wide screen, stays put).
  const box = useRef<View>(null);
  useEffect(() => {
    if (Platform.OS !== "web") return;
    const node = box.current as unknown as HTMLElement | null;
    if (!node?.getBoundingClientRect) return;
    const top = node.getBoundingClientRect().top;
    if (top < 0 || top > window.innerHeight * 0.6) {
      const still = window.matchMedia?.("(prefers-reduced-motion: reduce)").matches;
      node.scrollIntoView({ block: "start", behavior: still ? "auto" : "smooth" });
    }
  }, []);

  function save() {
    const parsed = describe.safeParse({ type, location, severity, note: note.trim() || null });
    const found = parsed.success ? {} : fieldErrors(parsed.error, { topLevel: true });
    if (!type) found.type = "choose what the defect is";
    if (!location) found.location = "choose where on the part it is";
    setErrors(found);
    if (parsed.success && !Object.keys(found).length) onSave(parsed.data as MarkDescription);
  }

  return (
    <View ref={box} style={styles.box} testID="mark-editor">
      <Heading level={3}>{title}</Heading>
      <DefectPicker value={type} onChange={setType} />
      <FieldError message={errors.type} />
      <ChoiceChips
        label="Where on the part"
        options={LOCATIONS}
        value={location}
        onChange={(l) => setLocation(l as DefectLocation)}
      />
      <FieldError message={errors.location} />
      <ChoiceChips
        label="How bad"
        options={SEVERITIES}
        value={String(severity)}
        onChange={(s) => setSeverity(Number(s))}
      />
      <TextField label="Note" value={note} onChangeText={setNote} error={errors.note} placeholder="optional" />
      {failure ? (
        <Text role="alert" style={styles.failure}>
          {failure}
        </Text>
      ) : null}
      <View style={styles.actions}>
        <Button label={mark ? "Save the mark" : "Add the mark"} onPress={save} busy={busy} testID="save-mark" />
        <Button kind="plain" label="Cancel" onPress={onCancel} />
        {onMove ? <Button kind="plain" label="Move on the photo" onPress={onMove} /> : null}
        {onRemove ? (
          <Button
            kind="plain"
            label={confirmRemove ? "Tap again to remove" : "Remove"}
            onPress={() => (confirmRemove ? onRemove() : setConfirmRemove(true))}
          />
        ) : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    gap: space.md,
    padding: space.md,
    borderWidth: 1,
    borderColor: colors.steel,
    borderRadius: radius.md,
    backgroundColor: colors.surface,
  },
  actions: { flexDirection: "row", flexWrap: "wrap", gap: space.sm },
  failure: { color: colors.danger, fontSize: fontSize.detail },
});
