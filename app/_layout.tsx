import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { FontDisplay, useFonts } from "expo-font";
import { Stack } from "expo-router";
import { useEffect, useState } from "react";
import { ActivityIndicator, Platform, StyleSheet, Text, View } from "react-native";
import { colors, fontSize, space } from "@/constants/theme";
import { setSaveDefaults, usePersistedSaves } from "@/hooks/use-offline-saves";
import { authClient } from "@/lib/auth-client";

/** The web loads WOFF2 (a third of the TTF's bytes); native builds keep the TTF. */
const LORA = {
  "Lora-Regular": {
    uri:
      Platform.OS === "web"
        ? require("@/assets/fonts/Lora_400Regular.woff2")
        : require("@/assets/fonts/Lora_400Regular.ttf"),
    display: FontDisplay.SWAP,
  },
  "Lora-SemiBold": {
    uri:
      Platform.OS === "web"
        ? require("@/assets/fonts/Lora_600SemiBold.woff2")
        : require("@/assets/fonts/Lora_600SemiBold.ttf"),
    display: FontDisplay.SWAP,
  },
};

/**
 * Fonts, one QueryClient (with the person's saves that wait for a connection kept on the device), and
 * the guard: signed-in people see (app), everyone else (auth).
 */
export default function RootLayout() {
  const [queryClient] = useState(() => {
    const client = new QueryClient({ defaultOptions: { queries: { retry: 1, staleTime: 30_000 } } });
    setSaveDefaults(client);
    return client;
  });
  const [fontsLoaded] = useFonts(LORA);
  const { data: session, isPending } = authClient.useSession();
  usePersistedSaves(queryClient, session?.user.id);
  // better-auth marks the session pending again on every re-check while nobody is signed in (after a
  // sign-up, say); only the first check waits behind the opening screen, or the screens (and what
  // they were showing) would be thrown away and rebuilt on each re-check.
  const [checkedOnce, setCheckedOnce] = useState(false);
  useEffect(() => {
    if (!isPending) setCheckedOnce(true);
  }, [isPending]);

  // On the web the page does not wait for Lora: headings show in the fallback serif and swap in.
  if ((!fontsLoaded && Platform.OS !== "web") || (isPending && !checkedOnce)) {
    return (
      <View style={styles.opening}>
        <Text style={styles.name}>Shakeout Casebook</Text>
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

const styles = StyleSheet.create({
  opening: {
    flex: 1,
    alignItems: "center",
    justifyContent: "center",
    gap: space.lg,
    backgroundColor: colors.background,
  },
  name: { fontSize: fontSize.title, color: colors.ink, fontFamily: "Georgia, serif" },
});
