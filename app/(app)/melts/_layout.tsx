import { Stack } from "expo-router";
import { colors } from "@/constants/theme";

/** The melt pages stack inside the Melts tab, so a melt's castings stay under that tab. */
export default function MeltsLayout() {
  return <Stack screenOptions={{ headerShown: false, contentStyle: { backgroundColor: colors.background } }} />;
}
