import { StyleSheet, Text, View } from "react-native";
import { Notice } from "@/components/ui/notice";
import { colors, fontSize, space } from "@/constants/theme";
import { useWaitingSaves, type CastingSave } from "@/hooks/use-offline-saves";

/** New castings of this melt saved without a connection: kept on this device and sent when it is back. */
export function WaitingCastings({ meltId }: { meltId: number }) {
  const waiting = useWaitingSaves<CastingSave>("casting").filter((c) => c.meltId === meltId);
  if (!waiting.length) return null;
  return (
    <View testID="waiting-castings" role="status">
      <Notice tone="caution">
        <Text style={styles.title}>
          {waiting.length === 1 ? "1 casting is" : `${waiting.length} castings are`} waiting to send
        </Text>
        {waiting.map((c, i) => (
          <Text key={c.input.idempotencyKey ?? i} style={styles.text}>
            • {c.input.partName}
          </Text>
        ))}
        <Text style={styles.text}>Saved on this device; sent as soon as the connection is back.</Text>
      </Notice>
    </View>
  );
}

const styles = StyleSheet.create({
  title: { fontSize: fontSize.body, fontWeight: "600", color: colors.ink, paddingBottom: space.xs },
  text: { fontSize: fontSize.body, lineHeight: 22, color: colors.ink },
});
