import { useEffect } from "react";
import { Platform } from "react-native";

/**
 * Brings a form's field into view and puts the cursor in it, found by the label the form shows (a
 * number field's name carries its unit: "Pour temperature (°C)"). Used when a "would sharpen the answer"
 * item opens the form. Web only: on a phone app the form opens at its top.
 */
export function useFocusField(labels: readonly string[] | undefined, ready: boolean) {
  const key = labels?.join("|") ?? "";
  useEffect(() => {
    if (Platform.OS !== "web" || !key || !ready) return;
    // After the form's first paint, so the field exists and the scroll lands where it is drawn.
    const timer = setTimeout(() => {
      for (const label of key.split("|")) {
        const q = CSS.escape(label);
        const el = document.querySelector<HTMLElement>(`[aria-label="${q}"], [aria-label^="${q} ("]`);
        if (!el) continue;
        el.scrollIntoView({ block: "center" });
        const target = el.matches("input, textarea") ? el : (el.querySelector<HTMLElement>('[role="radio"]') ?? el);
        target.focus({ preventScroll: true });
        return;
      }
    }, 100);
    return () => clearTimeout(timer);
  }, [key, ready]);
}
