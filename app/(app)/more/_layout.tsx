import { Stack } from "expo-router";
import { colors } from "@/constants/theme";

/** The More pages (the shop, its people, the development inbox) stack inside the More tab. */
export default function MoreLayout() {
  return <Stack screenOptions={{ headerShown: false, contentStyle: { backgroundColor: colors.background } }} />;
}
