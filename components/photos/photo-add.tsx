import { Platform, StyleSheet, Text, View } from "react-native";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { UploadProgress } from "@/components/ui/upload-progress";
import { colors, fontSize, space } from "@/constants/theme";
import { pickPhotos, type Picked } from "@/hooks/use-photo-picker";

type Props = { add: (p: Picked) => void; busy: boolean; progress: number; messages: string[]; wide: boolean };

/** Take a photo or choose several (or, wide, drop them here), and watch them go up. */
export function PhotoAdd({ add, busy, progress, messages, wide }: Props) {
  const pick = async (from: "camera" | "library") => add(await pickPhotos(from));

  return (
    <View style={styles.wrap}>
      <View style={styles.row}>
        {!wide || Platform.OS !== "web" ? (
          <Button label="Take a photo" onPress={() => pick("camera")} busy={busy} />
        ) : null}
        <Button
          kind={wide ? "primary" : "plain"}
          label="Choose photos"
          onPress={() => pick("library")}
          busy={busy}
          testID="choose-photo"
        />
      </View>
      {wide && Platform.OS === "web" ? (
        <Text style={styles.hint}>…or drag photos from your computer onto this area.</Text>
      ) : null}
      <Text style={styles.hint}>
        JPEG, PNG, WebP or HEIC, up to 15 MB; large photos are made smaller before they are sent. Location and camera
        details are removed when they are stored.
      </Text>
      {busy ? <UploadProgress fraction={progress} /> : null}
      {messages.map((m, i) => (
        <Notice key={i} tone="error">
          {m}
        </Notice>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  row: { flexDirection: "row", flexWrap: "wrap", gap: space.sm },
  hint: { fontSize: fontSize.detail, color: colors.muted },
});
