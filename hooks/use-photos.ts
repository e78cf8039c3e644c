import { useMutation } from "@tanstack/react-query";
import { useState } from "react";
import { useRefreshCasting } from "@/hooks/use-castings";
import { ApiError } from "@/lib/api";
import { apiBaseUrl } from "@/lib/client-env";
import type { Photo } from "@/lib/notebook-schemas";
import { MAX_PHOTO_BYTES, refusalMessage } from "@/lib/photo-files";
import { shrinkPhoto, sortOut, type Picked } from "@/hooks/use-photo-picker";

/** A photo to send: on web a real File (picked, dropped or from expo-image-picker's `file`); on a phone a local uri. */
export type PhotoSource = { file: Blob; name?: string } | { uri: string; name: string; type: string };

/** Plain words for what the server refuses (the same as the app's own refusals); its own message for anything else. */
function uploadError(status: number, body: string, name?: string): ApiError {
  if (status === 413) return new ApiError(413, refusalMessage("size", name));
  if (status === 415) {
    // A HEIC the server cannot convert, or a damaged photo, has its own explanation.
    const own = parsedMessage(body);
    return new ApiError(415, own && !/not a JPEG, PNG/.test(own) ? own : refusalMessage("type", name));
  }
  if (status === 0)
    return new ApiError(0, "The upload stopped: the server cannot be reached. Check the connection and try again.");
  return new ApiError(status, parsedMessage(body) ?? `The server answered ${status}.`);
}

function parsedMessage(body: string): string | undefined {
  try {
    return JSON.parse(body)?.error?.message;
  } catch {
    return undefined; // Not JSON (a proxy's page, say).
  }
}

/**
 * fetch() cannot report upload progress, so the photo goes up with XMLHttpRequest, cookies
 * included (the session is a cookie), reporting the fraction sent.
 */
export function sendPhoto(
  castingId: number,
  source: PhotoSource,
  onProgress: (fraction: number) => void,
): Promise<Photo> {
  const form = new FormData();
  if ("file" in source) form.append("photo", source.file, source.name ?? "photo");
  // React Native's FormData takes { uri, name, type } for a file on the device.
  else form.append("photo", source as unknown as Blob);
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open("POST", `${apiBaseUrl}/api/photos/castings/${castingId}`);
    xhr.withCredentials = true;
    xhr.upload.onprogress = (e) => e.lengthComputable && onProgress(e.loaded / e.total);
    xhr.onload = () => {
      if (xhr.status >= 200 && xhr.status < 300) resolve(JSON.parse(xhr.responseText) as Photo);
      else reject(uploadError(xhr.status, xhr.responseText, source.name));
    };
    xhr.onerror = () => reject(uploadError(0, "", source.name));
    xhr.send(form);
  });
}

export function useUploadPhoto(castingId: number) {
  const [progress, setProgress] = useState(0);
  const refresh = useRefreshCasting();
  const mutation = useMutation({
    mutationFn: (source: PhotoSource) => {
      setProgress(0);
      return sendPhoto(castingId, source, setProgress);
    },
    onSuccess: () => refresh(castingId),
  });
  return { ...mutation, progress };
}

/**
 * Photos from any path (chosen, several at once; dropped; the camera): each refused file gets its
 * message, the rest are shrunk on the device and sent one after another.
 */
export function usePhotoIntake(castingId: number) {
  const upload = useUploadPhoto(castingId);
  const [messages, setMessages] = useState<string[]>([]);
  const [preparing, setPreparing] = useState(false);

  async function add(picked: Picked) {
    const { candidates, refused } = sortOut(picked.candidates);
    const found = [...picked.refused, ...refused];
    setMessages(found);
    setPreparing(true);
    try {
      for (const c of candidates) {
        const source = await shrinkPhoto(c);
        const size = "file" in source ? source.file.size : c.size;
        if ((size ?? 0) > MAX_PHOTO_BYTES) found.push(refusalMessage("size", c.name));
        else await upload.mutateAsync(source).catch((e: Error) => found.push(e.message));
        setMessages([...found]);
      }
    } finally {
      setPreparing(false);
    }
  }
  return { add, busy: preparing || upload.isPending, progress: upload.progress, messages };
}

export function useDeletePhoto(castingId: number) {
  const refresh = useRefreshCasting();
  return useMutation({
    mutationFn: async (photoId: number) => {
      const res = await fetch(`${apiBaseUrl}/api/photos/${photoId}`, { method: "DELETE", credentials: "include" });
      if (!res.ok) throw uploadError(res.status, await res.text());
    },
    onSuccess: () => refresh(castingId),
  });
}

/** Photo urls from the API are paths; images load from the API's origin with the session cookie. */
export const photoUri = (path: string) => `${apiBaseUrl}${path}`;
