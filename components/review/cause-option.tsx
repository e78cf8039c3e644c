import type { ReactNode } from "react";
import { Pressable, StyleSheet, Text } from "react-native";
import { colors, fontSize, radius, space } from "@/constants/theme";

/** One choice in the confirm form's list of causes: a radio with its title and, under it, what is known of it. */
export function CauseOption({
  title,
  on,
  onPress,
  children,
}: {
  title: string;
  on: boolean;
  onPress: () => void;
  children?: ReactNode;
}) {
  return (
    <Pressable
      role="radio"
      aria-checked={on}
      aria-label={title}
      onPress={onPress}
      style={[styles.option, on && styles.on]}
    >
      <Text style={styles.title}>
        {on ? "● " : "○ "}
        {title}
      </Text>
      {children}
    </Pressable>
  );
}

const styles = StyleSheet.create({
  option: {
    gap: 2,
    padding: space.sm,
    borderRadius: radius.sm,
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.background,
  },
  on: { borderColor: colors.steel, backgroundColor: "#E7EFEF" },
  title: { fontSize: fontSize.body, color: colors.ink },
});
