import { useSyncExternalStore } from "react";
import { Platform } from "react-native";

/**
 * True while the browser lays the page out for paper: between beforeprint and afterprint, or while
 * print media is in force (a print preview, or a test emulating it). Parts that are folded away on screen,
 * such as a cause's reasons, open for the sheet. Always false off the web.
 */
const web = Platform.OS === "web" && typeof window !== "undefined" && typeof window.matchMedia === "function";
let printing = false;

function subscribe(onChange: () => void) {
  if (!web) return () => {};
  const query = window.matchMedia("print");
  const set = (v: boolean) => () => {
    printing = v;
    onChange();
  };
  const onMedia = () => set(query.matches)();
  const before = set(true);
  const after = set(false);
  query.addEventListener("change", onMedia);
  window.addEventListener("beforeprint", before);
  window.addEventListener("afterprint", after);
  printing = query.matches;
  return () => {
    query.removeEventListener("change", onMedia);
    window.removeEventListener("beforeprint", before);
    window.removeEventListener("afterprint", after);
  };
}

export function usePrinting(): boolean {
  return useSyncExternalStore(
    subscribe,
    () => printing,
    () => false,
  );
}
