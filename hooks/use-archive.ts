import { useMutation, useQueryClient } from "@tanstack/react-query";
import { request } from "@/lib/api";
import type { Casting, Melt } from "@/lib/notebook-schemas";

export type ArchiveKind = "melt" | "casting";

/**
 * Archive and restore one melt or casting. Both change what every list shows, so every melt and
 * casting query (lists, pages, the casebook) is refetched.
 */
export function useArchive(kind: ArchiveKind, id: number) {
  const queryClient = useQueryClient();
  const refresh = () =>
    Promise.all([["melts"], ["castings"], ["search"]].map((queryKey) => queryClient.invalidateQueries({ queryKey })));
  const params = { id };
  const archive = useMutation<Melt | Casting>({
    mutationFn: () =>
      kind === "melt"
        ? request("POST /melts/:id/archive", { params })
        : request("POST /castings/:id/archive", { params }),
    onSuccess: refresh,
  });
  const restore = useMutation<Melt | Casting>({
    mutationFn: () =>
      kind === "melt"
        ? request("POST /melts/:id/restore", { params })
        : request("POST /castings/:id/restore", { params }),
    onSuccess: refresh,
  });
  return { archive, restore };
}
