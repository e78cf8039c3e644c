import { StyleSheet, Text, type TextProps } from "react-native";
import { colors, fonts, fontSize } from "@/constants/theme";

/** Headings in Lora, shipped with the app. */
export function Heading({ level = 1, style, ...props }: TextProps & { level?: 1 | 2 | 3 }) {
  return <Text role="heading" aria-level={level} style={[styles.base, styles[`h${level}`], style]} {...props} />;
}

const styles = StyleSheet.create({
  base: { fontFamily: fonts.heading, color: colors.ink },
  h1: { fontSize: fontSize.display, lineHeight: 34 },
  h2: { fontSize: fontSize.title, lineHeight: 28 },
  h3: { fontSize: fontSize.lead, lineHeight: 24 },
});
