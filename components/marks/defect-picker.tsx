import { StyleSheet, Text, View } from "react-native";
import { ChoiceChips } from "@/components/ui/choice-chips";
import { colors, fontSize, radius, space } from "@/constants/theme";
import { DEFECT_CLASSES, DEFECTS, type DefectClass } from "@/lib/defects";
import { DEFECT_TYPES, type DefectType } from "@/rules/case";

/** Defect types grouped by their class in the international atlas, A to G. */
const GROUPS = (Object.keys(DEFECT_CLASSES) as DefectClass[])
  .map((c) => ({ c, types: DEFECT_TYPES.filter((t) => DEFECTS[t].defectClass === c) }))
  .filter((g) => g.types.length);

/** Pick what the defect is; the chosen one's plain description shows under the list to confirm it. */
export function DefectPicker({ value, onChange }: { value: DefectType | null; onChange: (t: DefectType) => void }) {
  const info = value ? DEFECTS[value] : null;
  return (
    <View style={styles.wrap}>
      {GROUPS.map((g) => (
        <ChoiceChips
          key={g.c}
          label={`${g.c} · ${DEFECT_CLASSES[g.c]}`}
          value={value}
          options={g.types.map((t) => ({ value: t, label: DEFECTS[t].label }))}
          onChange={(t) => onChange(t as DefectType)}
        />
      ))}
      <View style={styles.about} aria-live="polite">
        {info ? (
          <>
            <Text style={styles.name}>
              {info.label} · class {info.defectClass}, {DEFECT_CLASSES[info.defectClass]}
            </Text>
            <Text style={styles.text}>{info.description}</Text>
          </>
        ) : (
          <Text style={styles.text}>Choose what you see; its description shows here.</Text>
        )}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  about: { backgroundColor: colors.background, borderRadius: radius.sm, padding: space.md, gap: 2 },
  name: { fontSize: fontSize.body, fontWeight: "700", color: colors.ink },
  text: { fontSize: fontSize.detail, lineHeight: 20, color: colors.ink },
});
