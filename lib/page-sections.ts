import { Platform } from "react-native";

/**
 * In-page sections of a long screen, reached from a row of links at its top. On the web a section's
 * `nativeID` becomes its element id, and the browser scrolls to it. On a phone app the casting page
 * instead puts the likely causes right under its header, so no jump is needed there.
 */
export const sectionId = (name: string) => `section-${name}`;

export function jumpTo(name: string) {
  if (Platform.OS !== "web" || typeof document === "undefined") return;
  document.getElementById(sectionId(name))?.scrollIntoView({ block: "start" });
}
