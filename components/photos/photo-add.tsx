import { useState } from "react";
import { Platform, StyleSheet, Text, View } from "react-native";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { UploadProgress } from "@/components/ui/upload-progress";
import { colors, fontSize, space } from "@/constants/theme";
import { pickPhoto } from "@/hooks/use-photo-picker";
import type { PhotoSource } from "@/hooks/use-photos";

type Props = { upload: (s: PhotoSource) => void; busy: boolean; progress: number; error: Error | null; wide: boolean };

/** Take a photo or choose one (or, wide, drop one here), and watch it go up. */
export function PhotoAdd({ upload, busy, progress, error, wide }: Props) {
  const [refused, setRefused] = useState<string>();

  async function pick(from: "camera" | "library") {
    setRefused(undefined);
    const picked = await pickPhoto(from);
    if (picked && "refused" in picked) setRefused(picked.refused);
    else if (picked) upload(picked);
  }

  return (
    <View style={styles.wrap}>
      <View style={styles.row}>
        {!wide || Platform.OS !== "web" ? (
          <Button label="Take a photo" onPress={() => pick("camera")} busy={busy} />
        ) : null}
        <Button
          kind={wide ? "primary" : "plain"}
          label="Choose a photo"
          onPress={() => pick("library")}
          busy={busy}
          testID="choose-photo"
        />
      </View>
      {wide && Platform.OS === "web" ? (
        <Text style={styles.hint}>…or drag a photo from your computer onto this area.</Text>
      ) : null}
      <Text style={styles.hint}>
        JPEG, PNG, WebP or HEIC, up to 15 MB. Location and camera details are removed when it is stored.
      </Text>
      {busy ? <UploadProgress fraction={progress} /> : null}
      {refused ? <Notice tone="error">{refused}</Notice> : null}
      {error && !busy ? <Notice tone="error">{error.message}</Notice> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  row: { flexDirection: "row", flexWrap: "wrap", gap: space.sm },
  hint: { fontSize: fontSize.detail, color: colors.muted },
});
