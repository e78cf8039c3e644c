import { Link } from "expo-router";
import { StyleSheet, Text, View } from "react-native";
import { BackLink } from "@/components/ui/back-link";
import { Heading } from "@/components/ui/heading";
import { Screen } from "@/components/ui/screen";
import { colors, fontSize, radius, space } from "@/constants/theme";
import { CALCULATOR_TITLES } from "@/lib/calculator-fields";
import { CALCULATORS } from "@/rules/calculators";

/** The calculators for the next pour; each one can also be opened from a melt or casting, prefilled. */
export default function CalculatorsScreen() {
  return (
    <Screen>
      <BackLink href="/melts" label="Melts" />
      <Heading>Calculators</Heading>
      <View style={styles.list}>
        {CALCULATORS.map((k) => (
          <Link key={k} href={`/melts/calculators/${k}`} style={styles.card}>
            <Text style={styles.title}>{CALCULATOR_TITLES[k].title}</Text>
            {"\n"}
            <Text style={styles.purpose}>{CALCULATOR_TITLES[k].purpose}</Text>
          </Link>
        ))}
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  card: {
    backgroundColor: colors.surface,
    borderWidth: 1,
    borderColor: colors.line,
    borderRadius: radius.sm,
    padding: space.md,
  },
  title: { fontSize: fontSize.field, fontWeight: "600", color: colors.ink },
  purpose: { fontSize: fontSize.detail, color: colors.muted },
});
