import * as ImagePicker from "expo-image-picker";
import type { PhotoSource } from "@/hooks/use-photos";

/** A picked asset as something to upload: the real File on web, the file's uri on a phone. */
function toSource(asset: ImagePicker.ImagePickerAsset): PhotoSource {
  if (asset.file) return { file: asset.file, name: asset.file.name };
  return { uri: asset.uri, name: asset.fileName ?? "photo.jpg", type: asset.mimeType ?? "image/jpeg" };
}

/**
 * Take a photo or pick one. The server checks the content and strips metadata, so the picker sends
 * the original (no editing step, full quality) rather than re-encoding it on the phone.
 */
export async function pickPhoto(from: "camera" | "library"): Promise<PhotoSource | { refused: string } | null> {
  if (from === "camera") {
    const permission = await ImagePicker.requestCameraPermissionsAsync();
    if (!permission.granted)
      return {
        refused: "The camera is not allowed for this app. Allow it in the phone's settings, or choose a photo instead.",
      };
  }
  const options: ImagePicker.ImagePickerOptions = { mediaTypes: ["images"], quality: 1, exif: false };
  const result =
    from === "camera"
      ? await ImagePicker.launchCameraAsync(options)
      : await ImagePicker.launchImageLibraryAsync(options);
  if (result.canceled || !result.assets?.length) return null;
  return toSource(result.assets[0]);
}
