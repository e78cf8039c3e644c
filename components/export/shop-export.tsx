import { Linking, StyleSheet, Text } from "react-native";
import { Button } from "@/components/ui/button";
import { colors, fontSize } from "@/constants/theme";
import { apiBaseUrl } from "@/lib/client-env";

/** The owner's export: every casting with its melt conditions and marks, as a CSV file for a spreadsheet. */
export function ShopExport() {
  return (
    <>
      <Text style={styles.meta}>
        Every casting with its melt conditions and marks, in SI units, one row per casting.
      </Text>
      <Button
        kind="plain"
        label="Download castings (CSV)"
        testID="export-csv"
        onPress={() => Linking.openURL(`${apiBaseUrl}/api/export/castings.csv`)}
      />
    </>
  );
}

const styles = StyleSheet.create({ meta: { fontSize: fontSize.detail, color: colors.muted } });
