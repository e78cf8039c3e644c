import { StyleSheet, Text } from "react-native";
import { Heading } from "@/components/ui/heading";
import { Notice } from "@/components/ui/notice";
import { Screen } from "@/components/ui/screen";
import { colors, fontSize } from "@/constants/theme";

/** A section whose feature is not built yet: says so plainly, and shows no made-up data. */
export function NotBuiltYet({ title, purpose }: { title: string; purpose: string }) {
  return (
    <Screen>
      <Heading>{title}</Heading>
      <Text style={styles.purpose}>{purpose}</Text>
      <Notice>This part of the casebook is not built yet. Nothing here is stored or shown until it is.</Notice>
    </Screen>
  );
}

const styles = StyleSheet.create({ purpose: { fontSize: fontSize.field, lineHeight: 24, color: colors.ink } });
