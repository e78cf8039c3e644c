import { Stack } from "expo-router";
import { useEffect } from "react";

/**
 * The code of the first signed-in screens, run while the person types: the bundle holds every screen,
 * but each module runs only when first needed, and running the shell, casebook and pour log took about
 * a quarter of a second of a slow phone's time between sign-in and the first melt card
 * (`npm run bench:web`). Nothing is drawn; the modules are only made ready.
 */
function prepareFirstScreens() {
  void import("../(app)/_layout");
  void import("../(app)/index");
  void import("../(app)/melts/_layout");
  void import("../(app)/melts/index");
}

export default function AuthLayout() {
  useEffect(() => {
    if (typeof requestIdleCallback !== "function") return;
    const id = requestIdleCallback(prepareFirstScreens, { timeout: 3000 });
    return () => cancelIdleCallback(id);
  }, []);
  return <Stack screenOptions={{ headerShown: false }} />;
}
