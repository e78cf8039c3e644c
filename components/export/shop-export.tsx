import { useState } from "react";
import { Linking, StyleSheet, Text } from "react-native";
import { Button } from "@/components/ui/button";
import { ChoiceChips } from "@/components/ui/choice-chips";
import { colors, fontSize } from "@/constants/theme";
import { apiBaseUrl } from "@/lib/client-env";

// SI stays first: a file another program reads should not depend on who downloaded it.
const UNIT_OPTIONS = [
  { value: "si", label: "SI (°C, mm, kg)" },
  { value: "mine", label: "My units" },
  { value: "shop", label: "The shop's default units" },
] as const;

/** The owner's export: every casting with its melt conditions, marks and what was learned, as CSV for a spreadsheet. */
export function ShopExport() {
  const [units, setUnits] = useState<string>("si");
  return (
    <>
      <Text style={styles.meta}>
        Every casting with its melt conditions, marks, the likely and the confirmed cause, and the fixes tried, one row
        per casting. Each column names its unit.
      </Text>
      <ChoiceChips label="Units in the file" options={UNIT_OPTIONS} value={units} onChange={setUnits} />
      <Button
        kind="plain"
        label="Download castings (CSV)"
        testID="export-csv"
        onPress={() => Linking.openURL(`${apiBaseUrl}/api/export/castings.csv?units=${units}`)}
      />
    </>
  );
}

const styles = StyleSheet.create({ meta: { fontSize: fontSize.detail, color: colors.muted } });
