import { StyleSheet, Text, View } from "react-native";
import { Notice } from "@/components/ui/notice";
import { colors, fontSize, space } from "@/constants/theme";
import { useWaitingSaves } from "@/hooks/use-offline-saves";
import { formatDay } from "@/lib/dates";
import type { MeltInput } from "@/lib/notebook-schemas";

/** New melts saved without a connection: kept on this device and sent when it is back. */
export function WaitingMelts() {
  const waiting = useWaitingSaves<MeltInput>("melt");
  if (!waiting.length) return null;
  return (
    <View testID="waiting-melts" role="status">
      <Notice tone="caution">
        <Text style={styles.title}>
          {waiting.length === 1 ? "1 melt is" : `${waiting.length} melts are`} waiting to send
        </Text>
        {waiting.map((m, i) => (
          <Text key={m.idempotencyKey ?? i} style={styles.text}>
            • {m.alloy} melt of {formatDay(m.pouredOn)}
          </Text>
        ))}
        <Text style={styles.text}>
          Saved on this device. It goes to the shop as soon as the connection is back; keep this page or come back
          later.
        </Text>
      </Notice>
    </View>
  );
}

const styles = StyleSheet.create({
  title: { fontSize: fontSize.body, fontWeight: "600", color: colors.ink, paddingBottom: space.xs },
  text: { fontSize: fontSize.body, lineHeight: 22, color: colors.ink },
});
