import { useState } from "react";
import { StyleSheet, Text, View } from "react-native";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { PhotoMarker, type Pin } from "@/components/photos/photo-marker";
import { colors, fontSize, space } from "@/constants/theme";
import { useDeletePhoto } from "@/hooks/use-photos";
import type { Mark, Photo } from "@/lib/notebook-schemas";

type Props = {
  photo: Photo;
  number: number;
  pins: Pin[];
  selectedId: number | null;
  pending: { x: number; y: number } | null;
  onTap: (x: number, y: number) => void;
  onPin: (m: Mark) => void;
  castingId: number;
};

/** One photo with its pins, its number, and a two-tap remove (its marks stay, without a place). */
export function PhotoPanel({ photo, number, castingId, ...marker }: Props) {
  const remove = useDeletePhoto(castingId);
  const [confirm, setConfirm] = useState(false);
  return (
    <View style={styles.wrap}>
      <PhotoMarker photo={photo} {...marker} />
      <View style={styles.row}>
        <Text style={styles.caption}>
          Photo {number} · {marker.pins.length} mark{marker.pins.length === 1 ? "" : "s"}
        </Text>
        <Button
          kind="plain"
          label={confirm ? "Tap again: remove photo" : "Remove photo"}
          busy={remove.isPending}
          onPress={() => (confirm ? remove.mutate(photo.id) : setConfirm(true))}
        />
      </View>
      {remove.error ? <Notice tone="error">{remove.error.message}</Notice> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  row: { flexDirection: "row", alignItems: "center", justifyContent: "space-between", gap: space.sm },
  caption: { fontSize: fontSize.detail, color: colors.muted },
});
