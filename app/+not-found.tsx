import { Link, Stack, usePathname } from "expo-router";
import { StyleSheet, Text } from "react-native";
import { Heading } from "@/components/ui/heading";
import { Screen } from "@/components/ui/screen";
import { colors, fontSize, space } from "@/constants/theme";

/** An address the app does not have: say so plainly and offer the way back, not a list of routes. */
export default function NotFound() {
  const path = usePathname();
  return (
    <Screen>
      <Stack.Screen options={{ title: "Not found" }} />
      <Heading>Nothing at this address</Heading>
      <Text style={styles.body}>
        There is no page at <Text style={styles.path}>{path}</Text>. The link may be old, or the melt or casting it
        pointed to may have been removed.
      </Text>
      <Link href="/" style={styles.link} testID="not-found-home">
        Back to the casebook
      </Link>
    </Screen>
  );
}

const styles = StyleSheet.create({
  body: { fontSize: fontSize.field, lineHeight: 24, color: colors.ink },
  path: { fontFamily: "monospace", color: colors.muted },
  link: { fontSize: fontSize.field, color: colors.accent, textDecorationLine: "underline", paddingVertical: space.sm },
});
