import { forwardRef } from "react";
import { Pressable, StyleSheet, Text, View, type PressableProps } from "react-native";
import { colors, fontSize, space } from "@/constants/theme";

type Props = PressableProps & { label: string; isFocused?: boolean; wide: boolean };

/** One entry of the main navigation: a rail row on wide screens, a bottom-bar cell on phones. */
export const NavButton = forwardRef<View, Props>(function NavButton({ label, isFocused, wide, ...pressable }, ref) {
  return (
    <Pressable
      ref={ref}
      role="tab"
      aria-selected={isFocused}
      {...pressable}
      style={[wide ? styles.rail : styles.bar, isFocused && (wide ? styles.railOn : styles.barOn)]}
    >
      <Text style={[styles.label, isFocused && styles.labelOn]}>{label}</Text>
    </Pressable>
  );
});

const styles = StyleSheet.create({
  bar: {
    flex: 1,
    minHeight: 56,
    alignItems: "center",
    justifyContent: "center",
    borderTopWidth: 3,
    borderTopColor: "transparent",
  },
  barOn: { borderTopColor: colors.accent },
  rail: { paddingVertical: space.md, paddingHorizontal: space.lg, borderLeftWidth: 4, borderLeftColor: "transparent" },
  railOn: { borderLeftColor: colors.accent, backgroundColor: colors.background },
  label: { fontSize: fontSize.detail, color: colors.muted, fontWeight: "600" },
  labelOn: { color: colors.ink },
});
