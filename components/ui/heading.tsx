import { StyleSheet, Text, type TextProps } from "react-native";
import { colors, fonts } from "@/constants/theme";

/** Headings in Lora, shipped with the app. */
export function Heading({ level = 1, style, ...props }: TextProps & { level?: 1 | 2 | 3 }) {
  return <Text role="heading" aria-level={level} style={[styles.base, styles[`h${level}`], style]} {...props} />;
}

const styles = StyleSheet.create({
  base: { fontFamily: fonts.heading, color: colors.ink },
  h1: { fontSize: 26, lineHeight: 34 },
  h2: { fontSize: 20, lineHeight: 28 },
  h3: { fontSize: 17, lineHeight: 24 },
});
