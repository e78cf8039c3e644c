import type { ReactNode } from "react";
import { ScrollView, StyleSheet, View } from "react-native";
import { colors, CONTENT_MAX_PX, space } from "@/constants/theme";

/** A scrolling page whose content sits in a centred column on wide screens. */
export function Screen({ children }: { children: ReactNode }) {
  return (
    <ScrollView style={styles.scroll} contentContainerStyle={styles.outer}>
      <View style={styles.column}>{children}</View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { flex: 1, backgroundColor: colors.background },
  outer: { alignItems: "center", padding: space.lg, paddingBottom: space.xxl },
  column: { width: "100%", maxWidth: CONTENT_MAX_PX, gap: space.lg },
});
