import { useEffect, type ReactNode } from "react";
import { Platform, StyleSheet, View, type ViewProps } from "react-native";
import { space } from "@/constants/theme";

/** react-native-web writes `dataSet` as data-* attributes; React Native's types do not list it. */
const hideProps = { dataSet: { print: "hide" } } as unknown as ViewProps;
/** Spread on any view or text to leave it off paper. */
export const printHidden: object = hideProps;
/** Spread on a side-by-side row whose parts need the page's whole width on paper (a photo sized for the screen). */
export const printStacked: object = { dataSet: { print: "stack" } };

/** What paper needs and the screen shows elsewhere (a casting's melt conditions live on the melt's page). */
export function PrintOnly({ children }: { children: ReactNode }) {
  return (
    <View {...({ dataSet: { print: "only" } } as unknown as ViewProps)} style={styles.stack}>
      {children}
    </View>
  );
}

/** What the screen needs and paper does not (buttons, forms, links elsewhere): left out of the printed sheet. */
export function PrintHidden({ children }: { children: ReactNode }) {
  return (
    <View {...hideProps} style={styles.stack}>
      {children}
    </View>
  );
}

export type Paper = "a4" | "letter";
const PAGE_SIZE: Record<Paper, string> = { a4: "A4", letter: "letter" };

/**
 * The print style sheet of a page meant to be printed (web only). The app scrolls inside its own views,
 * which paper cannot: for print, the root and every view grow to their content and nothing clips, so the
 * browser breaks the page itself. Navigation, buttons (components/ui/button.tsx), fold toggles and forms are
 * left out; a cause card is not split across pages and a heading does not end a page.
 */
function printCss(paper: Paper) {
  return `
@page { size: ${PAGE_SIZE[paper]}; margin: 12mm; }
@media screen { [data-print="only"] { display: none !important; } }
@media print {
  html, body, #root { height: auto !important; min-height: 0 !important; overflow: visible !important; background: #fff !important; }
  #root div { overflow: visible !important; max-height: none !important; }
  #root div[style*="flex-grow: 1"], #root div[class*="r-flex-"] { flex-basis: auto !important; }
  [data-print="hide"], [role="tablist"], [aria-expanded], input, textarea, select { display: none !important; }
  /* Of a set of choices, paper shows the one chosen. */
  [role="radio"][aria-checked="false"] { display: none !important; }
  [data-print="stack"] { flex-direction: column !important; }
  [data-print="stack"] > div { width: 100% !important; flex: none !important; }
  [role="heading"] { break-after: avoid; }
  [data-testid^="cause-"], [data-testid="confirmed-cause"] { break-inside: avoid; }
  * { -webkit-print-color-adjust: exact; print-color-adjust: exact; }
}`;
}

/** Puts the print style sheet into the page while mounted; `paper` sets the sheet's size (A4 or US Letter). */
export function PrintStyle({ paper }: { paper: Paper }) {
  useEffect(() => {
    if (Platform.OS !== "web" || typeof document === "undefined") return;
    const el = document.createElement("style");
    el.id = "print-sheet";
    el.textContent = printCss(paper);
    document.head.appendChild(el);
    return () => el.remove();
  }, [paper]);
  return null;
}

// The same gap as the screen's column, so wrapping a run of sections changes nothing on screen.
const styles = StyleSheet.create({ stack: { gap: space.lg } });
