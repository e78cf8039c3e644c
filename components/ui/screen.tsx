import type { ReactNode } from "react";
import { ScrollView, StyleSheet, View } from "react-native";
import { colors, CONTENT_MAX_PX, space, WIDE_CONTENT_MAX_PX } from "@/constants/theme";

/**
 * A scrolling page whose content sits in a centred column on wide screens. `wide` lets tables and
 * side-by-side panes use a wider column (still capped, so lines stay readable).
 */
export function Screen({ children, wide }: { children: ReactNode; wide?: boolean }) {
  return (
    <ScrollView style={styles.scroll} contentContainerStyle={styles.outer}>
      <View style={[styles.column, wide && styles.wideColumn]}>{children}</View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { flex: 1, backgroundColor: colors.background },
  outer: { alignItems: "center", padding: space.lg, paddingBottom: space.xxl },
  column: { width: "100%", maxWidth: CONTENT_MAX_PX, gap: space.lg },
  wideColumn: { maxWidth: WIDE_CONTENT_MAX_PX },
});
