import { Link, type Href } from "expo-router";
import { StyleSheet, Text } from "react-native";
import { colors, fontSize } from "@/constants/theme";

/** Where this page sits: one tap back up to its parent (the browser's back button may lead elsewhere). */
export function BackLink({ href, label }: { href: Href; label: string }) {
  return (
    <Link href={href} style={styles.link}>
      <Text style={styles.text}>← {label}</Text>
    </Link>
  );
}

const styles = StyleSheet.create({
  link: { alignSelf: "flex-start", paddingVertical: 4 },
  text: { color: colors.accent, fontSize: fontSize.body, fontWeight: "600" },
});
