import { StyleSheet, Text } from "react-native";
import { colors, fontSize } from "@/constants/theme";

/** The error line under a field that is not a text box (chips, photo area). */
export function FieldError({ message }: { message?: string }) {
  return message ? (
    <Text role="alert" style={styles.error}>
      {message}
    </Text>
  ) : null;
}

const styles = StyleSheet.create({ error: { color: colors.danger, fontSize: fontSize.detail } });
