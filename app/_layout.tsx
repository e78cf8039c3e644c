import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { useFonts } from "expo-font";
import { Stack } from "expo-router";
import { useState } from "react";
import { ActivityIndicator, View } from "react-native";
import { colors } from "@/constants/theme";
import { authClient } from "@/lib/auth-client";

/** Fonts, one QueryClient, and the guard: signed-in people see (app), everyone else (auth). */
export default function RootLayout() {
  const [queryClient] = useState(
    () => new QueryClient({ defaultOptions: { queries: { retry: 1, staleTime: 30_000 } } }),
  );
  const [fontsLoaded] = useFonts({
    "Lora-Regular": require("@/assets/fonts/Lora_400Regular.ttf"),
    "Lora-SemiBold": require("@/assets/fonts/Lora_600SemiBold.ttf"),
  });
  const { data: session, isPending } = authClient.useSession();

  if (!fontsLoaded || isPending) {
    return (
      <View style={{ flex: 1, alignItems: "center", justifyContent: "center", backgroundColor: colors.background }}>
        <ActivityIndicator color={colors.accent} />
      </View>
    );
  }
  const signedIn = !!session;
  return (
    <QueryClientProvider client={queryClient}>
      <Stack screenOptions={{ headerShown: false, contentStyle: { backgroundColor: colors.background } }}>
        <Stack.Protected guard={signedIn}>
          <Stack.Screen name="(app)" />
        </Stack.Protected>
        <Stack.Protected guard={!signedIn}>
          <Stack.Screen name="(auth)" />
        </Stack.Protected>
        {/* Links from e-mail open whether or not someone is signed in. */}
        <Stack.Screen name="invitation/[id]" />
        <Stack.Screen name="reset-password" />
      </Stack>
    </QueryClientProvider>
  );
}
