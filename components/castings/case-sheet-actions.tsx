import { useState } from "react";
import { Linking, Platform, StyleSheet, View } from "react-native";
import { Button } from "@/components/ui/button";
import { ChoiceChips } from "@/components/ui/choice-chips";
import { PrintHidden, PrintStyle, type Paper } from "@/components/ui/print";
import { space } from "@/constants/theme";
import { apiBaseUrl } from "@/lib/client-env";

const PAPERS = [
  { value: "a4", label: "A4" },
  { value: "letter", label: "Letter" },
] as const;

/**
 * The casting as a case sheet for the shop wall or a report: printed from this page (web), or as a PDF
 * made by the server. The paper choice sets both.
 */
export function CaseSheetActions({ castingId }: { castingId: number }) {
  const [paper, setPaper] = useState<Paper>("a4");
  const canPrint = Platform.OS === "web" && typeof window !== "undefined" && typeof window.print === "function";
  return (
    <PrintHidden>
      <PrintStyle paper={paper} />
      <View style={styles.row} testID="case-sheet">
        <ChoiceChips label="Case sheet paper" options={PAPERS} value={paper} onChange={(v) => setPaper(v as Paper)} />
        <View style={styles.buttons}>
          {canPrint ? <Button kind="plain" label="Print" testID="print-sheet" onPress={() => window.print()} /> : null}
          <Button
            kind="plain"
            label="Download PDF"
            testID="sheet-pdf"
            onPress={() => Linking.openURL(`${apiBaseUrl}/api/castings/${castingId}/sheet.pdf?paper=${paper}`)}
          />
        </View>
      </View>
    </PrintHidden>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: "row", flexWrap: "wrap", alignItems: "flex-end", gap: space.md },
  buttons: { flexDirection: "row", flexWrap: "wrap", gap: space.sm },
});
