import { Stack } from "expo-router";
import { colors } from "@/constants/theme";

/** The rulebook's pages stack inside its tab: the list, a rule, the rule form, the review queue. */
export default function RulebookLayout() {
  return <Stack screenOptions={{ headerShown: false, contentStyle: { backgroundColor: colors.background } }} />;
}
