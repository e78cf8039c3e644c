import { Stack } from "expo-router";
import { colors } from "@/constants/theme";

/** The trends pages stack inside their tab. */
export default function TrendsLayout() {
  return <Stack screenOptions={{ headerShown: false, contentStyle: { backgroundColor: colors.background } }} />;
}
