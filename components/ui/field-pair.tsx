import { Children, type ReactNode } from "react";
import { StyleSheet, View } from "react-native";
import { space } from "@/constants/theme";

/** Two short fields side by side where the screen allows; they wrap on a narrow phone. */
export function Pair({ children }: { children: ReactNode }) {
  return (
    <View style={styles.pair}>
      {Children.map(children, (child) => (child ? <View style={styles.cell}>{child}</View> : null))}
    </View>
  );
}

const styles = StyleSheet.create({
  pair: { flexDirection: "row", flexWrap: "wrap", gap: space.md },
  cell: { flexGrow: 1, flexBasis: 150 },
});
