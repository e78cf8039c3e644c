import { StyleSheet, Text, View } from "react-native";
import { Notice } from "@/components/ui/notice";
import { colors, fontSize, space } from "@/constants/theme";
import { useWaitingSaves } from "@/hooks/use-offline-saves";
import { formatDay } from "@/lib/dates";

type Waiting = { key: string; line: string };

/**
 * Saves made without a connection: kept on this device and sent once it is back. One shape for every
 * kind of save, so the melts list and a melt's castings say it the same way.
 */
function WaitingToSend(props: { testID: string; one: string; many: string; items: Waiting[]; after: string }) {
  const { items } = props;
  if (!items.length) return null;
  return (
    <View testID={props.testID} role="status">
      <Notice tone="caution">
        <Text style={styles.title}>
          {items.length === 1 ? `1 ${props.one} is` : `${items.length} ${props.many} are`} waiting to send
        </Text>
        {items.map((w) => (
          <Text key={w.key} style={styles.text}>
            • {w.line}
          </Text>
        ))}
        <Text style={styles.text}>{props.after}</Text>
      </Notice>
    </View>
  );
}

/** New melts saved offline (the melts list). */
export function WaitingMelts() {
  const items = useWaitingSaves("melt").map((m, i) => ({
    key: m.idempotencyKey ?? String(i),
    line: `${m.alloy} melt of ${formatDay(m.pouredOn)}`,
  }));
  return (
    <WaitingToSend
      testID="waiting-melts"
      one="melt"
      many="melts"
      items={items}
      after="Saved on this device. It goes to the shop as soon as the connection is back; keep this page or come back later."
    />
  );
}

/** New castings of one melt saved offline (the melt's page). */
export function WaitingCastings({ meltId }: { meltId: number }) {
  const items = useWaitingSaves("casting")
    .filter((c) => c.meltId === meltId)
    .map((c, i) => ({ key: c.input.idempotencyKey ?? String(i), line: c.input.partName }));
  return (
    <WaitingToSend
      testID="waiting-castings"
      one="casting"
      many="castings"
      items={items}
      after="Saved on this device; sent as soon as the connection is back."
    />
  );
}

const styles = StyleSheet.create({
  title: { fontSize: fontSize.body, fontWeight: "600", color: colors.ink, paddingBottom: space.xs },
  text: { fontSize: fontSize.body, lineHeight: 22, color: colors.ink },
});
