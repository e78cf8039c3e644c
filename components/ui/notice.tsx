import type { ReactNode } from "react";
import { StyleSheet, Text, View } from "react-native";
import { colors, fontSize, radius, space } from "@/constants/theme";

/** A boxed message: an error, a caution, or a plain note. */
export function Notice({ tone = "note", children }: { tone?: "error" | "caution" | "note"; children: ReactNode }) {
  const bg = tone === "error" ? colors.dangerBg : tone === "caution" ? colors.cautionBg : colors.surface;
  return (
    <View role={tone === "error" ? "alert" : undefined} style={[styles.box, { backgroundColor: bg }]}>
      {typeof children === "string" ? <Text style={styles.text}>{children}</Text> : children}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderRadius: radius.md, borderWidth: 1, borderColor: colors.line, padding: space.md, gap: space.xs },
  text: { fontSize: fontSize.body, lineHeight: 22, color: colors.ink },
});
