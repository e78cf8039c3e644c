import { StyleSheet, Text, View } from "react-native";
import { colors, fontSize, space } from "@/constants/theme";
import { SEVERITY_LABELS } from "@/lib/defects";

/** The numbered disc; each step of severity adds a ring around it, so it reads without colour. */
export const PIN_DISC_PX = 26;
const RING_PX = 4;
const severityOf = (s: number) => Math.min(3, Math.max(1, Math.round(s))) as 1 | 2 | 3;
/** The pin's whole width, rings included: the photo centres it on the marked spot. */
export const pinSizePx = (severity: number) => PIN_DISC_PX + 2 * RING_PX * (severityOf(severity) - 1);
export const severityWord = (severity: number) => SEVERITY_LABELS[severityOf(severity)];

/** A mark's number in a disc with one ring for slight, two for clear, three for severe. */
export function SeverityPin({ label, severity, on = false }: { label: string; severity: number; on?: boolean }) {
  const rings = severityOf(severity) - 1;
  const fill = on ? colors.steel : colors.accent;
  let pin = (
    <View style={[styles.disc, { backgroundColor: fill }]}>
      <Text style={styles.number}>{label}</Text>
    </View>
  );
  // Rings alternate white and the pin's colour outward, so each shows against a dark or light photo.
  for (let i = 0; i < rings; i++)
    pin = (
      <View style={[styles.ring, { borderColor: i % 2 === 0 ? "#FFFFFF" : fill, backgroundColor: fill }]}>{pin}</View>
    );
  return pin;
}

/** What the rings mean, under a photo that has pins. */
export function SeverityLegend() {
  return (
    <View style={styles.legend} aria-label="Pins: one ring slight, two rings clear, three rings severe">
      {([1, 2, 3] as const).map((s) => (
        <View key={s} style={styles.entry} aria-hidden>
          <SeverityPin label="" severity={s} />
          <Text style={styles.word}>{SEVERITY_LABELS[s]}</Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  disc: {
    width: PIN_DISC_PX,
    height: PIN_DISC_PX,
    borderRadius: PIN_DISC_PX / 2,
    alignItems: "center",
    justifyContent: "center",
    borderWidth: 2,
    borderColor: "#FFFFFF",
  },
  ring: { padding: RING_PX - 2, borderWidth: 2, borderRadius: 999, alignItems: "center", justifyContent: "center" },
  number: { color: "#FFFFFF", fontWeight: "700", fontSize: fontSize.small },
  legend: { flexDirection: "row", flexWrap: "wrap", gap: space.md, alignItems: "center" },
  entry: { flexDirection: "row", alignItems: "center", gap: space.xs },
  word: { fontSize: fontSize.detail, color: colors.ink },
});
