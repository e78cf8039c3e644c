import { ActivityIndicator, Pressable, StyleSheet, Text } from "react-native";
import { printHidden } from "@/components/ui/print";
import { colors, fontSize, radius, space } from "@/constants/theme";

type Props = { label: string; onPress: () => void; busy?: boolean; kind?: "primary" | "plain"; testID?: string };

/** An action; left off a printed page, where it means nothing. */
export function Button({ label, onPress, busy, kind = "primary", testID }: Props) {
  const primary = kind === "primary";
  return (
    <Pressable
      role="button"
      testID={testID}
      {...printHidden}
      onPress={busy ? undefined : onPress}
      aria-disabled={busy}
      style={({ pressed }) => [styles.base, primary ? styles.primary : styles.plain, pressed && styles.pressed]}
    >
      {busy ? (
        <ActivityIndicator color={primary ? colors.accentInk : colors.accent} />
      ) : (
        <Text style={[styles.label, { color: primary ? colors.accentInk : colors.accent }]}>{label}</Text>
      )}
    </Pressable>
  );
}

const styles = StyleSheet.create({
  base: {
    minHeight: 44,
    borderRadius: radius.sm,
    paddingHorizontal: space.lg,
    justifyContent: "center",
    alignItems: "center",
  },
  primary: { backgroundColor: colors.accent },
  plain: { backgroundColor: "transparent", borderWidth: 1, borderColor: colors.line },
  pressed: { opacity: 0.75 },
  label: { fontSize: fontSize.field, fontWeight: "600" },
});
