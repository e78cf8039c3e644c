import { StyleSheet, Text } from "react-native";
import { colors, fontSize } from "@/constants/theme";
import { recordWords } from "@/lib/review-schemas";
import type { CauseRecord, RuleRecord } from "@/lib/rulebook-schemas";

/** A rule's record among this shop's confirmed cases: "right in 7 of 9 confirmed cases here". */
export function RuleRecordLine({ record }: { record: RuleRecord | null }) {
  return (
    <Text style={styles.text}>
      {record ? recordWords({ confirmed: record.fired, right: record.agreed }) : "no confirmed case here yet"}
    </Text>
  );
}

/**
 * A ranked cause's record here, for a diagnosis view: mount it in a cause card with the cause from
 * the diagnosis result (server/diagnosis adds `record`). Shows nothing before the first confirmed case.
 */
export function CauseRecordLine({ cause }: { cause: { record?: CauseRecord | null } }) {
  const words = recordWords(cause.record);
  return words ? (
    <Text style={styles.text} testID="cause-record">
      {words[0].toUpperCase() + words.slice(1)}
    </Text>
  ) : null;
}

const styles = StyleSheet.create({ text: { fontSize: fontSize.small, color: colors.steel, fontWeight: "600" } });
