import type { ReactNode } from "react";
import { ScrollView, StyleSheet, Text, View } from "react-native";
import { Heading } from "@/components/ui/heading";
import { card, colors, fontSize, space } from "@/constants/theme";

/** The frame of the sign-in and sign-up pages: the product's name, what it is for, the form. */
export function AuthCard({ title, children }: { title: string; children: ReactNode }) {
  return (
    <ScrollView style={styles.scroll} contentContainerStyle={styles.outer}>
      <View style={styles.card}>
        <Heading level={1}>Shakeout Casebook</Heading>
        <Text style={styles.lede}>
          Log each melt and pour, mark what you see on each casting, find the likely cause and the fix.
        </Text>
        <Heading level={2}>{title}</Heading>
        {children}
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { flex: 1, backgroundColor: colors.background },
  outer: { flexGrow: 1, alignItems: "center", justifyContent: "center", padding: space.lg },
  card: { ...card, width: "100%", maxWidth: 420, gap: space.lg, padding: space.xl },
  lede: { color: colors.muted, fontSize: fontSize.body, lineHeight: 22 },
});
