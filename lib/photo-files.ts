/**
 * Which files the app takes as photos, and the one message each refusal gets, whichever way the file
 * came (chosen, dropped, taken with the camera) and whether the app or the server noticed. The server
 * judges by content (server/photos/service.ts); here the name and type a browser or phone reports
 * catch the plain mistakes (a PDF, a spreadsheet) before anything is sent.
 */
export const MAX_PHOTO_BYTES = 15 * 1024 * 1024;
export const PHOTO_TYPES = ["image/jpeg", "image/jpg", "image/png", "image/webp", "image/heic", "image/heif"] as const;
const PHOTO_EXTENSIONS = /\.(jpe?g|png|webp|heic|heif)$/i;
/** Photos are shrunk on the device to this longest side before upload: plenty to see a pinhole. */
export const SHRINK_LONG_SIDE_PX = 2560;

export type FileFacts = { name?: string | null; type?: string | null; size?: number | null };
export type Refusal = "type" | "size";

const called = (name?: string | null) => (name ? `“${name}”` : "That file");

export function refusalMessage(why: Refusal, name?: string | null): string {
  return why === "type"
    ? `${called(name)} is not a photo we can read. Send a JPEG, PNG, WebP or HEIC picture.`
    : `${called(name)} is larger than 15 MB. Send a smaller one (most phones can share a reduced size).`;
}

/**
 * Why a file is refused, or undefined to send it. An unknown type is judged by its name. The size is
 * judged after the photo is shrunk on the device, so a large phone photo is not refused for its original size.
 */
export function photoRefusal(f: FileFacts, { checkSize = true } = {}): Refusal | undefined {
  const type = (f.type ?? "").toLowerCase();
  const looksLikePhoto = type ? (PHOTO_TYPES as readonly string[]).includes(type) : PHOTO_EXTENSIONS.test(f.name ?? "");
  if (!looksLikePhoto) return "type";
  if (checkSize && (f.size ?? 0) > MAX_PHOTO_BYTES) return "size";
  return undefined;
}
