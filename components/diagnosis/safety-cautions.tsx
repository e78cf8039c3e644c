import { StyleSheet, Text } from "react-native";
import { Notice } from "@/components/ui/notice";
import { colors, fontSize } from "@/constants/theme";
import { useUnits } from "@/hooks/use-units";
import { textInUnits } from "@/lib/quantity-words";
import { GENERAL_CAUTIONS } from "@/rules/safety";

export function SafetyCautions() {
  const units = useUnits();
  return (
    <Notice tone="caution">
      {GENERAL_CAUTIONS.map((t) => textInUnits(t, units)).map((c) => (
        <Text key={c} style={styles.line}>
          • {c}
        </Text>
      ))}
      <Text style={styles.defer}>
        These are reminders, not a safety programme: follow local codes, the supplier's safety data sheets and trained
        practice.
      </Text>
    </Notice>
  );
}

const styles = StyleSheet.create({
  line: { fontSize: fontSize.detail, lineHeight: 21, color: colors.ink },
  defer: { fontSize: fontSize.detail, lineHeight: 21, color: colors.ink, fontStyle: "italic" },
});
