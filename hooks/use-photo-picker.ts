import * as ImagePicker from "expo-image-picker";
import { ImageManipulator, SaveFormat } from "expo-image-manipulator";
import { Platform } from "react-native";
import type { PhotoSource } from "@/hooks/use-photos";
import { photoRefusal, refusalMessage, SHRINK_LONG_SIDE_PX } from "@/lib/photo-files";

/** A file on its way in, from any path: what is known of it before it is read. */
export type Candidate = {
  uri: string;
  name: string;
  type: string;
  size?: number;
  width?: number;
  height?: number;
  file?: File;
};
export type Picked = { candidates: Candidate[]; refused: string[] };

function fromAsset(a: ImagePicker.ImagePickerAsset): Candidate {
  return {
    uri: a.uri,
    name: a.file?.name ?? a.fileName ?? "photo.jpg",
    type: a.file?.type ?? a.mimeType ?? "",
    size: a.file?.size ?? a.fileSize,
    width: a.width || undefined,
    height: a.height || undefined,
    file: a.file,
  };
}

/** A dropped file (wide web screens). */
export const fromFile = (file: File): Candidate => ({
  uri: URL.createObjectURL(file),
  name: file.name,
  type: file.type,
  size: file.size,
  file,
});

/**
 * The browser's own file chooser, several at once. expo-image-picker's web picker rejects a whole
 * selection that holds one file it cannot read as an image (a PDF) and does not say which file, so on
 * web the files come straight from the input and each refused one is named in its message.
 */
function chooseOnWeb(camera: boolean): Promise<Picked> {
  return new Promise((resolve) => {
    const input = document.createElement("input");
    input.type = "file";
    input.accept = "image/*";
    input.multiple = !camera;
    if (camera) input.setAttribute("capture", "environment");
    input.style.display = "none";
    const done = () => {
      input.remove();
      resolve({ candidates: Array.from(input.files ?? []).map(fromFile), refused: [] });
    };
    input.addEventListener("change", done, { once: true });
    input.addEventListener("cancel", done, { once: true });
    document.body.appendChild(input);
    input.click();
  });
}

/** Take a photo, or choose several (expo-image-picker on a phone, the browser's chooser on web). */
export async function pickPhotos(from: "camera" | "library"): Promise<Picked> {
  if (Platform.OS === "web") return chooseOnWeb(from === "camera");
  if (from === "camera") {
    const permission = await ImagePicker.requestCameraPermissionsAsync();
    if (!permission.granted)
      return {
        candidates: [],
        refused: [
          "The camera is not allowed for this app. Allow it in the phone's settings, or choose a photo instead.",
        ],
      };
  }
  const options: ImagePicker.ImagePickerOptions = {
    mediaTypes: ["images"],
    quality: 1,
    exif: false,
    allowsMultipleSelection: from === "library",
    selectionLimit: 10,
  };
  try {
    const result =
      from === "camera"
        ? await ImagePicker.launchCameraAsync(options)
        : await ImagePicker.launchImageLibraryAsync(options);
    if (result.canceled || !result.assets?.length) return { candidates: [], refused: [] };
    return { candidates: result.assets.map(fromAsset), refused: [] };
  } catch {
    // The picker could not read what was chosen as an image.
    return { candidates: [], refused: [refusalMessage("type")] };
  }
}

/** Splits files by type into those to shrink and send, and one message per refused file (lib/photo-files.ts). */
export function sortOut(candidates: Candidate[]): Picked {
  const out: Picked = { candidates: [], refused: [] };
  for (const c of candidates) {
    const why = photoRefusal(c, { checkSize: false });
    if (why) out.refused.push(refusalMessage(why, c.name));
    else out.candidates.push(c);
  }
  return out;
}

/**
 * Shrinks a photo on the device to SHRINK_LONG_SIDE_PX on its longest side (JPEG at 85 %) with
 * expo-image-manipulator, which draws on a canvas on web. A photo already small enough goes as it is;
 * one the device cannot decode (HEIC in most desktop browsers) goes as it is too, for the server to judge.
 */
export async function shrinkPhoto(c: Candidate): Promise<PhotoSource> {
  const original: PhotoSource = c.file ? { file: c.file, name: c.name } : { uri: c.uri, name: c.name, type: c.type };
  try {
    let { width, height } = c;
    if (!width || !height) {
      const probe = await ImageManipulator.manipulate(c.uri).renderAsync();
      ({ width, height } = probe);
    }
    if (Math.max(width, height) <= SHRINK_LONG_SIDE_PX) return original;
    const context = ImageManipulator.manipulate(c.uri);
    context.resize(width >= height ? { width: SHRINK_LONG_SIDE_PX } : { height: SHRINK_LONG_SIDE_PX });
    const saved = await (await context.renderAsync()).saveAsync({ format: SaveFormat.JPEG, compress: 0.85 });
    const name = c.name.replace(/\.[^.]+$/, "") + ".jpg";
    if (Platform.OS === "web") return { file: await (await fetch(saved.uri)).blob(), name };
    return { uri: saved.uri, name, type: "image/jpeg" };
  } catch {
    return original;
  }
}
