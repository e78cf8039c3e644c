import { useMutation, useQueryClient } from "@tanstack/react-query";
import { ApiError } from "@/lib/api";
import { apiBaseUrl } from "@/lib/client-env";
import type { ImportMapping, ImportPreview, ImportResult } from "@/lib/import-fields";

/** The pour-log file goes up as multipart with the mapping beside it, each time: the server keeps no draft. */
async function sendLog<T>(path: string, file: Blob, name: string, mapping?: ImportMapping): Promise<T> {
  const form = new FormData();
  form.append("file", file, name);
  if (mapping) form.append("mapping", JSON.stringify(mapping));
  let res: Response;
  try {
    res = await fetch(`${apiBaseUrl}/api${path}`, { method: "POST", credentials: "include", body: form });
  } catch {
    throw new ApiError(0, "The server cannot be reached. Check the connection and try again.");
  }
  const data = await res.json().catch(() => undefined);
  if (!res.ok)
    throw new ApiError(res.status, data?.error?.message ?? `The server answered ${res.status}.`, data?.error?.fields);
  return data as T;
}

export type LogFile = { file: Blob; name: string };

export function usePreviewImport() {
  return useMutation({
    mutationFn: ({ log, mapping }: { log: LogFile; mapping?: ImportMapping }) =>
      sendLog<ImportPreview>("/import/preview", log.file, log.name, mapping),
  });
}

/** After an import every list and the casebook may have new rows, so every query is read again. */
export function useRunImport() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ log, mapping }: { log: LogFile; mapping: ImportMapping }) =>
      sendLog<ImportResult>("/import", log.file, log.name, mapping),
    onSuccess: () => queryClient.invalidateQueries(),
  });
}

/** The browser's file chooser for one CSV file (web only; the phone apps import from the web app). */
export function chooseCsvFile(): Promise<LogFile | null> {
  return new Promise((resolve) => {
    const input = document.createElement("input");
    input.type = "file";
    input.accept = ".csv,text/csv,text/plain";
    input.style.display = "none";
    input.addEventListener("change", () => {
      const file = input.files?.[0];
      input.remove();
      resolve(file ? { file, name: file.name } : null);
    });
    input.addEventListener("cancel", () => {
      input.remove();
      resolve(null);
    });
    document.body.appendChild(input);
    input.click();
  });
}
