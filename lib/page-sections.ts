/**
 * In-page sections of a long screen, reached from a row of links at its top. On the web a section's
 * `nativeID` becomes its element id, and the browser scrolls to it. A phone app has no document: there
 * the casting page instead puts the likely causes right under its header, so no jump is needed.
 */
export const sectionId = (name: string) => `section-${name}`;

export function jumpTo(name: string) {
  if (typeof document === "undefined") return;
  document.getElementById(sectionId(name))?.scrollIntoView({ block: "start" });
}
