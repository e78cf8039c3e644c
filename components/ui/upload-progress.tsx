import { StyleSheet, Text, View } from "react-native";
import { colors, fontSize, radius, space } from "@/constants/theme";

/** A bar that fills as the photo's bytes go up; the percentage is also read out as text. */
export function UploadProgress({ fraction, label = "Uploading photo" }: { fraction: number; label?: string }) {
  const pct = Math.round(Math.min(1, Math.max(0, fraction)) * 100);
  return (
    <View style={styles.wrap}>
      <Text style={styles.text}>
        {label}: {pct} %
      </Text>
      <View
        style={styles.track}
        role="progressbar"
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={pct}
        aria-label={label}
      >
        <View style={[styles.fill, { width: `${pct}%` }]} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  text: { fontSize: fontSize.detail, color: colors.ink },
  track: { height: 10, borderRadius: radius.sm, backgroundColor: colors.line, overflow: "hidden" },
  fill: { height: "100%", backgroundColor: colors.steel },
});
