import { useEffect, useRef, useState, type ReactNode } from "react";
import { Platform, StyleSheet, View } from "react-native";
import { colors, radius } from "@/constants/theme";

type Props = { onFiles: (files: File[]) => void; enabled: boolean; children: ReactNode };

/**
 * On a wide web screen a photo can be dragged from the desktop onto the photo area. React Native
 * has no drag-and-drop events, so the listeners go on the DOM node underneath the View.
 */
export function PhotoDropZone({ onFiles, enabled, children }: Props) {
  const ref = useRef<View>(null);
  const [over, setOver] = useState(false);
  const onFilesRef = useRef(onFiles);
  onFilesRef.current = onFiles;

  useEffect(() => {
    if (Platform.OS !== "web" || !enabled) return;
    const node = ref.current as unknown as HTMLElement | null;
    if (!node) return;
    const dragOver = (e: DragEvent) => {
      e.preventDefault();
      setOver(true);
    };
    const leave = () => setOver(false);
    const drop = (e: DragEvent) => {
      e.preventDefault();
      setOver(false);
      const files = Array.from(e.dataTransfer?.files ?? []);
      if (files.length) onFilesRef.current(files);
    };
    node.addEventListener("dragover", dragOver);
    node.addEventListener("dragleave", leave);
    node.addEventListener("drop", drop);
    return () => {
      node.removeEventListener("dragover", dragOver);
      node.removeEventListener("dragleave", leave);
      node.removeEventListener("drop", drop);
    };
  }, [enabled]);

  return (
    <View ref={ref} style={[styles.zone, over && styles.over]} testID="photo-drop-zone">
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  // The border is always there (transparent) so that showing it does not shift the photos.
  zone: {
    gap: 12,
    borderRadius: radius.md,
    borderWidth: 2,
    borderColor: "transparent",
    borderStyle: "dashed",
    margin: -2,
  },
  over: { borderColor: colors.steel, backgroundColor: "#EAF1F1" },
});
