import { useMutation } from "@tanstack/react-query";
import { useState } from "react";
import { useRefreshCasting } from "@/hooks/use-castings";
import { ApiError } from "@/lib/api";
import { apiBaseUrl } from "@/lib/client-env";
import type { Photo } from "@/lib/notebook-schemas";

/** A photo to send: on web a real File (picked, dropped or from expo-image-picker's `file`); on a phone a local uri. */
export type PhotoSource = { file: Blob; name?: string } | { uri: string; name: string; type: string };

/** Plain words for what the server refuses; its own message for anything else. */
function uploadError(status: number, body: string): ApiError {
  if (status === 413)
    return new ApiError(
      413,
      "That photo is larger than 15 MB. Send a smaller one (most phones can share a reduced size).",
    );
  if (status === 415)
    return new ApiError(415, "That file is not a photo we can read. Send a JPEG, PNG, WebP or HEIC picture.");
  if (status === 0)
    return new ApiError(0, "The upload stopped: the server cannot be reached. Check the connection and try again.");
  let message = `The server answered ${status}.`;
  try {
    message = JSON.parse(body)?.error?.message ?? message;
  } catch {
    // Not JSON (a proxy's page, say): keep the status line.
  }
  return new ApiError(status, message);
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
      else reject(uploadError(xhr.status, xhr.responseText));
    };
    xhr.onerror = () => reject(uploadError(0, ""));
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
