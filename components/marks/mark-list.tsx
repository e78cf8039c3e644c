import { Pressable, StyleSheet, Text, View } from "react-native";
import type { Pin } from "@/components/photos/photo-marker";
import { card, colors, fontSize, space } from "@/constants/theme";
import { pinSizePx, SeverityPin } from "@/components/marks/severity-pin";
import { DEFECTS, LOCATION_LABELS, SEVERITY_LABELS } from "@/lib/defects";

type Props = { pins: Pin[]; selectedId: number | null; onOpen: (pin: Pin) => void; photoNumbers: Map<number, number> };

/** Every mark of the casting, numbered as on the photos; tap one to change, move or remove it. */
export function MarkList({ pins, selectedId, onOpen, photoNumbers }: Props) {
  if (!pins.length) return <Text style={styles.empty}>No marks yet.</Text>;
  return (
    <View style={styles.list} testID="mark-list">
      {pins.map((p) => {
        const info = DEFECTS[p.mark.type];
        const where = p.mark.photoId === null ? "not on a photo" : `photo ${photoNumbers.get(p.mark.photoId) ?? "?"}`;
        return (
          <Pressable
            key={p.mark.id}
            role="button"
            onPress={() => onOpen(p)}
            testID={`mark-${p.number}`}
            style={[styles.row, p.mark.id === selectedId && styles.on]}
          >
            <View style={styles.badge}>
              <SeverityPin label={String(p.number)} severity={p.mark.severity} />
            </View>
            <View style={styles.body}>
              <Text style={styles.title}>
                {info.label} <Text style={styles.cls}>({info.defectClass})</Text>
              </Text>
              <Text style={styles.meta}>
                {LOCATION_LABELS[p.mark.location]} · {SEVERITY_LABELS[p.mark.severity as 1 | 2 | 3] ?? p.mark.severity}{" "}
                · {where}
              </Text>
              {p.mark.note ? <Text style={styles.note}>{p.mark.note}</Text> : null}
            </View>
          </Pressable>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  empty: { fontSize: fontSize.body, color: colors.muted },
  row: { ...card, flexDirection: "row", gap: space.md, alignItems: "flex-start", padding: space.sm },
  on: { borderColor: colors.steel, borderWidth: 2 },
  // As wide as the most-ringed pin, so the rows line up whatever their severity.
  badge: { width: pinSizePx(3), alignItems: "center" },
  body: { flex: 1, gap: 2 },
  title: { fontSize: fontSize.body, fontWeight: "600", color: colors.ink },
  cls: { color: colors.muted, fontWeight: "400" },
  meta: { fontSize: fontSize.detail, color: colors.muted },
  note: { fontSize: fontSize.detail, color: colors.ink },
});
