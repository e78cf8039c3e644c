import { StyleSheet, Text, View } from "react-native";
import { colors, fontSize, radius, space } from "@/constants/theme";
import { DEFECTS, LOCATION_LABELS } from "@/lib/defects";
import { formatMoment } from "@/lib/dates";
import type { CauseOption, RuleVersion } from "@/lib/rulebook-schemas";
import { unitsFormat } from "@/lib/rule-units";
import type { Units } from "@/lib/units";
import type { DefectLocation, DefectType } from "@/rules/case";
import { ruleChanges } from "@/rules/rule-diff";

/** Every version of a shop rule, newest first, each with who, when and what changed from the one before. */
export function RuleVersions({
  versions,
  causes,
  units,
}: {
  versions: RuleVersion[];
  causes: CauseOption[];
  units: Units;
}) {
  const words = {
    fmt: unitsFormat(units),
    causeTitle: (id: string) => causes.find((c) => c.id === id)?.title ?? id,
    defectLabel: (t: string) => DEFECTS[t as DefectType]?.label.toLowerCase() ?? t,
    locationLabel: (l: string) => LOCATION_LABELS[l as DefectLocation] ?? l,
  };
  return (
    <View style={styles.list}>
      {versions.map((v, i) => (
        <View key={v.version} style={styles.item} testID={`version-${v.version}`}>
          <Text style={styles.head}>
            Version {v.version} · {v.status} · {v.createdBy?.name ?? "someone"}, {formatMoment(v.createdAt)}
          </Text>
          {ruleChanges(versions[i + 1] ?? null, v, words).map((line) => (
            <Text key={line} style={styles.change}>
              • {line}
            </Text>
          ))}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  item: {
    gap: 2,
    padding: space.sm,
    borderRadius: radius.sm,
    borderLeftWidth: 3,
    borderLeftColor: colors.steel,
    backgroundColor: colors.surface,
  },
  head: { fontSize: fontSize.detail, fontWeight: "700", color: colors.ink },
  change: { fontSize: fontSize.detail, lineHeight: 20, color: colors.ink },
});
