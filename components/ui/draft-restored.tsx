import { StyleSheet, Text, View } from "react-native";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { colors, fontSize, space } from "@/constants/theme";

/** Says that a form was refilled from the draft kept on this device, with a way to start afresh. */
export function DraftRestored({ onStartOver }: { onStartOver: () => void }) {
  return (
    <View testID="draft-restored">
      <Notice>
        <Text style={styles.text}>
          What you had typed here was kept on this device and is filled in again. Nothing is saved until you save.
        </Text>
        <View style={styles.actions}>
          <Button kind="plain" label="Start over" onPress={onStartOver} />
        </View>
      </Notice>
    </View>
  );
}

const styles = StyleSheet.create({
  text: { fontSize: fontSize.body, lineHeight: 22, color: colors.ink },
  actions: { flexDirection: "row", paddingTop: space.xs },
});
