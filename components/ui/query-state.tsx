import { ActivityIndicator, StyleSheet } from "react-native";
import { Notice } from "@/components/ui/notice";
import { Screen } from "@/components/ui/screen";
import { colors, space } from "@/constants/theme";

export function Loading() {
  return <ActivityIndicator color={colors.accent} style={styles.spin} />;
}

/** A page that could not load: the server's own words (it never sends a stack trace). */
export function LoadFailed({ error }: { error: Error }) {
  return (
    <Screen>
      <Notice tone="error">{error.message}</Notice>
    </Screen>
  );
}

const styles = StyleSheet.create({ spin: { marginTop: space.xl } });
