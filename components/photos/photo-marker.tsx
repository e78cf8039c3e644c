import { useRef, useState } from "react";
import { Image, Platform, Pressable, StyleSheet, Text, View, type GestureResponderEvent } from "react-native";
import { SeverityLegend, SeverityPin, pinSizePx, severityWord } from "@/components/marks/severity-pin";
import { colors, fontSize, space } from "@/constants/theme";
import { photoUri } from "@/hooks/use-photos";
import { DEFECTS } from "@/lib/defects";
import type { Mark, Photo } from "@/lib/notebook-schemas";

export type Pin = { number: number; mark: Mark };
type Props = {
  photo: Photo;
  pins: Pin[];
  selectedId: number | null;
  /** Where a new mark is about to go, before it is saved. */
  pending: { x: number; y: number } | null;
  onTap: (x: number, y: number) => void;
  onPin: (mark: Mark) => void;
  /** Keeps a tall photo from running off a wide screen. */
  maxHeight?: number;
};

const PIN = 30;
const clamp01 = (v: number) => Math.min(1, Math.max(0, v));

/**
 * Where a tap landed, as fractions of the photo. On web the click's client position is measured
 * against the photo's box (the event's own offsets are relative to whichever child was hit);
 * on a phone the responder's location is already relative to the photo.
 */
function tapFraction(e: GestureResponderEvent, node: unknown, size: { w: number; h: number }) {
  const ne = e.nativeEvent as unknown as {
    clientX?: number;
    clientY?: number;
    pageX: number;
    pageY: number;
    locationX: number;
    locationY: number;
  };
  if (Platform.OS === "web" && node) {
    const box = (node as HTMLElement).getBoundingClientRect();
    const cx = ne.clientX ?? ne.pageX - window.scrollX;
    const cy = ne.clientY ?? ne.pageY - window.scrollY;
    return { x: clamp01((cx - box.left) / box.width), y: clamp01((cy - box.top) / box.height) };
  }
  return { x: clamp01(ne.locationX / size.w), y: clamp01(ne.locationY / size.h) };
}

/** A photo with its marks as numbered pins; tap the photo to say where something is. */
export function PhotoMarker({ photo, pins, selectedId, pending, onTap, onPin, maxHeight = 560 }: Props) {
  const ref = useRef<View>(null);
  const [width, setWidth] = useState(0);
  const aspect = photo.width / photo.height || 4 / 3;
  const w = Math.min(width, maxHeight * aspect);
  const size = { w, h: w / aspect };

  return (
    <View onLayout={(e) => setWidth(e.nativeEvent.layout.width)} style={styles.outer}>
      {width > 0 ? (
        <View style={{ width: size.w, height: size.h }}>
          <Pressable
            ref={ref}
            testID="casting-photo"
            aria-label="Photo: tap where the defect is"
            onPress={(e) => {
              const f = tapFraction(e, ref.current, size);
              onTap(f.x, f.y);
            }}
            style={StyleSheet.absoluteFill}
          >
            <Image source={{ uri: photoUri(photo.imageUrl) }} style={StyleSheet.absoluteFill} resizeMode="cover" />
          </Pressable>
          {pins.map(({ number, mark }) =>
            mark.x === null || mark.y === null ? null : (
              <Pressable
                key={mark.id}
                onPress={() => onPin(mark)}
                aria-label={`Mark ${number}: ${DEFECTS[mark.type]?.label ?? mark.type}, ${severityWord(mark.severity)}`}
                testID={`pin-${number}`}
                style={[
                  styles.spot,
                  {
                    left: mark.x * size.w - pinSizePx(mark.severity) / 2,
                    top: mark.y * size.h - pinSizePx(mark.severity) / 2,
                  },
                  mark.id === selectedId && styles.pinOn,
                ]}
              >
                <SeverityPin label={String(number)} severity={mark.severity} on={mark.id === selectedId} />
              </Pressable>
            ),
          )}
          {pending ? (
            <View
              pointerEvents="none"
              style={[
                styles.pin,
                styles.pending,
                { left: pending.x * size.w - PIN / 2, top: pending.y * size.h - PIN / 2 },
              ]}
            >
              <Text style={styles.pinText}>+</Text>
            </View>
          ) : null}
        </View>
      ) : null}
      {pins.some((p) => p.mark.x !== null) ? <SeverityLegend /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  outer: { width: "100%", alignItems: "center", gap: space.sm },
  pin: {
    position: "absolute",
    width: PIN,
    height: PIN,
    borderRadius: PIN / 2,
    alignItems: "center",
    justifyContent: "center",
    backgroundColor: colors.accent,
    borderWidth: 2,
    borderColor: "#FFFFFF",
  },
  spot: { position: "absolute" },
  pinOn: { transform: [{ scale: 1.2 }] },
  pending: { backgroundColor: colors.ink },
  pinText: { color: "#FFFFFF", fontWeight: "700", fontSize: fontSize.detail },
});
